/**
 * Bracketing root finder (balanced V1, climb-limited mass, calibration).
 *
 * Source: R. P. Brent, *Algorithms for Minimization without Derivatives* (1973), ch. 4: inverse
 * quadratic interpolation with secant and bisection safeguards; convergence is guaranteed once the
 * root is bracketed by a sign change.
 *
 * Validity: any continuous function on [lo, hi] with f(lo)·f(hi) ≤ 0. Stops when the bracket is
 * narrower than `xTol` or f vanishes; throws ConvergenceError after `maxIterations`.
 */
import { ConvergenceError } from '../errors.js';

export interface RootInput {
  /** Solver name used in the ConvergenceError message. */
  readonly name: string;
  readonly f: (x: number) => number;
  readonly lo: number;
  readonly hi: number;
  /** f(lo) and f(hi) when already known. */
  readonly fLo?: number;
  readonly fHi?: number;
  /** Absolute tolerance on x. */
  readonly xTol: number;
  readonly maxIterations: number;
}

export interface RootResult {
  readonly x: number;
  readonly fx: number;
  readonly iterations: number;
}

/** Brent's method on a bracketed root. Throws (internal) when the bracket holds no sign change. */
export function brentRoot(i: RootInput): RootResult {
  let a = i.lo;
  let b = i.hi;
  let fa = i.fLo ?? i.f(a);
  let fb = i.fHi ?? i.f(b);
  if (fa === 0) return { x: a, fx: 0, iterations: 0 };
  if (fb === 0) return { x: b, fx: 0, iterations: 0 };
  if ((fa > 0) === (fb > 0)) throw new Error(`internal: ${i.name} called without a sign change`);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let it = 1; it <= i.maxIterations; it++) {
    if ((fb > 0) === (fc > 0)) {
      c = a; fc = fa; d = b - a; e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a;
      fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * i.xTol;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return { x: b, fx: fb, iterations: it };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m; e = m;
      }
    } else {
      d = m; e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = i.f(b);
  }
  throw new ConvergenceError(i.name, i.maxIterations, fb);
}
