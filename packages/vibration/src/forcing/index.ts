export * from './disturbing-frequencies.js';
export * from './unbalance-force.js';
export * from './pressure-thrust.js';
export * from './operating-sources.js';
