export * from './mass-properties.js';
