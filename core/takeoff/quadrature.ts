/**
 * Cumulative time and distance of a ground run as functions of groundspeed, by piecewise
 * Gauss–Legendre quadrature over speed.
 *
 * On the ground every force depends on speed alone, so the equation of motion m·dV/dt = F(V) gives
 * t(V) = ∫ dV / a(V) and s(V) = ∫ V dV / a(V) (Raymer, *Aircraft Design: A Conceptual Approach*, §17.8;
 * Anderson, *Aircraft Performance and Design*, §6.7; Raymer §17.8; Anderson §6.7). The speed range is cut at
 * every kink of a(V) (flat-rating corner, propeller static cap, tail-up speed, zero airspeed) and into
 * a few equal intervals; on each interval the integrands are sampled at the n Gauss–Legendre nodes
 * (Abramowitz & Stegun 25.4.29) and replaced by their interpolating polynomial, whose antiderivative
 * is kept. The integral over a whole interval then equals the n-point Gauss rule (exact to degree
 * 2n − 1); a partial interval (any speed, e.g. an engine-failure speed) uses the same polynomial.
 * Where the airspeed passes through zero, the turbofan lapse has a √M term; the interval touching
 * that point is mapped by V = V0 + L·((x+1)/2)² so the integrand is smooth in x.
 *
 * Validity: a(V) ≥ `minAccel` > 0 at every node (otherwise the build reports where it fails).
 */
import { gaussLegendre } from '../numeric/index.js';
import { ConvergenceError } from '../errors.js';

/** Gauss–Legendre points per interval. */
export const GAUSS_POINTS = 5;
/** Newton tolerance on the local coordinate x ∈ [−1, 1] when inverting t(V). */
export const INVERSE_X_TOL = 1e-13;
/** Iteration cap of that inversion. */
export const INVERSE_MAX_ITERATIONS = 60;

/**
 * Matrix M ((n+1) × n, row-major) such that the antiderivative F(x) = ∫_{-1}^{x} p(ξ) dξ of the
 * polynomial p interpolating values f_j at nodes x_j has monomial coefficients c_k = Σ_j M[k][j]·f_j.
 */
function antiderivativeMatrix(nodes: Float64Array): Float64Array {
  const n = nodes.length;
  const m = new Float64Array((n + 1) * n);
  for (let j = 0; j < n; j++) {
    // Lagrange basis ℓ_j as monomial coefficients.
    let poly = [1];
    let denom = 1;
    for (let q = 0; q < n; q++) {
      if (q === j) continue;
      const next = new Array<number>(poly.length + 1).fill(0);
      for (let k = 0; k < poly.length; k++) {
        next[k + 1]! += poly[k]!;
        next[k]! -= nodes[q]! * poly[k]!;
      }
      poly = next;
      denom *= nodes[j]! - nodes[q]!;
    }
    let c0 = 0;
    for (let k = 0; k < n; k++) {
      const a = poly[k]! / denom / (k + 1);
      m[(k + 1) * n + j] = a;
      c0 -= a * ((k + 1) % 2 === 0 ? 1 : -1); // F(−1) = 0
    }
    m[j] = c0;
  }
  return m;
}

const RULE = gaussLegendre(GAUSS_POINTS);
const ANTI = antiderivativeMatrix(RULE.nodes);
const NC = GAUSS_POINTS + 1; // coefficients per antiderivative
/** Scratch buffers for node values, filled and consumed within one synchronous table build. */
const FT_SCRATCH = new Float64Array(GAUSS_POINTS);
const FS_SCRATCH = new Float64Array(GAUSS_POINTS);

/** Interval maps: 0 linear; 1 square-root point at the left end; 2 at the right end. */
type MapKind = 0 | 1 | 2;

/** Plain arrays are used rather than typed arrays: these tables are small and short-lived. */
export interface SpeedTable {
  /** Number of intervals. */
  readonly count: number;
  readonly lo: readonly number[];
  readonly hi: readonly number[];
  readonly kind: readonly number[];
  /** Antiderivative coefficients of dt/dx and ds/dx, NC per interval. */
  readonly tCoef: readonly number[];
  readonly sCoef: readonly number[];
  /** Cumulative time (s) and distance (m) at each interval start; last entry = end of range. */
  readonly tCum: readonly number[];
  readonly sCum: readonly number[];
  /** Upper end of the speed range, m/s. */
  readonly vEnd: number;
  /** Smallest acceleration met at a node, m/s². */
  readonly minAccel_mps2: number;
  /** Acceleration evaluations made. */
  readonly evaluations: number;
}

