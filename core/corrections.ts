/**
 * Percentage corrections of a basic runway length to site conditions.
 *
 * ICAO set (ICAO Doc 9157 Aerodrome Design Manual, Part 1, runway-length corrections; wording of the
 * primary text not confirmed, the rule set as reproduced in airport-engineering texts):
 *   1. elevation    L1 = L0 · (1 + 0.07 · E / 300)             7 % per 300 m of aerodrome elevation E
 *   2. temperature  L2 = L1 · (1 + 0.01 · (T_ref − T_std(E)))  1 % per °C of aerodrome reference
 *                   temperature above the ISA temperature at E, T_std(E) = 15 − 0.0065·E °C
 *                   (no negative correction below standard — from memory, the texts are silent)
 *   3. check        (L2 − L0)/L0 > 35 % → the percentage rule is indicative only; a specific
 *                   (aircraft performance) study is required
 *   4. slope        L3 = L2 · (1 + r · G), G = effective gradient in percent, r = 0.10
 *                   (10 % per 1 %, Ahlborn & Horonjeff 1963) or the older 0.20 (labelled legacy);
 *                   takeoff only, and only when the basic length L0 ≥ a threshold (default 900 m,
 *                   from memory — configurable).
 *   Landing: certified landing distances are scheduled for standard temperature (14 CFR 25.125(a)),
 *   so the landing length takes the elevation step only.
 *
 * Authority set (US runway-length advisory circular AC 150/5325-4B, as summarised in secondary
 * sources): takeoff + 10 m per m of centreline high-to-low elevation difference (no gradient
 * adjustment for landing); landing on a wet/slippery runway + 15 % for turbojets (none for piston or
 * turboprop). These apply to a length that is already at the site elevation and temperature.
 *
 * Validity: elevation −400 to 4 500 m, reference temperature −40 to 55 °C, effective gradient 0 to
 * 5 %, basic length 100 to 6 000 m. Pure: SI in, SI out, no rounding.
 */
import type { EngineType } from './aircraft.js';
import { standardTemperatureC } from './atmosphere.js';
import { RUNWAY_EFFECTIVE_GRADIENT_RANGE } from './fields.js';
import { check, inRange } from './validate.js';
import { notice, type Notice } from './notices.js';

export const CORRECTIONS_METHOD_VERSION = 'corrections/1';

/** ICAO elevation correction: 7 % per 300 m. */
export const ICAO_ELEVATION_RATE_PER_M = 0.07 / 300;
/** ICAO temperature correction: 1 % per °C above standard. */
export const ICAO_TEMPERATURE_RATE_PER_C = 0.01;
/** ICAO slope correction: 10 % per 1 % effective gradient. */
export const ICAO_SLOPE_RATE = 0.1;
/** Older textbook slope rule: 20 % per 1 % effective gradient (pre-1963 criterion). */
export const LEGACY_SLOPE_RATE = 0.2;
/** Combined elevation + temperature increase above which a specific study is required. */
export const ICAO_SPECIFIC_STUDY_LIMIT = 0.35;
/** Basic length from which the slope correction applies, m (from memory; configurable). */
export const ICAO_SLOPE_THRESHOLD_M = 900;
/** Authority gradient adjustment: metres of length per metre of centreline elevation difference. */
export const AUTHORITY_GRADIENT_M_PER_M = 10;
/** Authority wet-landing increase for turbojets. */
export const AUTHORITY_WET_LANDING_FACTOR = 1.15;

/** Tolerance on the 35 % comparison (floating-point noise only). */
const FLAG_TOLERANCE = 1e-12;

export const INDICATIVE_LABEL = 'indicative — specific study required';

export type LengthOperation = 'takeoff' | 'landing';
export type SlopeRule = 'icao-10' | 'legacy-20';
export type CorrectionStepKind = 'elevation' | 'temperature' | 'slope' | 'gradient-difference' | 'wet-landing';

