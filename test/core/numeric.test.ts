/**
 * core/numeric: the one Gauss–Legendre rule (Abramowitz and Stegun, Handbook of Mathematical Functions,
 * §25.4.29 and Table 25.4), Brent's root finder (Brent 1973, ch. 4) and the predicate bisection; each
 * throws ConvergenceError instead of stopping silently.
 */
import { describe, expect, it } from 'vitest';
import { ConvergenceError, InputDomainError } from '../../core/index.js';
import { bisect } from '../../core/numeric/bisection.js';
import { brentRoot } from '../../core/numeric/roots.js';
import { gaussLegendre } from '../../core/numeric/gaussLegendre.js';
import { expectClose } from '../helpers/close.js';

describe('Gauss–Legendre rule (Abramowitz & Stegun 25.4.29, Table 25.4)', () => {
  it('5 points: nodes ±0.9061798459, ±0.5384693101, 0 and weight 128/225 at 0 (Table 25.4); weights sum to 2; exact to degree 9', () => {
    const { nodes: x, weights: w } = gaussLegendre(5);
    expectClose(x[4]!, 0.9061798459386640, { abs: 1e-14 });
    expectClose(x[3]!, 0.5384693101056831, { abs: 1e-14 });
    expectClose(x[2]!, 0, { abs: 1e-15 });
    expectClose(w[2]!, 128 / 225, { abs: 1e-14 });
    let sum = 0;
    let deg8 = 0;
    for (let i = 0; i < 5; i++) { sum += w[i]!; deg8 += w[i]! * x[i]! ** 8; }
    expectClose(sum, 2, { abs: 1e-14 });
    expectClose(deg8, 2 / 9, { abs: 1e-14 });
  });
  it('integrates polynomials of degree 2n − 1 exactly (derived), nodes increasing and symmetric', () => {
    for (const n of [1, 2, 5, 16, 64]) {
      const { nodes, weights } = gaussLegendre(n);
      expectClose(weights.reduce((s, w) => s + w, 0), 2, { abs: 1e-13 }, `Σw n=${n}`);
      // ∫₋₁¹ (x + 0.3)^(2n−1) dx = (1.3^(2n) − 0.7^(2n)) / (2n): degree 2n − 1, neither even nor odd.
      const deg = 2 * n - 1;
      const integral = nodes.reduce((s, x, i) => s + weights[i]! * (x + 0.3) ** deg, 0);
      const exact = (1.3 ** (2 * n) - 0.7 ** (2 * n)) / (2 * n);
      expectClose(integral, exact, { rel: 1e-11 }, `degree ${deg}, n=${n}`);
      for (let i = 1; i < n; i++) expect(nodes[i]!).toBeGreaterThan(nodes[i - 1]!);
      for (let i = 0; i < n; i++) expectClose(nodes[i]!, -nodes[n - 1 - i]!, { abs: 1e-15 });
    }
  });
  it('refuses a point count outside 1 … 64', () => {
    expect(() => gaussLegendre(0)).toThrow(InputDomainError);
    expect(() => gaussLegendre(2.5)).toThrow(InputDomainError);
  });
});

describe('predicate bisection', () => {
  it('finds the last x with x² ≤ 2 to the tolerance, keeping each side of the predicate (derived: √2)', () => {
    const r = bisect({ name: 'sqrt 2', lo: 1, hi: 2, at: (x) => x, trial: (x) => x, holds: (x) => x * x <= 2, tol: 1e-9, maxIterations: 60 });
    expect(r.lo * r.lo).toBeLessThanOrEqual(2);
    expect(r.hi * r.hi).toBeGreaterThan(2);
    expect(r.hi - r.lo).toBeLessThanOrEqual(1e-9);
    expectClose(r.lo, Math.SQRT2, { abs: 1e-9 });
    expect(r.iterations).toBe(30);
  });
  it('throws ConvergenceError with its name instead of stopping early', () => {
    expect(() => bisect({ name: 'too few steps', lo: 0, hi: 1, at: (x) => x, trial: (x) => x, holds: () => true, tol: 1e-12, maxIterations: 5 }))
      .toThrow(ConvergenceError);
    expect(() => bisect({ name: 'too few steps', lo: 0, hi: 1, at: (x) => x, trial: (x) => x, holds: () => true, tol: 1e-12, maxIterations: 5 }))
      .toThrow(/too few steps did not converge after 5 iterations/);
  });
});

describe("Brent's method (Brent 1973, ch. 4)", () => {
  it('cos x = x: 0.7390851332151607 (the Dottie number, derived)', () => {
    const r = brentRoot({ name: 'dottie', f: (x) => Math.cos(x) - x, lo: 0, hi: 1, xTol: 1e-14, maxIterations: 100 });
    expectClose(r.x, 0.7390851332151607, { abs: 1e-13 });
  });
  it('throws ConvergenceError when the iteration cap is too small', () => {
    expect(() => brentRoot({ name: 'capped', f: (x) => Math.cos(x) - x, lo: 0, hi: 1, xTol: 1e-15, maxIterations: 2 })).toThrow(ConvergenceError);
  });
});
