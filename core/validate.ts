/**
 * Range checks shared by every core module. A value is accepted only when it is a finite number
 * inside its documented range; a blank is "missing", never zero.
 */
import { InputDomainError, describeRange, type DomainRange } from './errors.js';

/** Returns `value` when it is finite and inside `range`; otherwise throws InputDomainError. */
export function inRange(field: string, value: unknown, range: DomainRange): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputDomainError(field, value, `a finite number, ${describeRange(range)}`, range);
  }
  const { min, max, minInclusive = true, maxInclusive = true } = range;
  const tooLow = min !== undefined && (minInclusive ? value < min : value <= min);
  const tooHigh = max !== undefined && (maxInclusive ? value > max : value >= max);
  if (tooLow || tooHigh) throw new InputDomainError(field, value, describeRange(range), range);
  return value;
}

/** Throws InputDomainError with a rule sentence when `ok` is false (cross-field checks). */
export function check(ok: boolean, field: string, value: unknown, rule: string): void {
  if (!ok) throw new InputDomainError(field, value, rule);
}

/** Guard for results: a non-finite number in a result is a defect, never shown. */
export function finite(label: string, value: number): number {
  if (!Number.isFinite(value)) throw new Error(`internal: ${label} is not finite (${value})`);
  return value;
}
