/**
 * Calibration of the physics models against an aircraft's own reference lengths.
 *
 * Takeoff: one scale factor — on engine thrust (`thrustScale`, default) or on the takeoff maximum
 * lift coefficient (`clMaxScale`) — is fitted so that the takeoff engine (core/takeoff/) at the
 * reference condition of the profile's reference length (MTOW, sea level, ISA 15 °C, zero wind and
 * slope, dry paved runway; aircraft.ts `ReferenceLengths`) reproduces that length:
 *     find k in [band.min, band.max] with  L_model(k) − L_ref = 0.
 * Landing (optional companion): one factor on the braking friction (dry and wet scaled together) so
 * that the landing model (core/landing.ts) at MLW, sea level, standard temperature, zero wind and slope,
 * dry, reproduces the reference landing length (already factored as published, so it is compared with
 * the required landing runway of the default operating rule).
 *
 * Solver: Brent's bracketing method (R. P. Brent, *Algorithms for Minimization without Derivatives*,
 * 1973, ch. 4; takeoff/roots.ts) on the bracket [band.min, band.max]. Both lengths fall as the factor
 * rises (more thrust, more lift or more braking shortens the run), so a sign change across the band
 * brackets the factor. A factor at which the model is infeasible (e.g. cannot reach lift-off) counts
 * as an infinitely long requirement: its residual is a large positive number, which keeps the bracket
 * valid. Stops when |L_model − L_ref| ≤ CALIBRATION_LENGTH_TOL_M or the bracket is narrower than
 * CALIBRATION_FACTOR_TOL; ConvergenceError after CALIBRATION_MAX_ITERATIONS. A root where the model
 * jumps from a finite length to infeasible (the reference is longer than any length it gives) leaves a
 * residual above CALIBRATION_EDGE_TOL of the reference and is refused ('no-solution').
 *
 * Refusals are results, not exceptions: no reference length; a factor outside the plausible band
 * (default 0.7–1.3: the calibrated model would no longer be a plausible description of the aircraft,
 * so the profile or the reference length should be checked); no solution (the model is infeasible
 * across the band).
 *
 * Validity: the band must lie inside the takeoff engine's accepted scale range (thrust 0.3–2, CLmax
 * 0.7–1.3) and, for braking, inside the profile's friction ranges. One factor cannot correct the shape
 * of the model (how length grows with mass, elevation and temperature); it matches one point only.
 */
import type { AircraftProfile } from './aircraft.js';
import { validateAircraft, AIRCRAFT_FIELDS } from './aircraft.js';
import { analyseTakeoff, TAKEOFF_INPUT_RANGES } from './takeoff/index.js';
import type { TakeoffInput, TakeoffResult } from './takeoff/types.js';
import { brentRoot } from './numeric/index.js';
import { analyseLanding, type LandingInput, type LandingResult } from './landing.js';
import { InputDomainError } from './errors.js';
import { check, finite, inRange } from './validate.js';
import { notice, qty, type Notice } from './notices.js';

export const CALIBRATION_METHOD_VERSION = 'calibration/1';

/** Plausible band of a calibration factor (common practice for one-parameter model tuning; configurable). */
export const DEFAULT_CALIBRATION_BAND = { min: 0.7, max: 1.3 } as const;
/** Length tolerance: the fit stops when the model is within this of the reference, m. */
export const CALIBRATION_LENGTH_TOL_M = 0.05;
/** Largest relative residual of a fitted factor; above it the root is the edge of feasibility, not a fit. */
export const CALIBRATION_EDGE_TOL = 0.01;
/** Factor tolerance: the fit stops when the bracket is narrower than this. */
export const CALIBRATION_FACTOR_TOL = 1e-6;
/** Iteration cap of the fit (ConvergenceError beyond). */
export const CALIBRATION_MAX_ITERATIONS = 100;
/** Residual standing in for an infeasible model (an "infinitely long" requirement), as a multiple of the reference. */
const INFEASIBLE_RESIDUAL_FACTOR = 10;

