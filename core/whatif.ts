/**
 * One-off requirement for one aircraft at given conditions (core): the live what-if panel and
 * POST /api/compute/requirement. Bad input throws InputDomainError (field, value, range). Composes core's takeoff and landing analyses (physics model) and
 * the greater-of rule; no rounding (templates round for display).
 *
 * Conventions (docs/web.md, "What-if panel"), the same as the study engine's (core/study/run.ts) so
 * that the panel at design conditions shows the results table's figures: takeoff at the given mass,
 * elevation (= pressure altitude), temperature, slope (+ uphill) and wind (+ headwind); landing at MLW
 * on a level runway with the same wind, at ISA temperature unless `landingTemperature` is 'design'
 * (then at the given temperature), factored by the study's operating rule set. Above the climb-limited
 * mass the takeoff is sized at that mass (the study's climb cap, core/takeoff/climbCap.ts) and says
 * so. A requirement beyond the aircraft's plausibility bound (core/plausibility.ts, the same bound the study rows, sweeps and runway check apply) is not a length:
 * the side says "cannot practically operate here" with the reason.
 */
import type { AircraftProfile } from './aircraft.js';
import { airAt, standardTemperatureC } from './atmosphere.js';
import { analyseLanding, landingRuleLabel } from './landing.js';
import type { OperatingRuleSet } from './operatingRules.js';
import { aircraftPlausibilityBound, checkPlausibility, takeoffDistances, type PlausibilityBound } from './plausibility.js';
import { requiredLength } from './requirement.js';
import type { Surface } from './surface.js';
import { analyseTakeoff, climbCapNotices, climbCappedTakeoff, climbLimitedPeak } from './takeoff/index.js';
import { notice, uniqueNotices, type Notice } from './notices.js';

/** Conditions of a what-if, SI: field elevation (= pressure altitude), temperature, takeoff mass, slope, wind, surface. */
export interface WhatIfConditions {
  readonly elevation_m: number;
  readonly temperature_c: number;
  readonly mass_kg: number;
  /** Runway slope, ratio (+ uphill in the takeoff direction). */
  readonly slope: number;
  /** Wind along the runway, m/s (+ headwind). */
  readonly headwind_mps: number;
  readonly surface: Surface;
}

/** One side of the what-if: takeoff or landing. */
export interface WhatIfSide {
  readonly ok: boolean;
  /** Required length, m (when ok). */
  readonly required_m?: number;
  /** Governing case, e.g. "balanced-field", or the landing rule's words. */
  readonly governing?: string;
  /** Why it cannot be done here (when not ok). */
  readonly reason?: Notice;
  /** Not ok because the requirement is beyond the aircraft's plausibility bound (core/plausibility.ts). */
  readonly impractical?: boolean;
  /** Takeoff sized at the climb-limited mass below the mass asked for, kg. */
  readonly climbLimitedMass_kg?: number;
  /** What the number rests on (climb cap and offload; the landing factor's source). */
  readonly note?: readonly Notice[];
}

/** The what-if's outcome, as the panel and POST /api/compute/requirement give it. */
export interface WhatIfOutcome {
  readonly takeoff: WhatIfSide;
  readonly landing: WhatIfSide;
  readonly required_m?: number;
  readonly governing?: 'takeoff' | 'landing';
  /** Reason when a side is beyond the plausibility bound: the aircraft cannot practically operate here. */
  readonly impractical?: Notice;
  /** The aircraft's plausibility bound, m. */
  readonly plausibilityBound_m?: number;
  readonly densityAltitude_m: number;
  readonly isaDeviation_c: number;
  readonly v1_mps?: number;
  readonly vr_mps?: number;
  readonly v2_mps?: number;
  readonly vref_mps?: number;
  readonly landingMass_kg: number;
  readonly warnings: readonly Notice[];
}

export interface WhatIfInput extends WhatIfConditions {
  readonly aircraft: AircraftProfile;
  readonly landingTemperature?: 'isa' | 'design';
  /** Operating rule set for the landing factor (default 'us-121'). */
  readonly operatingRules?: OperatingRuleSet;
}


/**
 * Runs the what-if. Bad input throws InputDomainError (field, value, range); infeasible physics is a
 * result. `bound` defaults to the aircraft's plausibility bound (a caller that already has it passes it).
 */
