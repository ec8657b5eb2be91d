/**
 * Bisection on a yes/no predicate: from `lo` (the predicate holds) and `hi` (it fails), halves the
 * interval until it is narrower than `tol`, keeping the predicate's side at each end. Needs no
 * continuity or monotone function value, only a predicate that changes once across the interval
 * (a mass that fits a runway, a landing mass an LDA allows). Throws ConvergenceError after
 * `maxIterations` halvings (the house rule: no solver stops silently). Pure.
 */
import { ConvergenceError } from '../errors.js';

export interface BisectInput<T> {
  /** Solver name used in the ConvergenceError message. */
  readonly name: string;
  /** End where the predicate holds, and end where it fails (trials already evaluated). */
  readonly lo: T;
  readonly hi: T;
  /** The abscissa of a trial. */
  readonly at: (t: T) => number;
  /** Evaluates a trial at an abscissa. */
  readonly trial: (x: number) => T;
  /** Whether a trial is on the `lo` side. */
  readonly holds: (t: T) => boolean;
  /** Width at which to stop, in the abscissa's unit. */
  readonly tol: number;
  readonly maxIterations: number;
}

export function bisect<T>(i: BisectInput<T>): { lo: T; hi: T; iterations: number } {
  let lo = i.lo;
  let hi = i.hi;
  let iterations = 0;
  while (Math.abs(i.at(hi) - i.at(lo)) > i.tol) {
    if (++iterations > i.maxIterations) throw new ConvergenceError(i.name, i.maxIterations, Math.abs(i.at(hi) - i.at(lo)));
    const mid = i.trial(0.5 * (i.at(lo) + i.at(hi)));
    if (i.holds(mid)) lo = mid; else hi = mid;
  }
  return { lo, hi, iterations };
}