export type TableBuild =
  | { readonly ok: true; readonly table: SpeedTable }
  | { readonly ok: false; readonly speed_mps: number; readonly accel_mps2: number };

export interface TableInput {
  /** Acceleration along the run (m/s², > 0) as a function of groundspeed (m/s). */
  readonly accel: (v: number) => number;
  /** Speed range [0, vEnd], m/s (vEnd > 0). */
  readonly vEnd: number;
  /** Groundspeeds where a(V) has a kink; those outside (0, vEnd) are ignored. */
  readonly breakpoints: readonly number[];
  /** Groundspeed where the airspeed is zero (square-root behaviour), if in [0, vEnd). */
  readonly zeroAirspeedAt?: number;
  /** Target number of intervals over the whole range (at least one per segment). */
  readonly intervals: number;
  /** Smallest acceptable acceleration, m/s². */
  readonly minAccel: number;
}

const BREAK_EPS = 1e-9;

function mapV(kind: number, lo: number, hi: number, x: number): number {
  const l = hi - lo;
  if (kind === 0) return lo + (l * (x + 1)) / 2;
  if (kind === 1) { const u = (x + 1) / 2; return lo + l * u * u; }
  const u = (1 - x) / 2;
  return hi - l * u * u;
}

function mapJ(kind: number, lo: number, hi: number, x: number): number {
  const l = hi - lo;
  if (kind === 0) return l / 2;
  if (kind === 1) return (l * (x + 1)) / 2;
  return (l * (1 - x)) / 2;
}

function xOf(kind: number, lo: number, hi: number, v: number): number {
  const l = hi - lo;
  if (kind === 0) return (2 * (v - lo)) / l - 1;
  if (kind === 1) return 2 * Math.sqrt(Math.max(0, (v - lo) / l)) - 1;
  return 1 - 2 * Math.sqrt(Math.max(0, (hi - v) / l));
}

/** Builds the cumulative table, or reports the first node whose acceleration is below `minAccel`. */
export function buildSpeedTable(i: TableInput): TableBuild {
  const vEnd = i.vEnd;
  const eps = BREAK_EPS * (1 + vEnd);
  const zero = i.zeroAirspeedAt;
  const cuts = i.breakpoints.slice();
  if (zero !== undefined && zero > eps && zero < vEnd - eps) cuts.push(zero);
  if (cuts.length > 1) cuts.sort((p, q) => p - q);
  const pts: number[] = [0];
  for (let c = 0; c < cuts.length; c++) {
    const v = cuts[c]!;
    if (v > pts[pts.length - 1]! + eps && v < vEnd - eps) pts.push(v);
  }
  pts.push(vEnd);
  const segs = pts.length - 1;
  // Distribute intervals by length, at least one per segment.
  const lo: number[] = [];
  const hi: number[] = [];
  const kind: MapKind[] = [];
  for (let s = 0; s < segs; s++) {
    const a = pts[s]!;
    const b = pts[s + 1]!;
    const k = Math.max(1, Math.round((i.intervals * (b - a)) / vEnd));
    for (let q = 0; q < k; q++) {
      const l0 = a + ((b - a) * q) / k;
      const h0 = q === k - 1 ? b : a + ((b - a) * (q + 1)) / k;
      let mk: MapKind = 0;
      if (zero !== undefined) {
        if (q === 0 && Math.abs(a - zero) <= eps) mk = 1;
        else if (q === k - 1 && Math.abs(b - zero) <= eps) mk = 2;
      }
      lo.push(l0);
      hi.push(h0);
      kind.push(mk);
    }
  }
  const count = lo.length;
  const n = GAUSS_POINTS;
  const tCoef: number[] = [];
  const sCoef: number[] = [];
  const tCum: number[] = [0];
  const sCum: number[] = [0];
  const ft = FT_SCRATCH;
  const fs = FS_SCRATCH;
  let minA = Infinity;
  let evals = 0;
  for (let k = 0; k < count; k++) {
    const l0 = lo[k]!;
    const h0 = hi[k]!;
    const mk = kind[k]!;
    for (let j = 0; j < n; j++) {
      const x = RULE.nodes[j]!;
      const v = mapV(mk, l0, h0, x);
      const a = i.accel(v);
      evals++;
      if (!(a >= i.minAccel)) return { ok: false, speed_mps: v, accel_mps2: Number.isFinite(a) ? a : 0 };
      if (a < minA) minA = a;
      const jac = mapJ(mk, l0, h0, x);
      ft[j] = jac / a;
      fs[j] = (v * jac) / a;
    }
    let tInt = 0;
    let sInt = 0;
    for (let r = 0; r < NC; r++) {
      let ct = 0;
      let cs = 0;
      for (let j = 0; j < n; j++) {
        const mm = ANTI[r * n + j]!;
        ct += mm * ft[j]!;
        cs += mm * fs[j]!;
      }
      tCoef.push(ct);
      sCoef.push(cs);
      tInt += ct;
      sInt += cs;
    }
    tCum.push(tCum[k]! + tInt);
    sCum.push(sCum[k]! + sInt);
  }
  return {
    ok: true,
    table: {
      count, lo, hi, kind, tCoef, sCoef, tCum, sCum, vEnd, minAccel_mps2: minA, evaluations: evals,
    },
  };
}

