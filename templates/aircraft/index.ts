/** Aircraft views: list, detail and form pages, and the form's field table. */
export * from './pages.js';
export * from './fields.js';
