export * from './glossary.js';
export * from './cautions.js';