function horner(c: readonly number[], off: number, x: number): number {
  let r = c[off + NC - 1]!;
  for (let k = NC - 2; k >= 0; k--) r = r * x + c[off + k]!;
  return r;
}

function hornerDeriv(c: readonly number[], off: number, x: number): number {
  let r = (NC - 1) * c[off + NC - 1]!;
  for (let k = NC - 2; k >= 1; k--) r = r * x + k * c[off + k]!;
  return r;
}

function locate(t: SpeedTable, v: number): number {
  let k = 0;
  while (k < t.count - 1 && v > t.hi[k]!) k++;
  return k;
}

/** Cumulative time (s) from rest to groundspeed v (0 ≤ v ≤ vEnd; clamped). */
export function timeAt(t: SpeedTable, v: number): number {
  if (v <= 0) return 0;
  if (v >= t.vEnd) return t.tCum[t.count]!;
  const k = locate(t, v);
  return t.tCum[k]! + horner(t.tCoef, k * NC, xOf(t.kind[k]!, t.lo[k]!, t.hi[k]!, v));
}

/** Cumulative distance (m) from rest to groundspeed v (0 ≤ v ≤ vEnd; clamped). */
export function distanceAt(t: SpeedTable, v: number): number {
  if (v <= 0) return 0;
  if (v >= t.vEnd) return t.sCum[t.count]!;
  const k = locate(t, v);
  return t.sCum[k]! + horner(t.sCoef, k * NC, xOf(t.kind[k]!, t.lo[k]!, t.hi[k]!, v));
}

/**
 * Groundspeed reached after `time_s` from rest; undefined when the table ends first.
 * Safeguarded Newton on the interval's antiderivative polynomial.
 */
export function speedAtTime(t: SpeedTable, time_s: number): number | undefined {
  if (time_s <= 0) return 0;
  const total = t.tCum[t.count]!;
  if (time_s > total) return undefined;
  if (time_s === total) return t.vEnd;
  let k = 0;
  while (k < t.count - 1 && time_s > t.tCum[k + 1]!) k++;
  const target = time_s - t.tCum[k]!;
  const off = k * NC;
  const span = t.tCum[k + 1]! - t.tCum[k]!;
  let a = -1;
  let b = 1;
  let x = span > 0 ? -1 + (2 * target) / span : 0;
  for (let it = 0; it < INVERSE_MAX_ITERATIONS; it++) {
    const r = horner(t.tCoef, off, x) - target;
    if (r > 0) b = x; else a = x;
    const d = hornerDeriv(t.tCoef, off, x);
    let xn = d > 0 ? x - r / d : 0.5 * (a + b);
    if (!(xn > a && xn < b)) xn = 0.5 * (a + b);
    if (Math.abs(xn - x) <= INVERSE_X_TOL) return mapV(t.kind[k]!, t.lo[k]!, t.hi[k]!, xn);
    x = xn;
  }
  throw new ConvergenceError('speedAtTime (ground-run time inversion)', INVERSE_MAX_ITERATIONS, horner(t.tCoef, off, x) - target);
}
