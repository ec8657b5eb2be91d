/**
 * Runway geometry inputs: the centreline elevation profile and the declared distances.
 *
 * Profile (points of chainage and elevation along the centreline, the first and last points being the
 * runway ends):
 * - effective gradient G = (z_max − z_min) / L, L = length between the end points (Horonjeff et al.,
 *   *Planning and Design of Airports*, 5th ed., p. 81; the same high-minus-low definition as ICAO's
 *   "maximum effective" gradient, Horonjeff Table 6-11 footnote; ICAO Annex 14 Vol I §3.1 and FAA AC 150/5325-4B (effective gradient));
 * - the high and low points and their difference ΔH = z_max − z_min (the elevation difference used by
 *   the authority's 10-ft-per-ft takeoff-length adjustment, FAA AC 150/5325-4B);
 * - the steepest slope between consecutive points, and the average slope for a takeoff in each direction
 *   (end to end, signed + uphill in the direction of takeoff);
 * - the largest deviation of an intermediate point from the straight line joining the ends (Horonjeff
 *   p. 81: the average uniform gradient may be used when no point deviates more than 5 ft from it).
 * Plausibility against ICAO limits (Annex 14 via Horonjeff Table 6-11): maximum effective gradient 1 %
 * for code 3-4 and 2 % for code 1-2; maximum longitudinal slope 2 / 2 / 1.5 / 1.25 % for code 1/2/3/4,
 * 0.8 % in the first and last quarter for code 4. Exceeding them gives warnings, not errors.
 *
 * Declared distances per take-off direction: stopway = ASDA − TORA, clearway = TODA − TORA; checks
 * TORA ≤ TODA, TORA ≤ ASDA, LDA ≤ ASDA, clearway ≤ half of TORA (Annex 14 recommendation, from
 * memory), each distance positive and at most 6000 m.
 *
 * Validity: elevations −610..5000 m; profile length up to 8000 m; slopes are ratios (0.01 = 1 %).
 */
import { InputDomainError } from './errors.js';
import { RUNWAY_EFFECTIVE_GRADIENT_RANGE, RUNWAY_SLOPE_RANGE } from './fields.js';
import { check, inRange } from './validate.js';
import { notice, qty, type Notice } from './notices.js';


/** One takeoff/landing direction of a runway with its declared distances, m. */
export interface RunwayDirectionInput {
  /** Runway designator of this takeoff/landing direction, e.g. "12". */
  readonly designator: string;
  readonly tora_m: number;
  readonly toda_m: number;
  readonly asda_m: number;
  readonly lda_m: number;
}

export const RUNWAY_METHOD_VERSION = 'runway-geometry/1';

/** One intermediate value shown with a runway result. */
export interface RunwayTraceEntry {
  readonly label: string;
  readonly value: number;
  /** Unit symbol ("m", "ratio", ...). */
  readonly unit: string;
}

/** A point of the centreline profile. */
export interface ProfilePoint {
  /** Distance along the centreline, m (any origin; increasing along the profile). */
  readonly chainage_m: number;
  /** Elevation above mean sea level, m. */
  readonly elevation_m: number;
}

export interface RunwayProfileInput {
  /** At least two points, strictly increasing chainage; the first and last are the runway ends. */
  readonly points: readonly ProfilePoint[];
  /** ICAO aerodrome reference code number, for the plausibility limits; absent = the loosest limits. */
  readonly codeNumber?: 1 | 2 | 3 | 4;
  /** Designators of the two take-off directions, e.g. { increasingChainage: '09', decreasingChainage: '27' }. */
  readonly designators?: { readonly increasingChainage: string; readonly decreasingChainage: string };
}

/** Slope of the stretch between two consecutive profile points. */
export interface ProfileSegmentSlope {
  readonly fromChainage_m: number;
  readonly toChainage_m: number;
  /** Δz/Δx, ratio; + when rising toward increasing chainage. */
  readonly slope: number;
}

export type TakeoffDirection = 'increasing-chainage' | 'decreasing-chainage';

export interface TakeoffDirectionSlope {
  readonly direction: TakeoffDirection;
  readonly designator?: string;
  /** Elevation where the take-off starts, m. */
  readonly startElevation_m: number;
  /** Elevation at the far end, m. */
  readonly endElevation_m: number;
  /** (end − start)/length, ratio; + uphill in the direction of take-off. */
  readonly averageSlope: number;
}

