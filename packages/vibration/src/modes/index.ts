export * from './mode-names.js';
export * from './mount-stiffness.js';
export * from './rigid-body-modes.js';
export * from './rocking-stability.js';
