/**
 * Physical plausibility bound on runway requirements (docs/methods/study.md, "Plausibility bound").
 *
 * Near an aircraft's climb or thrust limit the takeoff model still integrates a "distance": the
 * airborne segment to the screen height grows without limit as the climb gradient goes to zero, and a
 * few kilograms more turn 5 km into 50 km. No aircraft practically needs such a length and no runway
 * offers it, so a requirement above the bound is a reasoned result ("cannot practically operate
 * here"), never a length. One bound per aircraft, the same wherever a requirement is produced: study
 * rows, sensitivity sweeps, the what-if and the existing-runway check.
 *
 *   bound = max(PLAUSIBILITY_RATIO × ARFL, PLAUSIBILITY_CAP_M)
 *
 * - ARFL: the aeroplane reference field length (ICAO Annex 14 Vol. I, 1.1: MTOW, sea level, ISA, still
 *   air, zero slope): the profile's flight-manual reference takeoff length when it has one, else the
 *   takeoff model at those conditions on a dry paved runway (the same value the classification uses).
 *   A per-aircraft constant, so the bound does not move with mass inside a mass search.
 * - PLAUSIBILITY_RATIO = 2.5: project convention. The percentage corrections of the ICAO method ask for
 *   a specific study once elevation and temperature add 35 % (ICAO Doc 9157, Aerodrome Design Manual Part 1, percentage corrections); 2.5× is a 150 %
 *   increase, far beyond any correction an aircraft's planning data cover.
 * - PLAUSIBILITY_CAP_M = 5 500 m: the length class of the longest paved runways in service (common
 *   practice; from memory, not from a published table). A requirement above it cannot be met at any
 *   airport.
 * An ARFL above the cap is itself beyond plausibility and does not raise the bound (the cap applies).
 *
 * What is checked: the requirement of the method in use, and the physics distances behind it (all
 * engines to the screen height, engine-out continued takeoff, accelerate-stop, balanced field) — so a
 * reference-length row whose physics cross-check runs to kilometres is caught too — and the landing
 * requirement. The indicative empirical estimates (Torenbeek, Roskam) are not checked.
 *
 * Pure; no rounding.
 */
import { notice, qty, siText, type Notice } from './notices.js';
import type { AircraftProfile } from './aircraft.js';
import { analyseTakeoff } from './takeoff/index.js';
import type { TakeoffResult } from './takeoff/types.js';

/** Multiple of the aeroplane reference field length above which a requirement is not plausible (project convention). */
export const PLAUSIBILITY_RATIO = 2.5;
/** Absolute length above which a requirement is not plausible, m (length class of the longest paved runways; common practice). */
export const PLAUSIBILITY_CAP_M = 5500;

export interface PlausibilityBound {
  /** The bound, m. */
  readonly bound_m: number;
  /** Which term sets it. */
  readonly basis: 'absolute-cap' | 'reference-ratio';
  /** Aeroplane reference field length used, m (absent when the model finds none). */
  readonly arfl_m?: number;
  /** Where that reference length comes from. */
  readonly arflSource?: 'flight-manual' | 'model';
  /** Plain words: "5,500 m (absolute cap, the length class of the longest paved runways)", in the reader's units. */
  readonly label: Notice;
}

/** The bound for an aircraft with the given aeroplane reference field length (m; undefined when unknown). */
export function plausibilityBound(arfl_m?: number, arflSource: 'flight-manual' | 'model' = 'model'): PlausibilityBound {
  const usable = arfl_m !== undefined && Number.isFinite(arfl_m) && arfl_m > 0 && arfl_m <= PLAUSIBILITY_CAP_M;
  const ratio = usable ? PLAUSIBILITY_RATIO * arfl_m : 0;
  const ref = arfl_m !== undefined && Number.isFinite(arfl_m) && arfl_m > 0 ? { arfl_m, arflSource } : {};
  if (ratio > PLAUSIBILITY_CAP_M) {
    return {
      bound_m: ratio, basis: 'reference-ratio', ...ref,
      label: notice('plausibility.boundRatio')`${qty.length(ratio)} (${PLAUSIBILITY_RATIO} × the aeroplane reference field length of ${qty.length(arfl_m!)})`,
    };
  }
  return {
    bound_m: PLAUSIBILITY_CAP_M, basis: 'absolute-cap', ...ref,
    label: notice('plausibility.boundCap')`${qty.length(PLAUSIBILITY_CAP_M)} (absolute cap, the length class of the longest paved runways)`,
  };
}

/**
 * Aeroplane reference field length of a profile: the flight-manual reference takeoff length, else the
 * takeoff model at MTOW, sea level, ISA (15 °C), zero slope, still air, dry paved runway, no thrust
 * factor; undefined when the model finds the takeoff infeasible there.
 */
