import { cToF, fToC, inToM, kgToLb, lbToKg, lbfPerInToNPerM, lbfToN, mToIn, nPerMToLbfPerIn, nToLbf } from './convert.js';

/** A user's unit preference: SI or US customary. */
export type UnitSystem = 'SI' | 'US';

/** Physical quantities Tacet displays. Values are always held in SI base units (kg, N, m, N/m, Hz, °C). */
export type Quantity = 'mass' | 'force' | 'position' | 'deflection' | 'stiffness' | 'frequency' | 'speed' | 'temperature';

interface DisplayUnit {
  /** Unit symbol shown to the user. */
  unit: string;
  /** SI base value → display value. */
  fromSi: (si: number) => number;
  /** Display value → SI base value. */
  toSi: (display: number) => number;
}

const identity = (v: number): number => v;

/** Display units per system. Positions in m (SI) or in (US); deflections in mm or in; stiffness in N/mm or lbf/in. */
export const DISPLAY_UNITS: Record<UnitSystem, Record<Quantity, DisplayUnit>> = {
  SI: {
    mass: { unit: 'kg', fromSi: identity, toSi: identity },
    force: { unit: 'N', fromSi: identity, toSi: identity },
    position: { unit: 'm', fromSi: identity, toSi: identity },
    deflection: { unit: 'mm', fromSi: (m) => m * 1000, toSi: (mm) => mm / 1000 },
    stiffness: { unit: 'N/mm', fromSi: (k) => k / 1000, toSi: (k) => k * 1000 },
    frequency: { unit: 'Hz', fromSi: identity, toSi: identity },
    speed: { unit: 'rpm', fromSi: (hz) => hz * 60, toSi: (rpm) => rpm / 60 },
    temperature: { unit: '°C', fromSi: identity, toSi: identity },
  },
  US: {
    mass: { unit: 'lb', fromSi: kgToLb, toSi: lbToKg },
    force: { unit: 'lbf', fromSi: nToLbf, toSi: lbfToN },
    position: { unit: 'in', fromSi: mToIn, toSi: inToM },
    deflection: { unit: 'in', fromSi: mToIn, toSi: inToM },
    stiffness: { unit: 'lbf/in', fromSi: nPerMToLbfPerIn, toSi: lbfPerInToNPerM },
    frequency: { unit: 'Hz', fromSi: identity, toSi: identity },
    speed: { unit: 'rpm', fromSi: (hz) => hz * 60, toSi: (rpm) => rpm / 60 },
    temperature: { unit: '°F', fromSi: cToF, toSi: fToC },
  },
};

/** Unit symbol for a quantity in a unit system. */
export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  return DISPLAY_UNITS[system][quantity].unit;
}

/** Converts an SI base value to the display value of the given system. */
export function toDisplay(quantity: Quantity, si: number, system: UnitSystem): number {
  return DISPLAY_UNITS[system][quantity].fromSi(si);
}

/** Converts a display value of the given system back to SI base units. */
export function fromDisplay(quantity: Quantity, display: number, system: UnitSystem): number {
  return DISPLAY_UNITS[system][quantity].toSi(display);
}
