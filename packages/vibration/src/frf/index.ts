export * from './complex.js';
export * from './frequency-grid.js';
export * from './sdof-frf.js';
