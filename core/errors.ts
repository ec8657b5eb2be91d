/**
 * Error types of the computation core.
 *
 * - `InputDomainError`: a value outside its documented physical range (bad input).
 * - `ConvergenceError`: an iterative solver did not meet its tolerance within its iteration cap.
 *
 * "Valid input, but this aircraft cannot do it here" is never an error: it is a result with a reason.
 */

export interface DomainRange {
  /** Smallest allowed value (SI), or undefined for no lower bound. */
  readonly min?: number;
  /** Largest allowed value (SI), or undefined for no upper bound. */
  readonly max?: number;
  /** Whether `min` itself is allowed (default true). */
  readonly minInclusive?: boolean;
  /** Whether `max` itself is allowed (default true). */
  readonly maxInclusive?: boolean;
  /** SI unit symbol shown in messages, e.g. "m", "kg", "°C"; "" for a ratio. */
  readonly unit: string;
}

export function describeRange(r: DomainRange): string {
  const u = r.unit ? ` ${r.unit}` : '';
  const lo = r.min === undefined ? undefined : `${r.minInclusive === false ? '>' : '≥'} ${r.min}${u}`;
  const hi = r.max === undefined ? undefined : `${r.maxInclusive === false ? '<' : '≤'} ${r.max}${u}`;
  if (lo && hi) return `${lo} and ${hi}`;
  return lo ?? hi ?? 'any finite value';
}

export class InputDomainError extends Error {
  override readonly name = 'InputDomainError';
  constructor(
    /** Field path as the caller knows it, e.g. "aircraft.mtow_kg". */
    readonly field: string,
    /** The offending value as received (may be NaN, undefined, a string...). */
    readonly value: unknown,
    /** The allowed range, or a sentence describing the rule when it is not a simple range. */
    readonly allowed: string,
    readonly range?: DomainRange,
  ) {
    super(`${field}: ${formatValue(value)} is not allowed; expected ${allowed}`);
  }
}

export class ConvergenceError extends Error {
  override readonly name = 'ConvergenceError';
  constructor(
    readonly solver: string,
    readonly iterations: number,
    readonly residual: number,
  ) {
    super(`${solver} did not converge after ${iterations} iterations (residual ${residual})`);
  }
}

export function formatValue(v: unknown): string {
  if (v === undefined || v === null || v === '') return 'a missing value';
  if (typeof v === 'number') return Number.isNaN(v) ? 'NaN' : String(v);
  if (typeof v === 'string') return JSON.stringify(v);
  return JSON.stringify(v) ?? String(v);
}
