export * from './constants.js';
export * from './convert.js';
export * from './display.js';
export * from './words.js';