export function aeroplaneReferenceFieldLength(a: AircraftProfile): { arfl_m?: number; source: 'flight-manual' | 'model'; model: TakeoffResult } {
  // The model's figure is always computed: it is shown beside a planning figure.
  const model = analyseTakeoff({
    aircraft: a, mass_kg: a.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0, surface: 'dry', thrustScale: 1,
  });
  if (a.reference?.takeoff_m !== undefined) return { arfl_m: a.reference.takeoff_m, source: 'flight-manual', model };
  return model.feasible ? { arfl_m: model.required_m, source: 'model', model } : { source: 'model', model };
}

/** The plausibility bound of an aircraft (computes its reference field length). */
export function aircraftPlausibilityBound(a: AircraftProfile): PlausibilityBound {
  const r = aeroplaneReferenceFieldLength(a);
  return plausibilityBound(r.arfl_m, r.source);
}

/** A named distance checked against the bound. */
export interface CheckedDistance {
  /** What it is, in words that fit "the … needs": "takeoff", "engine-out continued takeoff", … */
  readonly what: string;
  readonly value_m: number;
}

/**
 * The physics distances behind a feasible takeoff, the requirement first. The engine-out distances
 * count only where they are part of the requirement (transport and commuter categories); a
 * normal-category twin's engine-out figures are information, not a field length.
 */
export function takeoffDistances(t: TakeoffResult): CheckedDistance[] {
  if (!t.feasible) return [];
  const out: CheckedDistance[] = [
    { what: 'takeoff', value_m: t.required_m },
    { what: 'all-engines takeoff to the screen height', value_m: t.allEngines.toScreen_m },
  ];
  if (t.engineOut && t.certification !== 'normal') {
    out.push(
      { what: 'engine-out continued takeoff', value_m: t.engineOut.continued_m },
      { what: 'accelerate-stop', value_m: t.engineOut.accelerateStop_m },
      { what: 'balanced field', value_m: t.engineOut.balancedField_m },
    );
  }
  return out;
}

/** Result of checking a set of distances: absent when all are within the bound. */
export interface PlausibilityFinding {
  /** The first distance beyond the bound (in the order checked; the requirement first). */
  readonly what: string;
  readonly value_m: number;
  readonly bound_m: number;
  readonly basis: PlausibilityBound['basis'];
  /** Plain-words reason, SI text. */
  readonly reason: string;
  /** The same reason as a notice, rendered in the reader's units on the page, the CSV, the JSON and the report. */
  readonly notice: Notice;
}

export interface PlausibilityContext {
  /** Pressure altitude / elevation of the case, m. */
  readonly elevation_m: number;
  readonly temperature_c: number;
  /** Mass of the case, kg (stated in the reason when given). */
  readonly mass_kg?: number;
}

const withReason = (n: Notice): { reason: string; notice: Notice } => ({ reason: siText(n), notice: n });

/** Reason for a distance beyond the bound. */
export function impracticalReason(what: string, value_m: number, bound: PlausibilityBound, ctx: PlausibilityContext): Notice {
  const needs = Number.isFinite(value_m) ? qty.length(value_m) : 'an unbounded length';
  const mass = ctx.mass_kg === undefined ? '' : notice('plausibility.atMass')` and ${qty.mass(ctx.mass_kg)}`;
  return notice('plausibility.impractical')`This aircraft cannot practically operate here: the ${what} needs ${needs} at ${qty.altitude(ctx.elevation_m)} / ${qty.temperature(ctx.temperature_c)}${mass}, more than the plausibility bound of ${bound.label}. The model is at the edge of the aircraft's climb or thrust capability, where the length is not meaningful; a lighter mass or cooler conditions are needed.`;
}

/**
 * Checks distances against the bound; returns the finding for the first one (in the order given, the
 * requirement first) beyond it, or undefined when every distance is within (a distance equal to the
 * bound is within). Non-finite distances are beyond any bound.
 */
export function checkPlausibility(distances: readonly CheckedDistance[], bound: PlausibilityBound, ctx: PlausibilityContext): PlausibilityFinding | undefined {
  const worst = distances.find((d) => !withinPlausibility(d.value_m, bound));
  if (!worst) return undefined;
  return {
    what: worst.what, value_m: worst.value_m, bound_m: bound.bound_m, basis: bound.basis,
    ...withReason(impracticalReason(worst.what, worst.value_m, bound, ctx)),
  };
}

/** Whether one length is within the bound. */
export function withinPlausibility(length_m: number, bound: PlausibilityBound): boolean {
  return Number.isFinite(length_m) && length_m <= bound.bound_m;
}