/** ICAO limits used for the plausibility warnings. */
export interface ProfileLimits {
  readonly codeNumber?: 1 | 2 | 3 | 4;
  /** Ratio. */
  readonly maxEffectiveGradient: number;
  /** Ratio, any stretch of the runway. */
  readonly maxLongitudinalSlope: number;
  /** Ratio, first and last quarter of the runway (code 4 only). */
  readonly maxEndQuarterSlope?: number;
  readonly source: string;
}

export interface RunwayProfileResult {
  readonly method: string;
  /** Distance between the end points, m. */
  readonly length_m: number;
  /** Highest point (the first one when several share the height). */
  readonly highPoint: ProfilePoint;
  /** Lowest point (the first one when several share the height). */
  readonly lowPoint: ProfilePoint;
  /** z_max − z_min, m. */
  readonly elevationDifference_m: number;
  /** (z_max − z_min)/L, ratio. */
  readonly effectiveGradient: number;
  readonly segments: readonly ProfileSegmentSlope[];
  /** The stretch with the largest |slope| (the first one on a tie). */
  readonly steepestSegment: ProfileSegmentSlope;
  readonly takeoffDirections: readonly [TakeoffDirectionSlope, TakeoffDirectionSlope];
  /** Largest |deviation| of a point from the straight line joining the ends, m. */
  readonly maxDeviationFromEndLine_m: number;
  readonly limits: ProfileLimits;
  readonly trace: readonly RunwayTraceEntry[];
  readonly warnings: readonly Notice[];
}

/**
 * The slopes a study's performance models can take from a profile (core/fields.ts): each takeoff
 * direction's average slope within RUNWAY_SLOPE_RANGE (±3 %) and the effective gradient within
 * RUNWAY_EFFECTIVE_GRADIENT_RANGE (5 %). Steeper local stretches are allowed (they only warn, against
 * the ICAO limits); throws InputDomainError on `field` (the profile's path) otherwise.
 */
export function checkProfileSlopes(profile: Pick<RunwayProfileResult, 'takeoffDirections' | 'effectiveGradient'>, field: string): void {
  const avg = profile.takeoffDirections[0].averageSlope;
  check(
    Math.abs(avg) <= RUNWAY_SLOPE_RANGE.max + SLOPE_COMPARE_TOLERANCE,
    field,
    `${pct(Math.abs(avg))} average slope`,
    `an average slope end to end of ${pct(RUNWAY_SLOPE_RANGE.max)} or less, the slope range of the takeoff and landing models (ICAO Annex 14 limits runways to 1 to 2 %)`,
  );
  check(
    profile.effectiveGradient <= RUNWAY_EFFECTIVE_GRADIENT_RANGE.max + SLOPE_COMPARE_TOLERANCE,
    field,
    `${pct(profile.effectiveGradient)} effective gradient`,
    `an effective gradient (high minus low point over the length) of ${pct(RUNWAY_EFFECTIVE_GRADIENT_RANGE.max)} or less, the range of the length corrections`,
  );
}

export const PROFILE_ELEVATION_RANGE = { min: -610, max: 5000, unit: 'm' } as const;
export const PROFILE_CHAINAGE_RANGE = { min: -20000, max: 20000, unit: 'm' } as const;
/** Longest centreline profile accepted (runway plus stopways), m. */
export const MAX_PROFILE_LENGTH_M = 8000;
/** Slope comparisons ignore differences below this (ratio), so that exactly 1 % is not "above 1 %". */
export const SLOPE_COMPARE_TOLERANCE = 1e-12;

const LIMITS_SOURCE = 'ICAO Annex 14 Vol. I, as tabulated in Horonjeff et al., Planning and Design of Airports, 5th ed., Table 6-11';

/** ICAO plausibility limits for a code number; without one, the loosest limits of any code. */
export function profileLimits(codeNumber?: 1 | 2 | 3 | 4): ProfileLimits {
  switch (codeNumber) {
    case 1:
    case 2:
      return { codeNumber, maxEffectiveGradient: 0.02, maxLongitudinalSlope: 0.02, source: LIMITS_SOURCE };
    case 3:
      return { codeNumber, maxEffectiveGradient: 0.01, maxLongitudinalSlope: 0.015, source: LIMITS_SOURCE };
    case 4:
      return { codeNumber, maxEffectiveGradient: 0.01, maxLongitudinalSlope: 0.0125, maxEndQuarterSlope: 0.008, source: LIMITS_SOURCE };
    default:
      return { maxEffectiveGradient: 0.02, maxLongitudinalSlope: 0.02, source: `${LIMITS_SOURCE}; no code number given, loosest limits` };
  }
}

