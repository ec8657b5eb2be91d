/** The what-if panel and its result fragment. */
export * from './panel.js';
