/** Site climate: design temperature from monthly normals or daily station records, and file readers. */
export * from './calendar.js';
export * from './design.js';
export * from './daily.js';
export * from './readers.js';
