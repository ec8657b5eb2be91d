/**
 * Nodes and weights of n-point Gauss–Legendre quadrature on [−1, 1]: the roots of the Legendre
 * polynomial P_n found by Newton's method from Tricomi's starting values cos(π (i + 3/4) / (n + 1/2)),
 * weights w_i = 2 / ((1 − x_i²) P_n'(x_i)²) (Abramowitz and Stegun, Handbook of Mathematical
 * Functions, §25.4.29). Exact for polynomials of degree 2n − 1. Throws ConvergenceError when Newton
 * does not meet its tolerance (the house rule: no solver stops silently). Pure.
 */
import { ConvergenceError } from '../errors.js';
import { check } from '../validate.js';

const NEWTON_TOL = 1e-15;
const NEWTON_MAX_ITERATIONS = 100;

export interface GaussLegendreRule {
  /** Nodes in increasing order. */
  readonly nodes: Float64Array;
  readonly weights: Float64Array;
}

/** P_n(x) and P_{n−1}(x) by the three-term recurrence. */
function legendre(n: number, x: number): { pn: number; pnm1: number } {
  let p0 = 1;
  let p1 = x;
  for (let k = 2; k <= n; k++) {
    const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
    p0 = p1;
    p1 = p2;
  }
  return n === 1 ? { pn: x, pnm1: 1 } : { pn: p1, pnm1: p0 };
}

export function gaussLegendre(n: number): GaussLegendreRule {
  check(Number.isInteger(n) && n >= 1 && n <= 64, 'n', n, 'a whole number from 1 to 64');
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < Math.ceil(n / 2); i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    for (let it = 0; ; it++) {
      const { pn, pnm1 } = legendre(n, x);
      const dp = n === 1 ? 1 : (n * (x * pn - pnm1)) / (x * x - 1);
      const dx = pn / dp;
      x -= dx;
      if (Math.abs(dx) < NEWTON_TOL) break;
      if (it + 1 >= NEWTON_MAX_ITERATIONS) throw new ConvergenceError('Gauss–Legendre nodes', it + 1, Math.abs(dx));
    }
    const { pn, pnm1 } = legendre(n, x);
    const dp = n === 1 ? 1 : (n * (x * pn - pnm1)) / (x * x - 1);
    const w = 2 / ((1 - x * x) * dp * dp);
    nodes[i] = -x;
    nodes[n - 1 - i] = x;
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  if (n % 2 === 1) nodes[(n - 1) / 2] = 0;
  return { nodes, weights };
}
