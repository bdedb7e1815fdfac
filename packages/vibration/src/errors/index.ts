export * from './vibration-input-error.js';
