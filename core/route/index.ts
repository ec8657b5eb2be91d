/**
 * Design weight from the route: Breguet range and endurance (breguet.ts), reserve policies
 * (reserves.ts), the closed-form route fuel model (model.ts), the design takeoff mass and its inverses
 * (design.ts), and the payload-range diagram (payloadRange.ts). Sources: Aeronautical Engineer's Data Book ch. 9; 14 CFR 121.639, 121.645, 91.167.
 */
export * from './breguet.js';
export * from './reserves.js';
export * from './model.js';
export * from './design.js';
export * from './payloadRange.js';