/** Condition of the reference takeoff length: MTOW, sea level, ISA, zero wind and slope, dry. */
export const TAKEOFF_REFERENCE_CONDITION = {
  pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0, surface: 'dry',
} as const;
/** Condition of the reference landing length: MLW, sea level, standard temperature, zero wind and slope, dry. */
export const LANDING_REFERENCE_CONDITION = {
  pressureAltitude_m: 0, slope: 0, headwind_mps: 0, surface: 'dry',
} as const;

export type TakeoffCalibrationParameter = 'thrust' | 'clmax';
export type LandingCalibrationParameter = 'braking';

export interface CalibrationBand {
  readonly min: number;
  readonly max: number;
}

export type CalibrationRefusal = 'no-reference' | 'outside-band' | 'no-solution';

export interface CalibrationTraceEntry {
  readonly label: string;
  readonly value: number;
  readonly unit: string;
}

interface CalibrationCommon<P extends string> {
  readonly operation: 'takeoff' | 'landing';
  readonly parameter: P;
  readonly aircraftId: string;
  readonly band: CalibrationBand;
  readonly methodVersion: string;
  readonly trace: readonly CalibrationTraceEntry[];
  readonly warnings: readonly Notice[];
}

export interface CalibrationOk<P extends string> extends CalibrationCommon<P> {
  readonly status: 'ok';
  /** The fitted factor (multiplier on thrust, CLmax or braking friction). */
  readonly factor: number;
  /** Reference length matched, m. */
  readonly reference_m: number;
  readonly referenceSource: 'profile' | 'given';
  /** Model length with the factor, m. */
  readonly model_m: number;
  /** Model length with factor 1 (undefined when the uncalibrated model is infeasible there), m. */
  readonly uncalibrated_m?: number;
  /** model − reference, m. */
  readonly residual_m: number;
  /** 100 × residual / reference. */
  readonly residual_pct: number;
  readonly iterations: number;
}

export interface CalibrationRefused<P extends string> extends CalibrationCommon<P> {
  readonly status: 'refused';
  readonly reason: CalibrationRefusal;
  /** Why, in plain words (rendered in the reader's units). */
  readonly message: Notice;
  readonly reference_m?: number;
  readonly uncalibrated_m?: number;
  /**
   * 'outside-band': the factor the reference would need, when it lies inside the model's accepted
   * range (otherwise absent), and on which side of the band it falls.
   */
  readonly factorNeeded?: number;
  readonly side?: 'below' | 'above';
}

export type TakeoffCalibration = CalibrationOk<TakeoffCalibrationParameter>;
export type TakeoffCalibrationResult = CalibrationOk<TakeoffCalibrationParameter> | CalibrationRefused<TakeoffCalibrationParameter>;
export type LandingCalibration = CalibrationOk<LandingCalibrationParameter>;
export type LandingCalibrationResult = CalibrationOk<LandingCalibrationParameter> | CalibrationRefused<LandingCalibrationParameter>;

export interface CalibrateTakeoffInput {
  readonly aircraft: AircraftProfile;
  /** Which factor to fit (default 'thrust'). */
  readonly parameter?: TakeoffCalibrationParameter;
  /** Reference takeoff length at MTOW, sea level, ISA, m (default aircraft.reference.takeoff_m); 100–5 000. */
  readonly reference_m?: number;
  /** Plausible band of the factor (default 0.7–1.3). */
  readonly band?: CalibrationBand;
}

export interface CalibrateLandingInput {
  readonly aircraft: AircraftProfile;
  readonly parameter?: LandingCalibrationParameter;
  /** Reference landing length at MLW, sea level, standard temperature, m (default aircraft.reference.landing_m); 100–5 000. */
  readonly reference_m?: number;
  readonly band?: CalibrationBand;
}

const REFERENCE_RANGE = { min: 100, max: 5000, unit: 'm' } as const;

function modelRange(parameter: string): { min: number; max: number } {
  if (parameter === 'thrust') return TAKEOFF_INPUT_RANGES.thrustScale;
  if (parameter === 'clmax') return TAKEOFF_INPUT_RANGES.clMaxScale;
  // Braking: any positive factor; the profile's friction ranges are applied per aircraft.
  return { min: 0.1, max: 10 };
}