export function whatIf(input: WhatIfInput, bound: PlausibilityBound = aircraftPlausibilityBound(input.aircraft)): WhatIfOutcome {
  const a = input.aircraft;
  const air = airAt(input.elevation_m, input.temperature_c);
  const warnings: Notice[] = [];
  const runAt = (mass_kg: number, temperature_c: number) => analyseTakeoff({
    aircraft: a, mass_kg, pressureAltitude_m: input.elevation_m, temperature_c, slope: input.slope,
    headwind_mps: input.headwind_mps, surface: input.surface,
  });
  // The study's climb-cap rule (core/takeoff/climbCap.ts): above the climb-limited mass the takeoff is
  // sized at that mass (no runway length makes the heavier takeoff legal), and a climb-limited
  // requirement is the greatest over the temperatures up to the one given.
  const capped = climbCappedTakeoff(a, input.mass_kg, (m) => runAt(m, input.temperature_c));
  const to = capped.t;
  // The climb findings are the study's own sentences (climbCapNotices), said once: in the side's
  // reason or note, not again among the warnings (the takeoff's own climb-limited warning is left out).
  const climbCodes = new Set(['takeoff.climbLimited', 'takeoff.climbLimitedAtOew']);
  const own = (ws: readonly Notice[]) => ws.filter((w) => !climbCodes.has(w.code));
  warnings.push(...own(capped.first.warnings), ...(capped.climbLimited ? own(to.warnings) : []));
  const first = capped.first;
  let climbLimit: Notice | undefined;
  let note: Notice[] | undefined;
  let takeoffRequired = to.feasible ? to.required_m : undefined;
  if (capped.belowOew) {
    climbLimit = climbCapNotices.belowOew(first, input.mass_kg, a.oew_kg);
  } else if (capped.climbLimited && to.feasible && to.climb.limited) {
    climbLimit = climbCapNotices.atCap(to, capped.mass_kg);
  } else if (!capped.climbLimited && to.feasible && to.climb.limited) {
    climbLimit = first.warnings.find((w) => climbCodes.has(w.code)) ?? climbCapNotices.atCap(to, input.mass_kg);
  } else if (capped.climbLimited && to.feasible) {
    note = [climbCapNotices.capped(first, input.mass_kg, capped.mass_kg)];
    const peak = climbLimitedPeak(a, input.mass_kg, input.temperature_c, to.required_m, runAt);
    if (peak) {
      note.push(climbCapNotices.peak(peak, input.temperature_c, to.required_m));
      takeoffRequired = peak.required_m;
    }
  }
  const takeoffBeyond = to.feasible && !climbLimit
    ? checkPlausibility(takeoffDistances(to), bound, { elevation_m: input.elevation_m, temperature_c: input.temperature_c, mass_kg: capped.mass_kg })
    : undefined;
  const takeoff: WhatIfSide = takeoffBeyond
    ? { ok: false, impractical: true, reason: takeoffBeyond.notice }
    : to.feasible && !climbLimit && takeoffRequired !== undefined
      ? {
        ok: true, required_m: takeoffRequired, governing: to.governing,
        ...(capped.climbLimited ? { climbLimitedMass_kg: capped.mass_kg } : {}), ...(note ? { note } : {}),
      }
      : { ok: false, ...(climbLimit ? { reason: climbLimit } : !to.feasible ? { reason: notice('whatif.takeoffInfeasible')`The takeoff is not possible here: ${to.message}` } : {}) };
  const ld = analyseLanding({
    aircraft: a,
    mass_kg: a.mlw_kg,
    pressureAltitude_m: input.elevation_m,
    ...(input.landingTemperature === 'design' ? { temperature_c: input.temperature_c } : {}),
    slope: 0,
    headwind_mps: input.headwind_mps,
    surface: input.surface,
    ...(input.operatingRules !== undefined ? { ruleSet: input.operatingRules } : {}),
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
    ? { ok: false, impractical: true, reason: landingBeyond.notice }
    : ld.status === 'ok'
      ? { ok: true, required_m: ld.required_m, governing: landingRuleLabel(ld.requirement), note: [notice('whatif.landingFactorSource')`Landing factor: ${ld.requirement.source}.`] }
      : { ok: false, reason: notice('whatif.landingInfeasible')`The landing is not possible here: ${ld.reason}` };
  const impractical = takeoffBeyond?.notice ?? landingBeyond?.notice;
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
    warnings: uniqueNotices(warnings),
  };
}