/** One step of a sequential correction, as shown in the trace. */
export interface CorrectionStep {
  readonly kind: CorrectionStepKind;
  readonly label: string;
  /** Formula as text, with the numbers used. */
  readonly formula: string;
  /** Length before the step, m. */
  readonly before_m: number;
  /** Increment added by the step, m (0 when not applied). */
  readonly increment_m: number;
  /** Length after the step, m. */
  readonly after_m: number;
  /** Fractional increase of this step relative to `before_m`. */
  readonly fraction: number;
  readonly applied: boolean;
  readonly note?: string;
}

export interface CorrectionResult {
  readonly set: 'icao' | 'authority';
  readonly operation: LengthOperation;
  /** Length the corrections started from, m. */
  readonly basicLength_m: number;
  /** Corrected length, m (unrounded). */
  readonly corrected_m: number;
  readonly steps: readonly CorrectionStep[];
  /** ICAO only: combined elevation + temperature increase relative to the basic length (ratio). */
  readonly elevationTemperatureFraction?: number;
  /** ICAO only: true when the combined increase exceeds 35 % (percentage rule is then indicative). */
  readonly specificStudyRequired: boolean;
  /** "indicative — specific study required" when flagged. */
  readonly label?: string;
  readonly warnings: readonly Notice[];
  readonly methodVersion: string;
}

export interface IcaoCorrectionInput {
  /** Basic length at sea level, ISA, zero slope, m. */
  readonly basicLength_m: number;
  /** Aerodrome elevation, m. */
  readonly elevation_m: number;
  /** Aerodrome reference temperature, °C (takeoff; ignored for landing). */
  readonly referenceTemperature_c?: number;
  /** Effective gradient (high minus low point over runway length) as a ratio, 0.002 = 0.2 %. Takeoff only. */
  readonly effectiveGradient?: number;
  readonly operation?: LengthOperation;
  /** 'icao-10' (default) or the labelled older 'legacy-20' variant. */
  readonly slopeRule?: SlopeRule;
  /** Basic length from which the slope correction applies, m (default 900). */
  readonly slopeThreshold_m?: number;
}

const LENGTH_RANGE = { min: 100, max: 6000, unit: 'm' } as const;
/**
 * Length an authority adjustment accepts: a basic length, or one the ICAO elevation and temperature
 * corrections have already raised (at a high, hot site beyond 6,000 m; the plausibility bound then
 * says it cannot practically be needed). Project limit, no published source.
 */
const ADJUSTED_LENGTH_RANGE = { min: 100, max: 100_000, unit: 'm' } as const;
const ELEVATION_RANGE = { min: -400, max: 4500, unit: 'm' } as const;
const ART_RANGE = { min: -40, max: 55, unit: '°C' } as const;
const GRADIENT_RANGE = RUNWAY_EFFECTIVE_GRADIENT_RANGE;

function step(
  kind: CorrectionStepKind, label: string, formula: string, before: number, fraction: number, applied: boolean, note?: string,
): CorrectionStep {
  const increment = applied ? before * fraction : 0;
  return {
    kind, label, formula, before_m: before, increment_m: increment, after_m: before + increment,
    fraction: applied ? fraction : 0, applied, ...(note !== undefined ? { note } : {}),
  };
}

const pct = (x: number): string => `${(x * 100).toPrecision(6)} %`;

/**
 * ICAO percentage corrections, applied sequentially (each on the previous result).
 * Takeoff: elevation, temperature, slope. Landing: elevation only.
 */