function readBand(band: CalibrationBand | undefined, parameter: string): CalibrationBand {
  const b = band ?? DEFAULT_CALIBRATION_BAND;
  const r = modelRange(parameter);
  check(typeof b === 'object' && b !== null, 'band', b, 'an object { min, max }');
  const min = inRange('band.min', b.min, { min: r.min, max: r.max, unit: '' });
  const max = inRange('band.max', b.max, { min: r.min, max: r.max, unit: '' });
  check(min < max, 'band.max', max, `greater than band.min (${min})`);
  return { min, max };
}

/** The scale fields of a takeoff input for a calibration. */
export function calibrationScales(c: { readonly parameter: TakeoffCalibrationParameter; readonly factor: number }): {
  readonly thrustScale?: number; readonly clMaxScale?: number;
} {
  return c.parameter === 'thrust' ? { thrustScale: c.factor } : { clMaxScale: c.factor };
}

interface FitSpec<P extends string> {
  readonly operation: 'takeoff' | 'landing';
  readonly parameter: P;
  readonly aircraftId: string;
  readonly reference_m: number;
  readonly referenceSource: 'profile' | 'given';
  readonly band: CalibrationBand;
  /** Admissible factor range of the model for this aircraft (beyond the band, for the "factor needed" report). */
  readonly wide: CalibrationBand;
  /** Model length at factor k, or undefined when infeasible. */
  readonly length: (k: number) => number | undefined;
  readonly label: string;
  readonly trace: CalibrationTraceEntry[];
  readonly warnings: Notice[];
}

