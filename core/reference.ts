/**
 * Reference-length method: lengths from an aircraft's own reference data instead of the physics model.
 *
 * 1. Single reference lengths (`aircraft.reference.takeoff_m` at MTOW, sea level, ISA, zero wind and
 *    slope; `landing_m` at MLW, sea level, standard temperature) corrected to the site by a correction
 *    set (core/corrections.ts):
 *      'icao'      — ICAO Aerodrome Design Manual Part 1 percentages: takeoff elevation, temperature,
 *                    slope; landing elevation only;
 *      'authority' — the same ICAO elevation and temperature percentages (the reference length is at
 *                    sea level, ISA), then the authority adjustments of AC 150/5325-4B instead of the
 *                    ICAO slope step: takeoff + 10 m per m of centreline elevation difference, landing
 *                    + 15 % wet for turbojets.
 * 2. A table of takeoff lengths by mass × elevation × temperature, interpolated multilinearly
 *    (trilinear; an axis of length 1 contributes one node with weight 1). Only the gradient step of the
 *    chosen set is applied afterwards (the table already holds elevation and temperature). A point
 *    outside the table is the result `{ status: 'outside-data', ... }`: never extrapolated.
 *
 * Validity: that of the corrections (elevation −400 to 4 500 m, temperature −40 to 55 °C, gradient
 * 0 to 5 %) and of the table's own range. Pure: SI in, SI out, no rounding.
 */
import type { AircraftProfile, ReferenceTable } from './aircraft.js';
import { validateAircraft } from './aircraft.js';
import {
  LEGACY_SLOPE_WARNING, authorityAdjustments, icaoCorrections, icaoSlopeStep,
  type CorrectionResult, type CorrectionStep, type LengthOperation, type SlopeRule,
} from './corrections.js';
import { check, inRange } from './validate.js';
import type { Notice } from './notices.js';

export const REFERENCE_METHOD_VERSION = 'reference-length/1';

export type CorrectionSet = 'icao' | 'authority';

/** Site conditions for the reference-length method. */
export interface ReferenceSite {
  /** Aerodrome elevation, m. */
  readonly elevation_m: number;
  /** Aerodrome reference (design) temperature, °C. */
  readonly referenceTemperature_c: number;
  /** Effective gradient, ratio (0.004 = 0.4 %), ICAO set. */
  readonly effectiveGradient: number;
  /** Centreline high point minus low point, m (authority set). */
  readonly centrelineDifference_m: number;
  /** Landing: runway taken as wet (authority set, turbojets). */
  readonly wet?: boolean;
}

export interface ReferenceLengthInput {
  readonly aircraft: AircraftProfile;
  readonly operation: LengthOperation;
  readonly site: ReferenceSite;
  readonly set: CorrectionSet;
  /** ICAO slope variant (default 'icao-10'). */
  readonly slopeRule?: SlopeRule;
  /** ICAO slope threshold on the basic length, m (default 900). */
  readonly slopeThreshold_m?: number;
}

export type ReferenceLengthResult =
  | {
    readonly status: 'ok';
    readonly operation: LengthOperation;
    readonly set: CorrectionSet;
    /** Reference length from the profile, m. */
    readonly reference_m: number;
    /** Length at the site, m (unrounded). */
    readonly length_m: number;
    readonly steps: readonly CorrectionStep[];
    readonly specificStudyRequired: boolean;
    readonly label?: string;
    readonly warnings: readonly Notice[];
    readonly methodVersion: string;
  }
  | {
    readonly status: 'no-data';
    readonly operation: LengthOperation;
    readonly reason: string;
    readonly methodVersion: string;
  };

/** The aircraft's single reference length corrected to the site by the chosen correction set. */
export function referenceLengthAtSite(input: ReferenceLengthInput): ReferenceLengthResult {
  const a = validateAircraft(input.aircraft);
  const op = input.operation;
  check(op === 'takeoff' || op === 'landing', 'operation', op, 'one of takeoff, landing');
  check(input.set === 'icao' || input.set === 'authority', 'set', input.set, 'one of icao, authority');
  const ref = op === 'takeoff' ? a.reference?.takeoff_m : a.reference?.landing_m;
  if (ref === undefined) {
    return {
      status: 'no-data', operation: op, methodVersion: REFERENCE_METHOD_VERSION,
      reason: `The profile "${a.id}" holds no reference ${op} length.`,
    };
  }
  const site = input.site;
  const steps: CorrectionStep[] = [];
  const warnings: Notice[] = [];
  let icao: CorrectionResult;
  if (input.set === 'icao') {
    icao = icaoCorrections({
      basicLength_m: ref, elevation_m: site.elevation_m, referenceTemperature_c: site.referenceTemperature_c,
      effectiveGradient: site.effectiveGradient, operation: op,
      ...(input.slopeRule !== undefined ? { slopeRule: input.slopeRule } : {}),
      ...(input.slopeThreshold_m !== undefined ? { slopeThreshold_m: input.slopeThreshold_m } : {}),
    });
    steps.push(...icao.steps);
    warnings.push(...icao.warnings);
    return {
      status: 'ok', operation: op, set: 'icao', reference_m: ref, length_m: icao.corrected_m, steps,
      specificStudyRequired: icao.specificStudyRequired, ...(icao.label ? { label: icao.label } : {}),
      warnings, methodVersion: REFERENCE_METHOD_VERSION,
    };
  }
  // Authority set: ICAO elevation (+ temperature for takeoff), then the authority adjustment.
  icao = icaoCorrections({
    basicLength_m: ref, elevation_m: site.elevation_m, referenceTemperature_c: site.referenceTemperature_c,
    effectiveGradient: 0, operation: op,
  });
  const elevTemp = icao.steps.filter((s) => s.kind !== 'slope');
  steps.push(...elevTemp);
  warnings.push(...icao.warnings);
  const atSite = elevTemp[elevTemp.length - 1]!.after_m;
  const adj = authorityAdjustments({
    length_m: atSite, operation: op, centrelineDifference_m: site.centrelineDifference_m,
    wet: site.wet ?? false, engineType: a.engineType,
  });
  steps.push(...adj.steps);
  return {
    status: 'ok', operation: op, set: 'authority', reference_m: ref, length_m: adj.corrected_m, steps,
    specificStudyRequired: icao.specificStudyRequired, ...(icao.label ? { label: icao.label } : {}),
    warnings, methodVersion: REFERENCE_METHOD_VERSION,
  };
}

