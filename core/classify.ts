/**
 * Aircraft classification for aerodrome planning.
 *
 * - ICAO aerodrome reference code (ICAO Annex 14 Vol. I, Table 1-1): code number from the aeroplane
 *   reference field length (ARFL: < 800 m → 1, 800 to < 1 200 m → 2, 1 200 to < 1 800 m → 3,
 *   ≥ 1 800 m → 4); code letter from the wingspan alone, as in the current edition (A < 15 m,
 *   B < 24 m, C < 36 m, D < 52 m, E < 65 m, F < 80 m). Lower bounds inclusive, upper bounds exclusive.
 * - US aircraft approach category (AAC) from VREF at the maximum certificated landing mass
 *   (A < 91 kt, B < 121 kt, C < 141 kt, D < 166 kt, E ≥ 166 kt) and airplane design group (ADG) from
 *   tail height and wingspan, the more demanding governing (Horonjeff et al., Planning and Design of
 *   Airports, 5th ed., Tables 6-1 and 6-2, from AC 150/5300-13). Runway design code = AAC-ADG, e.g. "C-III".
 *
 * Thresholds are exact multiples of the knot (1852/3600 m/s) and of the foot (0.3048 m), compared in
 * SI so that a value converted from kt or ft lands on the intended side of a boundary.
 * Validity: ARFL and VREF any positive value (the top classes, code 4 and category E, are open-ended:
 * both are derived from the profile, so a profile that gives an implausible value is still classified,
 * with a warning, never refused); wingspan 1 to 100 m; tail height 0.5 to 40 m.
 * A wingspan of 80 m or more has no code letter, a span of 262 ft or a tail of 80 ft or more no design
 * group: those are results with a warning, not errors.
 */
import type { AircraftProfile } from './aircraft.js';
import { FT, KT } from './units.js';
import { inRange } from './validate.js';
import { notice, qty, type Notice } from './notices.js';

export const CLASSIFY_METHOD_VERSION = 'classification/1';

/** ARFL above which the classification warns that the profile is implausible, m (common practice). */
export const ARFL_PLAUSIBLE_MAX_M = 6000;
/** VREF above which the classification warns that the profile is implausible, m/s (about 290 kt; common practice). */
export const VREF_PLAUSIBLE_MAX_MPS = 150;

export type AerodromeCodeNumber = 1 | 2 | 3 | 4;
export type AerodromeCodeLetter = 'A' | 'B' | 'C' | 'D' | 'E' | 'F';
export type ApproachCategory = 'A' | 'B' | 'C' | 'D' | 'E';
export type DesignGroup = 'I' | 'II' | 'III' | 'IV' | 'V' | 'VI';

/** Upper bounds (exclusive) of code numbers 1–3, m. */
export const CODE_NUMBER_LIMITS_M: readonly number[] = [800, 1200, 1800];
/** Upper bounds (exclusive) of code letters A–F by wingspan, m. */
export const CODE_LETTER_SPAN_LIMITS_M: readonly number[] = [15, 24, 36, 52, 65, 80];
/** Upper bounds (exclusive) of approach categories A–D, kt. */
export const APPROACH_CATEGORY_LIMITS_KT: readonly number[] = [91, 121, 141, 166];
/** Upper bounds (exclusive) of design groups I–VI, ft. */
export const DESIGN_GROUP_TAIL_LIMITS_FT: readonly number[] = [20, 30, 45, 60, 66, 80];
export const DESIGN_GROUP_SPAN_LIMITS_FT: readonly number[] = [49, 79, 118, 171, 214, 262];

const LETTERS: readonly AerodromeCodeLetter[] = ['A', 'B', 'C', 'D', 'E', 'F'];
const CATEGORIES: readonly ApproachCategory[] = ['A', 'B', 'C', 'D', 'E'];
const GROUPS: readonly DesignGroup[] = ['I', 'II', 'III', 'IV', 'V', 'VI'];

/** Index of the first class whose exclusive upper bound exceeds x; limits.length when none does. */
function classIndex(x: number, limits_si: readonly number[]): number {
  let i = 0;
  while (i < limits_si.length && x >= limits_si[i]!) i++;
  return i;
}

/** ICAO code number (1–4) from the aeroplane reference field length, m. */
export function aerodromeCodeNumber(arfl_m: number): AerodromeCodeNumber {
  const x = inRange('arfl_m', arfl_m, { min: 0, minInclusive: false, unit: 'm' });
  return (classIndex(x, CODE_NUMBER_LIMITS_M) + 1) as AerodromeCodeNumber;
}

/** ICAO code letter (A–F) from the wingspan, m; null at 80 m or more (beyond code F). */
export function aerodromeCodeLetter(wingspan_m: number): AerodromeCodeLetter | null {
  const x = inRange('wingspan_m', wingspan_m, { min: 1, max: 100, unit: 'm' });
  return LETTERS[classIndex(x, CODE_LETTER_SPAN_LIMITS_M)] ?? null;
}