/** Fits the factor (shared by takeoff and landing). */
function fit<P extends string>(s: FitSpec<P>): CalibrationOk<P> | CalibrationRefused<P> {
  const ref = s.reference_m;
  const big = INFEASIBLE_RESIDUAL_FACTOR * ref;
  const fromLength = (L: number | undefined): number => {
    if (L === undefined) return big;
    const d = L - ref;
    return Math.abs(d) <= CALIBRATION_LENGTH_TOL_M ? 0 : d;
  };
  const residual = (k: number): number => fromLength(s.length(k));
  const common = {
    operation: s.operation, parameter: s.parameter, aircraftId: s.aircraftId, band: s.band,
    methodVersion: CALIBRATION_METHOD_VERSION, trace: s.trace, warnings: s.warnings,
  };
  const uncal = s.length(1);
  s.trace.push({ label: 'Reference length', value: ref, unit: 'm' });
  if (uncal !== undefined) s.trace.push({ label: 'Model length, uncalibrated (factor 1)', value: uncal, unit: 'm' });
  else s.warnings.push(notice('calibration.uncalibratedInfeasible')`The uncalibrated model (factor 1) is infeasible at the reference condition.`);

  const { min, max } = s.band;
  const lMin = s.length(min);
  const lMax = s.length(max);
  const fLo = fromLength(lMin);
  const fHi = fromLength(lMax);
  if (lMin !== undefined) s.trace.push({ label: `Model length at the band minimum (${min})`, value: lMin, unit: 'm' });
  if (lMax !== undefined) s.trace.push({ label: `Model length at the band maximum (${max})`, value: lMax, unit: 'm' });
  const bracketed = fLo >= 0 && fHi <= 0;
  if (!bracketed) {
    // Both ends too long → the factor needed is above the band; both too short → below it.
    if ((fLo === big && fHi === big) || (fLo < 0 && fHi > 0)) {
      return {
        ...common, status: 'refused', reason: 'no-solution', reference_m: ref,
        ...(uncal !== undefined ? { uncalibrated_m: uncal } : {}),
        message: fLo === big
          ? notice('calibration.infeasibleAcrossBand')`The ${s.operation} model is infeasible at the reference condition for every ${s.label} between ${min} and ${max}; no factor reproduces ${qty.length(ref)}.`
          : notice('calibration.notMonotone')`The ${s.operation} model does not shorten as the ${s.label} rises across ${min}–${max}; no factor is fitted.`,
      };
    }
    const side: 'below' | 'above' = fHi > 0 ? 'above' : 'below';
    let needed: number | undefined;
    const lo = side === 'above' ? max : s.wide.min;
    const hi = side === 'above' ? s.wide.max : min;
    if (hi > lo) {
      const gLo = residual(lo);
      const gHi = residual(hi);
      if (gLo >= 0 && gHi <= 0) {
        needed = brentRoot({
          name: `${s.operation} calibration (outside the band)`, f: residual, lo, hi, fLo: gLo, fHi: gHi,
          xTol: CALIBRATION_FACTOR_TOL, maxIterations: CALIBRATION_MAX_ITERATIONS,
        }).x;
      }
    }
    const what = needed !== undefined ? `${s.label} ${needed.toFixed(3)}` : `a ${s.label} ${side === 'above' ? `above ${s.wide.max}` : `below ${s.wide.min}`}`;
    return {
      ...common, status: 'refused', reason: 'outside-band', reference_m: ref,
      ...(uncal !== undefined ? { uncalibrated_m: uncal } : {}),
      ...(needed !== undefined ? { factorNeeded: needed } : {}), side,
      message: notice('calibration.outsideBand')`Reproducing the reference ${s.operation} length ${qty.length(ref)} would need ${what}, outside the plausible band ${min}–${max}${uncal !== undefined ? notice('calibration.uncalibratedGives')` (the uncalibrated model gives ${qty.length(uncal)})` : ''}. Check the profile or the reference length.`,
    };
  }
  const r = brentRoot({
    name: `${s.operation} calibration`, f: residual, lo: min, hi: max, fLo, fHi,
    xTol: CALIBRATION_FACTOR_TOL, maxIterations: CALIBRATION_MAX_ITERATIONS,
  });
  const k = r.x;
  const L = s.length(k);
  if (L === undefined) {
    // The residual is continuous across the root; an infeasible model there is a defect.
    throw new Error(`internal: ${s.operation} model infeasible at the fitted factor ${k}`);
  }
  const res = L - ref;
  if (Math.abs(res) > CALIBRATION_EDGE_TOL * ref) {
    // The root sits on the edge where the model turns infeasible (a reasoned climb or air-distance
    // limit, not a length): the longest length the model gives falls short of the reference.
    return {
      ...common, status: 'refused', reason: 'no-solution', reference_m: ref,
      ...(uncal !== undefined ? { uncalibrated_m: uncal } : {}),
      message: notice('calibration.beyondModelEdge')`The reference ${s.operation} length ${qty.length(ref)} is longer than any the model gives before it becomes infeasible (${qty.length(L)} at a ${s.label} of ${k.toFixed(3)}, at the edge of its climb capability); no factor reproduces it. Check the profile or the reference length.`,
    };
  }
  s.trace.push({ label: `Fitted ${s.label}`, value: k, unit: '' });
  s.trace.push({ label: 'Model length with the fitted factor', value: L, unit: 'm' });
  s.trace.push({ label: 'Residual (model − reference)', value: res, unit: 'm' });
  s.trace.push({ label: 'Solver iterations', value: r.iterations, unit: '' });
  return {
    ...common, status: 'ok', factor: finite('factor', k), reference_m: ref, referenceSource: s.referenceSource,
    model_m: finite('model_m', L), ...(uncal !== undefined ? { uncalibrated_m: uncal } : {}),
    residual_m: finite('residual_m', res), residual_pct: finite('residual_pct', (100 * res) / ref),
    iterations: r.iterations,
  };
}

function referenceOf(given: number | undefined, profile: number | undefined): { value?: number; source: 'profile' | 'given' } {
  if (given !== undefined) return { value: inRange('reference_m', given, REFERENCE_RANGE), source: 'given' };
  return { value: profile, source: 'profile' };
}