// ---------------------------------------------------------------------------------------------
// Table interpolation

export type ReferenceTableAxis = 'mass_kg' | 'elevation_m' | 'temperature_c';

/** One table node used by the interpolation, with its weight. */
export interface ReferenceTableCorner {
  readonly index: readonly [number, number, number];
  readonly length_m: number;
  readonly weight: number;
}

export type ReferenceTableLookup =
  | {
    readonly status: 'ok';
    /** Interpolated length, m. */
    readonly length_m: number;
    readonly corners: readonly ReferenceTableCorner[];
    readonly methodVersion: string;
  }
  | {
    readonly status: 'outside-data';
    readonly field: ReferenceTableAxis;
    readonly value: number;
    /** Smallest and largest value of that axis. */
    readonly min: number;
    readonly max: number;
    /** The table bound nearest to the value. */
    readonly nearest: number;
    readonly reason: string;
    readonly methodVersion: string;
  };

export interface ReferenceTableLookupInput {
  readonly table: ReferenceTable;
  readonly mass_kg: number;
  readonly elevation_m: number;
  readonly temperature_c: number;
}

/** Relative tolerance for "on the bound" (guards against floating-point noise in unit conversions). */
const BOUND_REL_TOL = 1e-9;

interface Bracket { readonly i0: number; readonly i1: number; readonly t: number }

function bracket(axis: readonly number[], x: number): Bracket | undefined {
  const lo = axis[0]!;
  const hi = axis[axis.length - 1]!;
  const tol = BOUND_REL_TOL * Math.max(1, Math.abs(lo), Math.abs(hi));
  if (x < lo - tol || x > hi + tol) return undefined;
  if (axis.length === 1) return { i0: 0, i1: 0, t: 0 };
  const xc = Math.min(hi, Math.max(lo, x));
  let i = 0;
  while (i < axis.length - 2 && xc > axis[i + 1]!) i++;
  const a = axis[i]!;
  const b = axis[i + 1]!;
  return { i0: i, i1: i + 1, t: (xc - a) / (b - a) };
}

function tableShapeOk(t: ReferenceTable): void {
  // validateAircraft checks tables held in a profile; a bare table is checked here the same way.
  const axes: [ReferenceTableAxis, readonly number[]][] = [['mass_kg', t.mass_kg], ['elevation_m', t.elevation_m], ['temperature_c', t.temperature_c]];
  for (const [name, axis] of axes) {
    check(Array.isArray(axis) && axis.length >= 1, `table.${name}`, axis, 'a list of at least one value');
    axis.forEach((v, i) => inRange(`table.${name}[${i}]`, v, { unit: '' }));
    for (let i = 1; i < axis.length; i++) check(axis[i]! > axis[i - 1]!, `table.${name}[${i}]`, axis[i], 'ascending values');
  }
  check(t.length_m.length === t.mass_kg.length, 'table.length_m', t.length_m.length, `${t.mass_kg.length} rows`);
  t.length_m.forEach((plane, i) => {
    check(plane.length === t.elevation_m.length, `table.length_m[${i}]`, plane.length, `${t.elevation_m.length} rows`);
    plane.forEach((row, j) => {
      check(row.length === t.temperature_c.length, `table.length_m[${i}][${j}]`, row.length, `${t.temperature_c.length} values`);
      row.forEach((v, k) => inRange(`table.length_m[${i}][${j}][${k}]`, v, { min: 0, minInclusive: false, unit: 'm' }));
    });
  });
}

/**
 * Multilinear interpolation of the table at (mass, elevation, temperature). Exact at the nodes,
 * linear along each axis between nodes. Outside the table on any axis → 'outside-data'.
 */
