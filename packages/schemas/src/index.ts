export * from './roles.js';
export * from './errors.js';
export * from './bake-days.js';
export * from './orders.js';
export * from './pricing.js';
export * from './production.js';
export * from './setup.js';
export * from './counter.js';
