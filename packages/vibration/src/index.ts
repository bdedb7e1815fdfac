/**
 * @tacet/vibration — pure vibration-isolation calculations. SI units at every boundary
 * (kg, m, s, N, N/m, Hz, °C); names carry a unit suffix where a value is not in SI base units
 * (e.g. `speedRpm`, `efficiencyPct`). No I/O. This file is the package's only public entry.
 *
 * Every function throws a `VibrationInputError` (with `field` and `code`) for inputs that
 * cannot give a finite, meaningful result; none returns NaN.
 */
export * from './units/index.js';
export * from './errors/index.js';
export * from './sdof/index.js';
export * from './transmissibility/index.js';
export * from './forcing/index.js';
export * from './frf/index.js';
export * from './geometry/index.js';
export * from './assembly/index.js';
export * from './loads/index.js';
export * from './modes/index.js';
export * from './identification/index.js';
export * from './tap-test/index.js';
export * from './restraint/index.js';
export * from './whole-machine/index.js';
export * from './glossary/index.js';