/** Takeoff input at the reference condition with a factor applied. */
function referenceTakeoff(a: AircraftProfile, parameter: TakeoffCalibrationParameter, k: number): TakeoffInput {
  return { aircraft: a, mass_kg: a.mtow_kg, ...TAKEOFF_REFERENCE_CONDITION, ...calibrationScales({ parameter, factor: k }) };
}

/**
 * Fits a thrust (default) or CLmax factor so that the takeoff engine reproduces the reference takeoff
 * length at MTOW, sea level, ISA, zero wind and slope, dry. A result: 'ok' with the factor and the
 * residual, or 'refused' with the reason.
 */
export function calibrateTakeoff(input: CalibrateTakeoffInput): TakeoffCalibrationResult {
  const a = validateAircraft(input.aircraft);
  const parameter = input.parameter ?? 'thrust';
  check(parameter === 'thrust' || parameter === 'clmax', 'parameter', parameter, 'one of thrust, clmax');
  const band = readBand(input.band, parameter);
  const { value: ref, source } = referenceOf(input.reference_m, a.reference?.takeoff_m);
  const label = parameter === 'thrust' ? 'thrust scale' : 'CLmax scale';
  const trace: CalibrationTraceEntry[] = [];
  const warnings: Notice[] = [];
  if (ref === undefined) {
    return {
      operation: 'takeoff', parameter, aircraftId: a.id, band, methodVersion: CALIBRATION_METHOD_VERSION, trace, warnings,
      status: 'refused', reason: 'no-reference',
      message: notice('calibration.noTakeoffReference')`The profile "${a.id}" holds no reference takeoff length and none was given; nothing to calibrate against.`,
    };
  }
  const wide = modelRange(parameter);
  const length = (k: number): number | undefined => {
    const r = analyseTakeoff(referenceTakeoff(a, parameter, k));
    return r.feasible ? r.required_m : undefined;
  };
  const out = fit({
    operation: 'takeoff', parameter, aircraftId: a.id, reference_m: ref, referenceSource: source, band,
    wide: { min: wide.min, max: wide.max }, length, label, trace, warnings,
  });
  if (out.status === 'ok') {
    const r = analyseTakeoff(referenceTakeoff(a, parameter, out.factor));
    if (r.feasible && r.climb.limited) {
      warnings.push(notice('calibration.climbLimitedAtReference')`At the reference condition the calibrated model is climb-limited at MTOW; the reference length is matched as a field length only.`);
    }
  }
  return out;
}

/** Runs the takeoff engine with a calibration's factor (the calibration must be for this aircraft). */
export function predictCalibrated(
  input: Omit<TakeoffInput, 'thrustScale' | 'clMaxScale'> & { readonly calibration: TakeoffCalibration },
): TakeoffResult {
  const { calibration, ...rest } = input;
  check(calibration?.status === 'ok' && calibration.operation === 'takeoff', 'calibration', calibration?.status,
    'a successful takeoff calibration (status ok)');
  check(calibration.aircraftId === rest.aircraft.id, 'calibration.aircraftId', calibration.aircraftId,
    `the id of the aircraft analysed (${rest.aircraft.id})`);
  const r = analyseTakeoff({ ...rest, ...calibrationScales(calibration) });
  const label = calibration.parameter === 'thrust' ? 'thrust scale' : 'CLmax scale';
  return {
    ...r,
    trace: [{ label: `Calibration: ${label}`, value: calibration.factor, unit: '' }, ...r.trace],
    warnings: [...r.warnings, notice('calibration.appliedTakeoff')`Calibrated model: ${label} ${calibration.factor.toFixed(4)} fitted to the reference takeoff length ${qty.length(calibration.reference_m)}.`],
  };
}

// ---------------------------------------------------------------------------------------------
// Landing

function fieldRange(key: string): { min: number; max: number } {
  const spec = AIRCRAFT_FIELDS.find((f) => f.key === key);
  if (!spec) throw new Error(`internal: no field spec for ${key}`);
  return { min: spec.min, max: spec.max };
}