const pct = (ratio: number): string => `${(ratio * 100).toFixed(2)} %`;

/** Profile figures: effective gradient, high/low points, ΔH, local and directional slopes, plausibility warnings. */
export function analyseRunwayProfile(input: RunwayProfileInput): RunwayProfileResult {
  const pts = input.points;
  check(Array.isArray(pts) && pts.length >= 2, 'points', Array.isArray(pts) ? `${pts.length} point(s)` : pts, 'at least two profile points');
  if (input.codeNumber !== undefined) {
    check([1, 2, 3, 4].includes(input.codeNumber), 'codeNumber', input.codeNumber, 'a code number 1, 2, 3 or 4');
  }
  if (input.designators !== undefined) {
    validateDesignator('designators.increasingChainage', input.designators.increasingChainage);
    validateDesignator('designators.decreasingChainage', input.designators.decreasingChainage);
  }
  const points: ProfilePoint[] = pts.map((p, i) => ({
    chainage_m: inRange(`points[${i}].chainage_m`, p.chainage_m, PROFILE_CHAINAGE_RANGE),
    elevation_m: inRange(`points[${i}].elevation_m`, p.elevation_m, PROFILE_ELEVATION_RANGE),
  }));
  for (let i = 1; i < points.length; i++) {
    const prev = (points[i - 1] as ProfilePoint).chainage_m;
    const cur = (points[i] as ProfilePoint).chainage_m;
    check(cur > prev, `points[${i}].chainage_m`, cur, `greater than the previous chainage (${prev} m): chainage must increase strictly`);
  }
  const start = points[0] as ProfilePoint;
  const end = points[points.length - 1] as ProfilePoint;
  const length = end.chainage_m - start.chainage_m;
  check(length <= MAX_PROFILE_LENGTH_M, 'points', `${length} m`, `a profile at most ${MAX_PROFILE_LENGTH_M} m long (first to last chainage)`);

  let high = start;
  let low = start;
  for (const p of points) {
    if (p.elevation_m > high.elevation_m) high = p;
    if (p.elevation_m < low.elevation_m) low = p;
  }
  const dH = high.elevation_m - low.elevation_m;
  const effective = dH / length;

  const segments: ProfileSegmentSlope[] = [];
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1] as ProfilePoint;
    const b = points[i] as ProfilePoint;
    segments.push({ fromChainage_m: a.chainage_m, toChainage_m: b.chainage_m, slope: (b.elevation_m - a.elevation_m) / (b.chainage_m - a.chainage_m) });
  }
  let steepest = segments[0] as ProfileSegmentSlope;
  for (const s of segments) if (Math.abs(s.slope) > Math.abs(steepest.slope)) steepest = s;

  const endSlope = (end.elevation_m - start.elevation_m) / length;
  let maxDev = 0;
  for (const p of points) {
    const line = start.elevation_m + endSlope * (p.chainage_m - start.chainage_m);
    const dev = p.elevation_m - line;
    if (Math.abs(dev) > Math.abs(maxDev)) maxDev = dev;
  }

  const inc: TakeoffDirectionSlope = {
    direction: 'increasing-chainage',
    ...(input.designators ? { designator: input.designators.increasingChainage } : {}),
    startElevation_m: start.elevation_m,
    endElevation_m: end.elevation_m,
    averageSlope: endSlope,
  };
  const dec: TakeoffDirectionSlope = {
    direction: 'decreasing-chainage',
    ...(input.designators ? { designator: input.designators.decreasingChainage } : {}),
    startElevation_m: end.elevation_m,
    endElevation_m: start.elevation_m,
    averageSlope: -endSlope,
  };

  const limits = profileLimits(input.codeNumber);
  const warnings: Notice[] = [];
  const codeText = input.codeNumber === undefined ? 'any code number' : `code ${input.codeNumber}`;
  if (effective > limits.maxEffectiveGradient + SLOPE_COMPARE_TOLERANCE) {
    warnings.push(notice('runway.effectiveGradientAboveMax')`Effective gradient ${pct(effective)} is above the ICAO maximum of ${pct(limits.maxEffectiveGradient)} for ${codeText}; check the profile and its units.`);
  }
  const steepOnes = segments.filter((s) => Math.abs(s.slope) > limits.maxLongitudinalSlope + SLOPE_COMPARE_TOLERANCE);
  if (steepOnes.length > 0) {
    warnings.push(notice('runway.steepStretches')`${steepOnes.length} stretch(es) steeper than the ICAO longitudinal maximum of ${pct(limits.maxLongitudinalSlope)} for ${codeText} (steepest ${pct(Math.abs(steepest.slope))} between chainage ${qty.length(steepest.fromChainage_m)} and ${qty.length(steepest.toChainage_m)}).`);
  }
  if (limits.maxEndQuarterSlope !== undefined) {
    const q1 = start.chainage_m + length / 4;
    const q3 = end.chainage_m - length / 4;
    const endSteep = segments.filter(
      (s) => (s.fromChainage_m < q1 || s.toChainage_m > q3) && Math.abs(s.slope) > (limits.maxEndQuarterSlope as number) + SLOPE_COMPARE_TOLERANCE,
    );
    if (endSteep.length > 0) {
      warnings.push(notice('runway.steepEndQuarter')`${endSteep.length} stretch(es) in the first or last quarter steeper than ${pct(limits.maxEndQuarterSlope)} (ICAO, code 4).`);
    }
  }

  const trace: RunwayTraceEntry[] = [
    { label: 'profile length', value: length, unit: 'm' },
    { label: 'high point elevation', value: high.elevation_m, unit: 'm' },
    { label: 'high point chainage', value: high.chainage_m, unit: 'm' },
    { label: 'low point elevation', value: low.elevation_m, unit: 'm' },
    { label: 'low point chainage', value: low.chainage_m, unit: 'm' },
    { label: 'elevation difference (high − low)', value: dH, unit: 'm' },
    { label: 'effective gradient', value: effective, unit: 'ratio' },
    { label: 'steepest local slope', value: steepest.slope, unit: 'ratio' },
    { label: 'average slope, take-off toward increasing chainage', value: endSlope, unit: 'ratio' },
    { label: 'largest deviation from the end-to-end line', value: maxDev, unit: 'm' },
  ];

  return {
    method: RUNWAY_METHOD_VERSION,
    length_m: length,
    highPoint: high,
    lowPoint: low,
    elevationDifference_m: dH,
    effectiveGradient: effective,
    segments,
    steepestSegment: steepest,
    takeoffDirections: [inc, dec],
    maxDeviationFromEndLine_m: maxDev,
    limits,
    trace,
    warnings,
  };
}

