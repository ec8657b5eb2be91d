/** Site views: list, detail, site and runway form pages. */
export * from './pages.js';
