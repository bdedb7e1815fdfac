export * from './spectrum.js';
export * from './impact-frf.js';
export * from './identify-tap-test.js';
export * from './verification-verdict.js';
export * from './simulate-impact.js';
