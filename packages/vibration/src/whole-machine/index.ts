export * from './types.js';
export * from './system.js';
export * from './forced-response.js';
export * from './crossings.js';
export * from './speed-sweep.js';
export * from './series-stiffness.js';
