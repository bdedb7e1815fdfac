export * from './half-power.js';
export * from './dynamic-stiffness-fit.js';
export * from './identify-from-frf.js';
