export * from './transmissibility.js';
export * from './isolation.js';
export * from './resonance.js';
export * from './harmonic-response.js';
export * from './transmissibility-batch.js';