/** The profile with its braking friction (dry and wet) scaled by k. */
export function scaledBrakingProfile(a: AircraftProfile, k: number): AircraftProfile {
  return { ...a, brakingFrictionDry: a.brakingFrictionDry * k, brakingFrictionWet: a.brakingFrictionWet * k };
}

/** Range of braking factors for which the scaled profile stays inside the profile's friction ranges. */
function brakingFactorRange(a: AircraftProfile): CalibrationBand {
  const dry = fieldRange('brakingFrictionDry');
  const wet = fieldRange('brakingFrictionWet');
  return {
    min: Math.max(dry.min / a.brakingFrictionDry, wet.min / a.brakingFrictionWet),
    max: Math.min(dry.max / a.brakingFrictionDry, wet.max / a.brakingFrictionWet),
  };
}

/**
 * Fits a braking-friction factor so that the landing model reproduces the reference landing length
 * (required runway of the default operating rule) at MLW, sea level, standard temperature, dry.
 */
export function calibrateLanding(input: CalibrateLandingInput): LandingCalibrationResult {
  const a = validateAircraft(input.aircraft);
  const parameter = input.parameter ?? 'braking';
  check(parameter === 'braking', 'parameter', parameter, 'braking');
  const requested = readBand(input.band, parameter);
  const admissible = brakingFactorRange(a);
  const band = { min: Math.max(requested.min, admissible.min), max: Math.min(requested.max, admissible.max) };
  const { value: ref, source } = referenceOf(input.reference_m, a.reference?.landing_m);
  const trace: CalibrationTraceEntry[] = [];
  const warnings: Notice[] = [];
  const base = { operation: 'landing' as const, parameter, aircraftId: a.id, methodVersion: CALIBRATION_METHOD_VERSION, trace, warnings };
  if (ref === undefined) {
    return {
      ...base, band: requested, status: 'refused', reason: 'no-reference',
      message: notice('calibration.noLandingReference')`The profile "${a.id}" holds no reference landing length and none was given; nothing to calibrate against.`,
    };
  }
  if (!(band.min < band.max)) {
    return {
      ...base, band: requested, status: 'refused', reason: 'outside-band', reference_m: ref,
      message: notice('calibration.noBrakingFactor')`No braking factor inside the band ${requested.min}–${requested.max} keeps the braking friction inside its valid range (${admissible.min.toFixed(3)}–${admissible.max.toFixed(3)}).`,
    };
  }
  if (band.min > requested.min || band.max < requested.max) {
    warnings.push(notice('calibration.bandNarrowed')`The band was narrowed to ${band.min.toFixed(3)}–${band.max.toFixed(3)} to keep the scaled braking friction inside its valid range.`);
  }
  const length = (k: number): number | undefined => {
    const r = analyseLanding({ aircraft: scaledBrakingProfile(a, k), mass_kg: a.mlw_kg, ...LANDING_REFERENCE_CONDITION });
    return r.status === 'ok' ? r.required_m : undefined;
  };
  return fit({
    operation: 'landing', parameter, aircraftId: a.id, reference_m: ref, referenceSource: source, band,
    wide: admissible, length, label: 'braking factor', trace, warnings,
  });
}

/** Runs the landing model with a landing calibration's braking factor. */
export function predictCalibratedLanding(
  input: LandingInput & { readonly calibration: LandingCalibration },
): LandingResult {
  const { calibration, ...rest } = input;
  check(calibration?.status === 'ok' && calibration.operation === 'landing', 'calibration', calibration?.status,
    'a successful landing calibration (status ok)');
  if (calibration.aircraftId !== rest.aircraft.id) {
    throw new InputDomainError('calibration.aircraftId', calibration.aircraftId, `the id of the aircraft analysed (${rest.aircraft.id})`);
  }
  const r = analyseLanding({ ...rest, aircraft: scaledBrakingProfile(rest.aircraft, calibration.factor) });
  const note = notice('calibration.appliedLanding')`Calibrated model: braking factor ${calibration.factor.toFixed(4)} fitted to the reference landing length ${qty.length(calibration.reference_m)}.`;
  return { ...r, warnings: [...r.warnings, note] };
}