// ---------------------------------------------------------------------------------------------
// Declared distances

/** Declared distances of one take-off/landing direction. */
export interface DeclaredDistancesInput {
  /** Runway designator, two digits 01..36 with an optional L, C or R. */
  readonly designator: string;
  /** Take-off run available, m. */
  readonly tora_m: number;
  /** Take-off distance available, m. */
  readonly toda_m: number;
  /** Accelerate-stop distance available, m. */
  readonly asda_m: number;
  /** Landing distance available, m. */
  readonly lda_m: number;
}

export interface DeclaredDistancesResult extends DeclaredDistancesInput {
  /** ASDA − TORA, m. */
  readonly stopway_m: number;
  /** TODA − TORA, m. */
  readonly clearway_m: number;
  readonly trace: readonly RunwayTraceEntry[];
  readonly warnings: readonly Notice[];
}

export const DECLARED_DISTANCE_RANGE = { min: 0, minInclusive: false, max: 6000, unit: 'm' } as const;
/** Clearway at most this fraction of TORA (ICAO Annex 14 recommendation; from memory). */
export const MAX_CLEARWAY_FRACTION_OF_TORA = 0.5;

const DESIGNATOR = /^(0[1-9]|[12][0-9]|3[0-6])([LCR]?)$/;

function validateDesignator(field: string, d: unknown): string {
  check(typeof d === 'string' && DESIGNATOR.test(d), field, d, 'a runway designator: two digits 01..36 with an optional L, C or R');
  return d as string;
}