export function icaoCorrections(input: IcaoCorrectionInput): CorrectionResult {
  const operation = input.operation ?? 'takeoff';
  check(operation === 'takeoff' || operation === 'landing', 'operation', operation, 'one of takeoff, landing');
  const l0 = inRange('basicLength_m', input.basicLength_m, LENGTH_RANGE);
  const e = inRange('elevation_m', input.elevation_m, ELEVATION_RANGE);
  const slopeRule = input.slopeRule ?? 'icao-10';
  check(slopeRule === 'icao-10' || slopeRule === 'legacy-20', 'slopeRule', slopeRule, 'one of icao-10, legacy-20');
  const threshold = input.slopeThreshold_m === undefined
    ? ICAO_SLOPE_THRESHOLD_M
    : inRange('slopeThreshold_m', input.slopeThreshold_m, { min: 0, max: 6000, unit: 'm' });
  const warnings: Notice[] = [];
  const steps: CorrectionStep[] = [];

  // 1. Elevation. Below sea level no reduction is taken (project choice, conservative).
  const eUsed = Math.max(0, e);
  const fe = ICAO_ELEVATION_RATE_PER_M * eUsed;
  steps.push(step('elevation', 'Elevation (7 % per 300 m)', `0.07 × ${eUsed} m / 300 m = ${pct(fe)}`, l0, fe, true,
    e < 0 ? 'Elevation below sea level: no reduction taken.' : undefined));
  let l = steps[0]!.after_m;

  if (operation === 'takeoff') {
    if (input.referenceTemperature_c === undefined) {
      check(false, 'referenceTemperature_c', undefined, `a temperature in °C (${ART_RANGE.min} to ${ART_RANGE.max}) for a takeoff length`);
    }
    const tRef = inRange('referenceTemperature_c', input.referenceTemperature_c, ART_RANGE);
    const g = inRange('effectiveGradient', input.effectiveGradient ?? 0, GRADIENT_RANGE);
    // 2. Temperature above the standard temperature at the elevation; never negative.
    const tStd = standardTemperatureC(e);
    const dT = tRef - tStd;
    const ft = ICAO_TEMPERATURE_RATE_PER_C * Math.max(0, dT);
    steps.push(step('temperature', 'Temperature (1 % per °C above standard)',
      `0.01 × (${tRef} − ${tStd.toPrecision(6)}) °C = ${pct(ft)}`, l, ft, true,
      dT < 0 ? 'Reference temperature below standard: no negative correction (from memory).' : undefined));
    l = steps[1]!.after_m;
    // 4. Slope, only from the threshold basic length.
    steps.push(icaoSlopeStep({ length_m: l, basicLength_m: l0, effectiveGradient: g, slopeRule, slopeThreshold_m: threshold }));
    l = steps[2]!.after_m;
    if (slopeRule === 'legacy-20') warnings.push(LEGACY_SLOPE_WARNING);
  }

  const etFraction = (steps[operation === 'takeoff' ? 1 : 0]!.after_m - l0) / l0;
  // A tiny tolerance keeps an exact 35 % (e.g. 1500 m elevation at standard temperature) unflagged.
  const flagged = etFraction > ICAO_SPECIFIC_STUDY_LIMIT + FLAG_TOLERANCE;
  if (flagged) {
    warnings.push(notice('corrections.beyond35Percent')`Elevation and temperature corrections together add ${pct(etFraction)} (> 35 %): the percentage rule is indicative only; a specific study is required.`);
  }
  return {
    set: 'icao', operation, basicLength_m: l0, corrected_m: l, steps,
    elevationTemperatureFraction: etFraction, specificStudyRequired: flagged,
    ...(flagged ? { label: INDICATIVE_LABEL } : {}),
    warnings, methodVersion: CORRECTIONS_METHOD_VERSION,
  };
}

export const LEGACY_SLOPE_WARNING: Notice =
  notice('corrections.legacySlopeRule')`Legacy 20 %/1 % slope rule: about twice the measured effect on jet transports; shown for comparison only.`;

export interface IcaoSlopeInput {
  /** Length the step multiplies (already corrected for elevation and temperature), m. */
  readonly length_m: number;
  /** Basic length compared with the threshold, m. */
  readonly basicLength_m: number;
  /** Effective gradient, ratio (0.004 = 0.4 %). */
  readonly effectiveGradient: number;
  readonly slopeRule?: SlopeRule;
  /** Basic length from which the step applies, m (default 900). */
  readonly slopeThreshold_m?: number;
}

