export { type MountLoadWarning, type MountLoadsInput, type MountLoadsResult, mountLoads } from './mount-loads.js';
export * from './corner-mount-loads.js';
export * from './mount-loads-batch.js';
export * from './levelling.js';
export * from './levelling-batch.js';
