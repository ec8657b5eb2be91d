import { expect } from 'vitest';

/**
 * Asserts |actual − expected| ≤ abs or ≤ rel·|expected| (either tolerance suffices when both are given).
 * vitest's toBeCloseTo is absolute only; reference values carry relative tolerances.
 */
export function expectClose(
  actual: number,
  expected: number,
  tol: { abs?: number; rel?: number },
  label = '',
): void {
  const err = Math.abs(actual - expected);
  const okAbs = tol.abs !== undefined && err <= tol.abs;
  const okRel = tol.rel !== undefined && err <= tol.rel * Math.abs(expected);
  if (!(okAbs || okRel)) {
    expect.fail(
      `${label ? label + ': ' : ''}expected ${expected} ± ${JSON.stringify(tol)}, got ${actual} (error ${err})`,
    );
  }
  expect(Number.isFinite(actual)).toBe(true);
}
