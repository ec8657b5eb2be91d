/** Persistence: client factory, transaction helper, repositories, seeding. See docs/storage.md. */
export * from './bulk.js';
export * from './client.js';
export * from './errors.js';
export * from './transaction.js';
export type { Db } from './types.js';
export * from './repos/aircraft.js';
export * from './repos/sites.js';
export * from './repos/studies.js';
export * from './seed.js';
export * from './writeGate.js';
