/** Study views: list, overview, study and scenario forms, and the results content. */
export * from './pages.js';
export * from './results.js';
