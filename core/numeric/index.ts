/** Numerical building blocks of the core: each throws ConvergenceError when it does not converge. */
export { gaussLegendre, type GaussLegendreRule } from './gaussLegendre.js';
export { brentRoot, type RootInput, type RootResult } from './roots.js';
export { bisect, type BisectInput } from './bisection.js';
