export * from './seismic-design-force.js';
export * from './restraint-demand.js';
export * from './governing-demand.js';