/** The ICAO slope step alone: L · (1 + r · G[%]) when the basic length reaches the threshold. */
export function icaoSlopeStep(input: IcaoSlopeInput): CorrectionStep {
  const l = inRange('length_m', input.length_m, { min: 0, minInclusive: false, unit: 'm' });
  const l0 = inRange('basicLength_m', input.basicLength_m, { min: 0, minInclusive: false, unit: 'm' });
  const g = inRange('effectiveGradient', input.effectiveGradient, GRADIENT_RANGE);
  const slopeRule = input.slopeRule ?? 'icao-10';
  check(slopeRule === 'icao-10' || slopeRule === 'legacy-20', 'slopeRule', slopeRule, 'one of icao-10, legacy-20');
  const threshold = input.slopeThreshold_m === undefined
    ? ICAO_SLOPE_THRESHOLD_M
    : inRange('slopeThreshold_m', input.slopeThreshold_m, { min: 0, max: 6000, unit: 'm' });
  const rate = slopeRule === 'icao-10' ? ICAO_SLOPE_RATE : LEGACY_SLOPE_RATE;
  const gPct = g * 100;
  const fs = rate * gPct;
  const applies = l0 >= threshold;
  return step('slope',
    slopeRule === 'icao-10' ? 'Slope (10 % per 1 % effective gradient)' : 'Slope, legacy variant (20 % per 1 % effective gradient)',
    `${rate} × ${gPct.toPrecision(6)} % = ${pct(fs)}`, l, fs, applies,
    applies ? undefined : `Not applied: basic length ${l0} m is below the ${threshold} m threshold.`);
}

export interface AuthorityAdjustmentInput {
  /** Length already at the site elevation and temperature, zero gradient, dry, m. */
  readonly length_m: number;
  readonly operation: LengthOperation;
  /** Takeoff: centreline high point minus low point, m (≥ 0). */
  readonly centrelineDifference_m?: number;
  /** Landing: whether the runway is to be taken as wet/slippery. */
  readonly wet?: boolean;
  /** Landing: engine type; the wet increase applies to turbojets (turbofan) only. */
  readonly engineType?: EngineType;
}

/**
 * Authority guidance adjustments: takeoff + 10 m per m of centreline elevation difference;
 * landing × 1.15 on a wet runway for turbojets. No gradient adjustment for landing.
 */
export function authorityAdjustments(input: AuthorityAdjustmentInput): CorrectionResult {
  const l0 = inRange('length_m', input.length_m, ADJUSTED_LENGTH_RANGE);
  check(input.operation === 'takeoff' || input.operation === 'landing', 'operation', input.operation, 'one of takeoff, landing');
  const steps: CorrectionStep[] = [];
  const warnings: Notice[] = [];
  let l = l0;
  if (input.operation === 'takeoff') {
    const dh = inRange('centrelineDifference_m', input.centrelineDifference_m ?? 0, { min: 0, max: 100, unit: 'm' });
    const inc = AUTHORITY_GRADIENT_M_PER_M * dh;
    steps.push({
      kind: 'gradient-difference', label: 'Runway gradient (10 m per m of centreline elevation difference)',
      formula: `10 × ${dh} m = ${inc} m`, before_m: l, increment_m: inc, after_m: l + inc, fraction: inc / l, applied: true,
    });
    l += inc;
  } else {
    const wet = input.wet ?? false;
    const jet = input.engineType === 'turbofan';
    if (wet && input.engineType === undefined) {
      check(false, 'engineType', undefined, 'turbofan, turboprop or piston (the wet increase depends on it)');
    }
    const applies = wet && jet;
    steps.push(step('wet-landing', 'Wet runway, turbojets (+15 %)', `${wet ? 'wet' : 'dry'}, ${input.engineType ?? 'any engine'}: × ${applies ? AUTHORITY_WET_LANDING_FACTOR : 1}`,
      l, AUTHORITY_WET_LANDING_FACTOR - 1, applies,
      applies ? undefined : wet ? 'Not applied: the wet increase is for turbojets only.' : 'Not applied: dry runway.'));
    l = steps[0]!.after_m;
  }
  return {
    set: 'authority', operation: input.operation, basicLength_m: l0, corrected_m: l, steps,
    specificStudyRequired: false, warnings, methodVersion: CORRECTIONS_METHOD_VERSION,
  };
}