function declared(input: DeclaredDistancesInput, path: string): DeclaredDistancesResult {
  const designator = validateDesignator(`${path}designator`, input.designator);
  const tora = inRange(`${path}tora_m`, input.tora_m, DECLARED_DISTANCE_RANGE);
  const toda = inRange(`${path}toda_m`, input.toda_m, DECLARED_DISTANCE_RANGE);
  const asda = inRange(`${path}asda_m`, input.asda_m, DECLARED_DISTANCE_RANGE);
  const lda = inRange(`${path}lda_m`, input.lda_m, DECLARED_DISTANCE_RANGE);
  check(toda >= tora, `${path}toda_m`, toda, `at least TORA (${tora} m): TODA = TORA + clearway`);
  check(asda >= tora, `${path}asda_m`, asda, `at least TORA (${tora} m): ASDA = TORA + stopway`);
  check(lda <= asda, `${path}lda_m`, lda, `at most ASDA (${asda} m)`);
  const clearway = toda - tora;
  const stopway = asda - tora;
  check(
    clearway <= MAX_CLEARWAY_FRACTION_OF_TORA * tora,
    `${path}toda_m`,
    toda,
    `at most TORA + ${MAX_CLEARWAY_FRACTION_OF_TORA * 100} % of TORA (${tora * (1 + MAX_CLEARWAY_FRACTION_OF_TORA)} m): ` +
      'a clearway should not exceed half the take-off run available (ICAO Annex 14 recommendation, from memory)',
  );
  const warnings: Notice[] = [];
  if (lda > tora) {
    warnings.push(notice('runway.ldaAboveTora')`${designator}: LDA ${qty.length(lda)} is longer than TORA ${qty.length(tora)}; this happens only when the take-off run is shortened by declared-distance reductions — check.`);
  }
  return {
    designator,
    tora_m: tora,
    toda_m: toda,
    asda_m: asda,
    lda_m: lda,
    stopway_m: stopway,
    clearway_m: clearway,
    trace: [
      { label: `${designator} stopway (ASDA − TORA)`, value: stopway, unit: 'm' },
      { label: `${designator} clearway (TODA − TORA)`, value: clearway, unit: 'm' },
    ],
    warnings,
  };
}

/** Checks one direction's declared distances and derives its stopway and clearway. */
export function checkDeclaredDistances(input: DeclaredDistancesInput): DeclaredDistancesResult {
  return declared(input, '');
}

export interface RunwayDeclaredDistancesResult {
  readonly directions: readonly DeclaredDistancesResult[];
  readonly warnings: readonly Notice[];
}

/** True when two designators are the two ends of one runway (numbers 18 apart, L↔R, C↔C, none↔none). */
export function areReciprocal(a: string, b: string): boolean {
  const ma = DESIGNATOR.exec(a);
  const mb = DESIGNATOR.exec(b);
  if (!ma || !mb) return false;
  const na = Number(ma[1]);
  const nb = Number(mb[1]);
  const swap: Readonly<Record<string, string>> = { L: 'R', R: 'L', C: 'C', '': '' };
  return Math.abs(na - nb) === 18 && swap[ma[2] ?? ''] === (mb[2] ?? '');
}

/** Checks the declared distances of every direction of a runway (one or two directions, distinct designators). */
export function checkRunwayDeclaredDistances(input: { readonly directions: readonly DeclaredDistancesInput[] }): RunwayDeclaredDistancesResult {
  const dirs = input.directions;
  check(
    Array.isArray(dirs) && dirs.length >= 1 && dirs.length <= 2,
    'directions',
    Array.isArray(dirs) ? `${dirs.length} directions` : dirs,
    'one or two runway directions',
  );
  const results = dirs.map((d, i) => declared(d, `directions[${i}].`));
  const warnings = results.flatMap((r) => r.warnings);
  const [a, b] = results;
  if (a && b) {
    if (a.designator === b.designator) {
      throw new InputDomainError('directions[1].designator', b.designator, `a designator other than directions[0] (${a.designator})`);
    }
    if (!areReciprocal(a.designator, b.designator)) {
      warnings.push(notice('runway.notReciprocal')`${a.designator} and ${b.designator} are not the two ends of one runway (designators should differ by 18).`);
    }
  }
  return { directions: results, warnings };
}