/** Aircraft approach category (A–E) from VREF at maximum landing mass, m/s. */
export function approachCategory(vref_mps: number): ApproachCategory {
  const v = inRange('vref_mps', vref_mps, { min: 0, minInclusive: false, unit: 'm/s' });
  return CATEGORIES[classIndex(v, APPROACH_CATEGORY_LIMITS_KT.map((k) => k * KT))]!;
}

export interface DesignGroupResult {
  /** Governing group (the more demanding of the two), or null beyond group VI. */
  readonly group: DesignGroup | null;
  readonly byTailHeight: DesignGroup | null;
  readonly bySpan: DesignGroup | null;
  readonly governedBy: 'tail height' | 'wingspan' | 'both';
}

/** Airplane design group from tail height and wingspan (m); the more demanding governs. */
export function airplaneDesignGroup(input: { readonly tailHeight_m: number; readonly wingspan_m: number }): DesignGroupResult {
  const h = inRange('tailHeight_m', input.tailHeight_m, { min: 0.5, max: 40, unit: 'm' });
  const b = inRange('wingspan_m', input.wingspan_m, { min: 1, max: 100, unit: 'm' });
  const ih = classIndex(h, DESIGN_GROUP_TAIL_LIMITS_FT.map((f) => f * FT));
  const ib = classIndex(b, DESIGN_GROUP_SPAN_LIMITS_FT.map((f) => f * FT));
  const i = Math.max(ih, ib);
  return {
    group: GROUPS[i] ?? null,
    byTailHeight: GROUPS[ih] ?? null,
    bySpan: GROUPS[ib] ?? null,
    governedBy: ih === ib ? 'both' : ih > ib ? 'tail height' : 'wingspan',
  };
}

/** Runway design code "AAC-ADG", e.g. "C-III"; null when the design group is undefined. */
export function runwayDesignCode(category: ApproachCategory, group: DesignGroup | null): string | null {
  return group === null ? null : `${category}-${group}`;
}

export interface AircraftClassification {
  readonly codeNumber: AerodromeCodeNumber;
  readonly codeLetter: AerodromeCodeLetter | null;
  /** E.g. "4C"; null without a code letter. */
  readonly aerodromeCode: string | null;
  readonly approachCategory: ApproachCategory;
  readonly designGroup: DesignGroupResult;
  /** E.g. "C-III". */
  readonly runwayDesignCode: string | null;
  readonly trace: readonly { readonly label: string; readonly value: number; readonly unit: string }[];
  readonly warnings: readonly Notice[];
  readonly methodVersion: string;
}

/**
 * Classifies an aircraft from its profile geometry, its aeroplane reference field length (m) and its
 * VREF at maximum landing mass (m/s), both computed by the caller (takeoff and landing models).
 */
export function classifyAircraft(
  aircraft: AircraftProfile,
  basis: { readonly arfl_m: number; readonly vref_mps: number },
): AircraftClassification {
  const codeNumber = aerodromeCodeNumber(basis.arfl_m);
  const codeLetter = aerodromeCodeLetter(aircraft.wingspan_m);
  const category = approachCategory(basis.vref_mps);
  const adg = airplaneDesignGroup({ tailHeight_m: aircraft.tailHeight_m, wingspan_m: aircraft.wingspan_m });
  const warnings: Notice[] = [];
  if (codeLetter === null) warnings.push(notice('classify.beyondCodeF')`Wingspan ${qty.shortLength(aircraft.wingspan_m, 1)} is 80 m (ICAO code letter limit) or more: beyond code letter F.`);
  if (adg.group === null) warnings.push(notice('classify.beyondAdgVI')`Tail height or wingspan beyond airplane design group VI.`);
  if (basis.vref_mps > VREF_PLAUSIBLE_MAX_MPS) {
    warnings.push(notice('classify.vrefImplausible')`VREF at maximum landing mass is ${qty.speed(basis.vref_mps)}, above the ${qty.speed(VREF_PLAUSIBLE_MAX_MPS)} of any transport aeroplane: check the profile's landing mass, wing area and CLmax (approach category E is open-ended).`);
  }
  if (basis.arfl_m > ARFL_PLAUSIBLE_MAX_M) {
    warnings.push(notice('classify.arflImplausible')`The aeroplane reference field length is ${qty.length(basis.arfl_m)}, above ${qty.length(ARFL_PLAUSIBLE_MAX_M)}: check the profile (code number 4 is open-ended).`);
  }
  return {
    codeNumber,
    codeLetter,
    aerodromeCode: codeLetter === null ? null : `${codeNumber}${codeLetter}`,
    approachCategory: category,
    designGroup: adg,
    runwayDesignCode: runwayDesignCode(category, adg.group),
    trace: [
      { label: 'Aeroplane reference field length', value: basis.arfl_m, unit: 'm' },
      { label: 'Wingspan', value: aircraft.wingspan_m, unit: 'm' },
      { label: 'Tail height', value: aircraft.tailHeight_m, unit: 'm' },
      { label: 'VREF at maximum landing mass', value: basis.vref_mps, unit: 'm/s' },
    ],
    warnings,
    methodVersion: CLASSIFY_METHOD_VERSION,
  };
}
