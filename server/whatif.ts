/**
 * One-off requirement for one aircraft at given conditions: the live what-if panel and
 * POST /api/compute/requirement. Composes core's takeoff and landing analyses (physics model) and
 * the greater-of rule; no rounding (templates round for display).
 *
 * Conventions (docs/web.md, "What-if panel"), the same as the study engine's (core/study/run.ts) so
 * that the panel at design conditions shows the results table's figures: takeoff at the given mass,
 * elevation (= pressure altitude), temperature, slope (+ uphill) and wind (+ headwind); landing at MLW
 * on a level runway with the same wind, at ISA temperature unless `landingTemperature` is 'design'
 * (then at the given temperature). A requirement beyond the aircraft's plausibility bound
 * (core/plausibility.ts, the same bound the study rows, sweeps and runway check apply) is not a length:
 * the side says "cannot practically operate here" with the reason.
 */
import type { WhatIfOutcomeView, WhatIfSide } from '../templates/whatif.js';
import {
  InputDomainError, aircraftPlausibilityBound, airAt, analyseLanding, analyseTakeoff, checkPlausibility, requiredLength,
  standardTemperatureC, takeoffDistances, type AircraftProfile, type PlausibilityBound, type Surface,
} from '../core/index.js';

export interface WhatIfInput {
  readonly aircraft: AircraftProfile;
  /** Field elevation = pressure altitude, m. */
  readonly elevation_m: number;
  /** Outside air temperature, °C. */
  readonly temperature_c: number;
  /** Takeoff mass, kg. */
  readonly mass_kg: number;
  /** Runway slope, ratio (+ uphill in the takeoff direction). */
  readonly slope: number;
  /** Wind along the runway, m/s (+ headwind). */
  readonly headwind_mps: number;
  readonly surface: Surface;
  readonly landingTemperature?: 'isa' | 'design';
}

export type { WhatIfSide } from '../templates/whatif.js';
export type WhatIfOutcome = WhatIfOutcomeView;

/**
 * Runs the what-if. Bad input throws InputDomainError (field, value, range); infeasible physics is a
 * result. `bound` defaults to the aircraft's plausibility bound (a caller that already has it passes it).
 */
export function whatIf(input: WhatIfInput, bound: PlausibilityBound = aircraftPlausibilityBound(input.aircraft)): WhatIfOutcome {
  const a = input.aircraft;
  const air = airAt(input.elevation_m, input.temperature_c);
  const warnings: string[] = [];
  const to = analyseTakeoff({
    aircraft: a,
    mass_kg: input.mass_kg,
    pressureAltitude_m: input.elevation_m,
    temperature_c: input.temperature_c,
    slope: input.slope,
    headwind_mps: input.headwind_mps,
    surface: input.surface,
  });
  warnings.push(...to.warnings);
  // Above the climb-limited mass no runway length makes the takeoff legal, so no length is shown
  // (the distance the model gives there can be kilometres of near-level engine-out flight).
  const climbLimit = to.climb.limited
    ? `Climb-limited: the ${to.climb.case} climb gradient ${(to.climb.gradient * 100).toFixed(2)} % is below the minimum ${(to.climb.minimum * 100).toFixed(2)} %; ${to.climb.maxMass_kg === undefined ? 'no mass above the empty mass meets it' : `the greatest mass meeting it is ${Math.floor(to.climb.maxMass_kg)} kg`}. A longer runway does not cure this.`
    : undefined;
  const takeoffBeyond = to.feasible && !climbLimit
    ? checkPlausibility(takeoffDistances(to), bound, { elevation_m: input.elevation_m, temperature_c: input.temperature_c, mass_kg: input.mass_kg })
    : undefined;
  const takeoff: WhatIfSide = takeoffBeyond
    ? { ok: false, impractical: true, reason: takeoffBeyond.reason }
    : to.feasible && !climbLimit
      ? { ok: true, required_m: to.required_m, governing: to.governing }
      : { ok: false, reason: climbLimit ?? (to.feasible ? '' : to.message) };
  const ld = analyseLanding({
    aircraft: a,
    mass_kg: a.mlw_kg,
    pressureAltitude_m: input.elevation_m,
    ...(input.landingTemperature === 'design' ? { temperature_c: input.temperature_c } : {}),
    slope: 0,
    headwind_mps: input.headwind_mps,
    surface: input.surface,
  });
  warnings.push(...ld.warnings);
  const landingBeyond = ld.status === 'ok'
    ? checkPlausibility([{ what: 'landing', value_m: ld.required_m }], bound, {
      elevation_m: input.elevation_m,
      temperature_c: input.landingTemperature === 'design' ? input.temperature_c : standardTemperatureC(input.elevation_m),
      mass_kg: a.mlw_kg,
    })
    : undefined;
  const landing: WhatIfSide = landingBeyond
    ? { ok: false, impractical: true, reason: landingBeyond.reason }
    : ld.status === 'ok'
      ? { ok: true, required_m: ld.required_m, governing: ld.requirement.rule }
      : { ok: false, reason: ld.reason };
  const impractical = takeoffBeyond?.reason ?? landingBeyond?.reason;
  let required: { length_m: number; governing: 'takeoff' | 'landing' } | undefined;
  if (takeoff.ok && landing.ok) required = requiredLength({ takeoff_m: takeoff.required_m!, landing_m: landing.required_m! });
  return {
    takeoff,
    landing,
    ...(required ? { required_m: required.length_m, governing: required.governing } : {}),
    ...(impractical ? { impractical } : {}),
    plausibilityBound_m: bound.bound_m,
    densityAltitude_m: air.densityAltitude_m,
    isaDeviation_c: air.isaDeviation_k,
    ...(to.speeds.v1_mps === undefined ? {} : { v1_mps: to.speeds.v1_mps }),
    vr_mps: to.speeds.vr_mps,
    v2_mps: to.speeds.v2_mps,
    ...(ld.speeds ? { vref_mps: ld.speeds.vref_mps } : {}),
    landingMass_kg: a.mlw_kg,
    warnings: [...new Set(warnings)],
  };
}

/** Whether an error is a bad-input error the what-if reports as a field problem. */
export function isInputError(e: unknown): e is InputDomainError {
  return e instanceof InputDomainError;
}
