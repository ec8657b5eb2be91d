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
    super(`${field}: ${domainProblemText(value, allowed, range)}`);
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

/**
 * A received value as a short phrase for messages: never serialised whole (strings are cut to 60
 * characters, lists and objects are named by their size), so a huge or deeply nested value cannot
 * blow up a message.
 */
export function formatValue(v: unknown): string {
  if (v === undefined || v === null || v === '') return 'a missing value';
  if (typeof v === 'number') return Number.isNaN(v) ? 'not a number' : Number.isFinite(v) ? String(v) : `a number too ${v > 0 ? 'large' : 'small'} to hold`;
  if (typeof v === 'string') return JSON.stringify(v.length > 60 ? `${v.slice(0, 60)}…` : v);
  if (typeof v === 'boolean' || typeof v === 'bigint') return String(v);
  if (Array.isArray(v)) return `a list of ${v.length} item${v.length === 1 ? '' : 's'}`;
  if (typeof v === 'object') return 'an object';
  return typeof v;
}

/**
 * What is wrong with `value` (the text after "field: "): "missing; expected …" for a blank,
 * "too large (maximum …)" / "too small (minimum …)" for ±Infinity (a value such as 1e309), else
 * "<value> is not allowed; expected …".
 */
export function domainProblemText(value: unknown, allowed: string, range?: DomainRange): string {
  if (value === undefined || value === null || value === '') return `missing; expected ${allowed}`;
  const u = range?.unit ? ` ${range.unit}` : '';
  if (value === Number.POSITIVE_INFINITY) return range?.max !== undefined ? `too large (maximum ${range.max}${u})` : 'too large to be a number';
  if (value === Number.NEGATIVE_INFINITY) return range?.min !== undefined ? `too small (minimum ${range.min}${u})` : 'too large a negative number';
  return `${formatValue(value)} is not allowed; expected ${allowed}`;
}