export function interpolateReferenceTable(input: ReferenceTableLookupInput): ReferenceTableLookup {
  const t = input.table;
  tableShapeOk(t);
  const q: [ReferenceTableAxis, readonly number[], number][] = [
    ['mass_kg', t.mass_kg, inRange('mass_kg', input.mass_kg, { unit: 'kg' })],
    ['elevation_m', t.elevation_m, inRange('elevation_m', input.elevation_m, { unit: 'm' })],
    ['temperature_c', t.temperature_c, inRange('temperature_c', input.temperature_c, { unit: '°C' })],
  ];
  const br: Bracket[] = [];
  for (const [field, axis, x] of q) {
    const b = bracket(axis, x);
    if (b === undefined) {
      const min = axis[0]!;
      const max = axis[axis.length - 1]!;
      const nearest = x < min ? min : max;
      return {
        status: 'outside-data', field, value: x, min, max, nearest, methodVersion: REFERENCE_METHOD_VERSION,
        reason: `${field} ${x} lies outside the table (${min} to ${max}); the table is not extrapolated.`,
      };
    }
    br.push(b);
  }
  const [bm, be, bt] = br as [Bracket, Bracket, Bracket];
  const corners: ReferenceTableCorner[] = [];
  let sum = 0;
  for (const [im, wm] of [[bm.i0, 1 - bm.t], [bm.i1, bm.t]] as const) {
    for (const [ie, we] of [[be.i0, 1 - be.t], [be.i1, be.t]] as const) {
      for (const [it, wt] of [[bt.i0, 1 - bt.t], [bt.i1, bt.t]] as const) {
        const w = wm * we * wt;
        if (w === 0) continue;
        const v = t.length_m[im]![ie]![it]!;
        const existing = corners.findIndex((c) => c.index[0] === im && c.index[1] === ie && c.index[2] === it);
        if (existing >= 0) {
          // Axis of length 1: both bracket ends are the same node; merge the weights.
          const c = corners[existing]!;
          corners[existing] = { ...c, weight: c.weight + w };
        } else {
          corners.push({ index: [im, ie, it], length_m: v, weight: w });
        }
        sum += w * v;
      }
    }
  }
  return { status: 'ok', length_m: sum, corners, methodVersion: REFERENCE_METHOD_VERSION };
}

export interface ReferenceTableInput {
  readonly aircraft: AircraftProfile;
  /** Takeoff mass, kg. */
  readonly mass_kg: number;
  readonly site: ReferenceSite;
  /** Gradient step applied after interpolation. */
  readonly set: CorrectionSet;
  readonly slopeRule?: SlopeRule;
  readonly slopeThreshold_m?: number;
}

export type ReferenceTableResult =
  | {
    readonly status: 'ok';
    /** Interpolated length at the site elevation and temperature, zero slope, m. */
    readonly interpolated_m: number;
    /** After the gradient step of the chosen set, m. */
    readonly length_m: number;
    readonly corners: readonly ReferenceTableCorner[];
    readonly steps: readonly CorrectionStep[];
    readonly warnings: readonly Notice[];
    readonly methodVersion: string;
  }
  | Extract<ReferenceTableLookup, { status: 'outside-data' }>
  | { readonly status: 'no-data'; readonly reason: string; readonly methodVersion: string };

/** Takeoff length from the profile's reference table at the site, plus the gradient step of the chosen set. */
export function referenceTableAtSite(input: ReferenceTableInput): ReferenceTableResult {
  const a = validateAircraft(input.aircraft);
  check(input.set === 'icao' || input.set === 'authority', 'set', input.set, 'one of icao, authority');
  const table = a.reference?.table;
  if (table === undefined) {
    return { status: 'no-data', reason: `The profile "${a.id}" holds no reference table.`, methodVersion: REFERENCE_METHOD_VERSION };
  }
  const site = input.site;
  const look = interpolateReferenceTable({
    table, mass_kg: input.mass_kg, elevation_m: site.elevation_m, temperature_c: site.referenceTemperature_c,
  });
  if (look.status !== 'ok') return look;
  const l = look.length_m;
  let steps: readonly CorrectionStep[];
  const warnings: Notice[] = [];
  if (input.set === 'icao') {
    const g = inRange('site.effectiveGradient', site.effectiveGradient, { min: 0, max: 0.05, unit: '' });
    // The table already holds elevation and temperature: only the slope step, with the
    // interpolated length as the basic length compared with the threshold.
    const slopeRule = input.slopeRule ?? 'icao-10';
    steps = [icaoSlopeStep({
      length_m: l, basicLength_m: l, effectiveGradient: g, slopeRule,
      ...(input.slopeThreshold_m !== undefined ? { slopeThreshold_m: input.slopeThreshold_m } : {}),
    })];
    if (slopeRule === 'legacy-20') warnings.push(LEGACY_SLOPE_WARNING);
  } else {
    steps = authorityAdjustments({ length_m: l, operation: 'takeoff', centrelineDifference_m: site.centrelineDifference_m }).steps;
  }
  const last = steps[steps.length - 1];
  return {
    status: 'ok', interpolated_m: l, length_m: last ? last.after_m : l, corners: look.corners, steps, warnings,
    methodVersion: REFERENCE_METHOD_VERSION,
  };
}
