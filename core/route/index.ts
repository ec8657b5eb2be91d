/**
 * Design weight from the route: Breguet range and endurance (breguet.ts), reserve policies
 * (reserves.ts), the closed-form route fuel model (model.ts), the design takeoff mass and its inverses
 * (design.ts), and the payload-range diagram (payloadRange.ts). Sources: domain-reference.md §9.
 */
export * from './breguet.js';
export * from './reserves.js';
export * from './model.js';
export * from './design.js';
export * from './payloadRange.js';
