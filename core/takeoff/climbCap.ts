/**
 * The climb cap, one rule for study rows, the temperature scan, the sweeps and the what-if panel:
 * when the takeoff at the mass asked for misses a climb minimum (or cannot climb at all), it is re-run
 * at the greatest mass that meets every minimum (the climb-limited mass, floored to the kilogram);
 * when no mass down to OEW meets it, the aircraft cannot operate here. Project logic over 14 CFR
 * 25.121 and 23.2120 minima (docs/methods/study.md, step 2). Pure.
 */
import type { AircraftProfile } from '../aircraft.js';
import type { TakeoffResult } from './types.js';
import { notice, qty, type Notice } from '../notices.js';

/**
 * `first` is the takeoff at the mass asked for. When that mass misses a climb minimum, `belowOew`
 * says no mass down to OEW meets it, else `climbLimited` says the takeoff `t` was re-run at the
 * climb-limited mass `mass_kg`. `ok`: `t` is feasible and meets every minimum.
 */
export interface CappedTakeoff {
  readonly first: TakeoffResult;
  readonly t: TakeoffResult;
  readonly mass_kg: number;
  readonly climbLimited: boolean;
  readonly belowOew: boolean;
  readonly ok: boolean;
}

/** Applies the climb cap; `run` analyses the takeoff at a mass (the caller's conditions and calibration). */
export function climbCappedTakeoff(a: AircraftProfile, mass_kg: number, run: (mass_kg: number) => TakeoffResult): CappedTakeoff {
  const first = run(mass_kg);
  const bound = first.climb.limited || (!first.feasible && (first.reason === 'cannot-climb' || first.reason === 'cannot-climb-engine-out'));
  const cm = first.climb.maxMass_kg;
  const same = { first, t: first, mass_kg, climbLimited: false };
  if (!bound) return { ...same, belowOew: false, ok: first.feasible };
  if (cm === undefined || cm < a.oew_kg) return { ...same, belowOew: true, ok: false };
  if (cm >= mass_kg) return { ...same, belowOew: false, ok: first.feasible && !first.climb.limited };
  const m = Math.floor(cm);
  const t = run(m);
  return { first, t, mass_kg: m, climbLimited: true, belowOew: false, ok: t.feasible && !t.climb.limited };
}

/** Temperature grid of the peak scan: design − 15 °C up to design − 2.5 °C, 2.5 °C steps (the sensitivity grid's cool half). */
export const PEAK_SCAN_SPAN_C = 15;
export const PEAK_SCAN_STEP_C = 2.5;

/**
 * A climb-limited aircraft's requirement can peak below the design temperature: cooler air allows a
 * heavier climb-limited mass, which can need more runway. Scans the temperatures of the grid below the
 * design temperature with the climb cap applied at each (from `mass_kg`, the mass before the cap) and
 * returns the greatest requirement above `atDesign_m`, or undefined when the design temperature
 * governs. `run` analyses the takeoff at a mass and temperature.
 */
export function climbLimitedPeak(
  a: AircraftProfile, mass_kg: number, designTemperature_c: number, atDesign_m: number,
  run: (mass_kg: number, temperature_c: number) => TakeoffResult,
): { temperature_c: number; required_m: number; mass_kg: number } | undefined {
  let peak: { temperature_c: number; required_m: number; mass_kg: number } | undefined;
  for (let dt = -PEAK_SCAN_SPAN_C; dt < -1e-9; dt += PEAK_SCAN_STEP_C) {
    const temperature_c = designTemperature_c + dt;
    if (temperature_c < -60) continue;
    const c = climbCappedTakeoff(a, mass_kg, (m) => run(m, temperature_c));
    if (!c.ok || !c.t.feasible) continue;
    if (c.t.required_m > (peak?.required_m ?? atDesign_m)) peak = { temperature_c, required_m: c.t.required_m, mass_kg: c.mass_kg };
  }
  return peak;
}

/**
 * The climb cap's findings in words, one sentence per case, shared by the study rows and the what-if
 * (the mass is the one asked for: the route's design mass in a study, the panel's mass in a what-if).
 */
export const climbCapNotices = {
  /** What the first takeoff missed: "the gradient of the second segment is 2.10 %". */
  missed(first: TakeoffResult): Notice {
    const label = first.climb.limitingLabel ?? `${first.climb.case} climb at V2`;
    return notice('climb.gradientMissed')`the gradient of the ${label} is ${(first.climb.gradient * 100).toFixed(2)} %, below the ${(first.climb.minimum * 100).toFixed(1)} % minimum`;
  },
  belowOew(first: TakeoffResult, mass_kg: number, oew_kg: number): Notice {
    return notice('climb.limitedAtOew')`Cannot operate here: at ${qty.mass(mass_kg)} ${climbCapNotices.missed(first)}, and no mass down to the operating empty mass (${qty.mass(oew_kg)}) meets it; a longer runway cannot cure this.`;
  },
  atCap(t: TakeoffResult, capMass_kg: number): Notice {
    return notice('climb.limitedAtCap')`Cannot operate here: even at the climb-limited mass of ${qty.mass(capMass_kg)} the ${t.climb.limitingLabel ?? 'climb'} gradient misses its minimum.`;
  },
  capped(first: TakeoffResult, mass_kg: number, capMass_kg: number): Notice {
    return notice('climb.capped')`Climb-limited at ${qty.mass(mass_kg)}: ${climbCapNotices.missed(first)}. The greatest mass meeting every climb minimum is ${qty.mass(capMass_kg)} (${qty.mass(mass_kg - capMass_kg)} to offload); a longer runway cannot cure this, so the runway is sized at that mass.`;
  },
  peak(peak: { temperature_c: number; required_m: number; mass_kg: number }, temperature_c: number, atTemperature_m: number): Notice {
    return notice('climb.peakBelowTemperature')`The takeoff requirement of this climb-limited aircraft peaks below ${qty.temperature(temperature_c)}: ${qty.length(peak.required_m)} at ${qty.temperature(peak.temperature_c)} (climb-limited mass ${qty.mass(peak.mass_kg)}) against ${qty.length(atTemperature_m)} at ${qty.temperature(temperature_c)}. The requirement is sized on the greatest over the temperatures up to ${qty.temperature(temperature_c)}.`;
  },
};
