import { toDisplay, unitLabel, type Quantity, type UnitSystem } from './display.js';

/**
 * Figures in sentences and in files meant for people: one place that turns an SI value into
 * "0.26 in" or "6.6 mm" for the reader's unit system, and that writes exported numbers without
 * binary noise. The figures of the API stay SI and unrounded; only the words use these.
 */

/** Decimals a figure gets in a sentence, per quantity and unit system (trailing zeros dropped). */
export const SENTENCE_DECIMALS: Record<UnitSystem, Record<Quantity, number>> = {
  SI: { mass: 1, force: 0, position: 3, deflection: 1, stiffness: 1, frequency: 2, speed: 0, temperature: 1 },
  US: { mass: 1, force: 0, position: 2, deflection: 2, stiffness: 0, frequency: 2, speed: 0, temperature: 1 },
};

/** At most `decimals` decimals, trailing zeros dropped, no "-0": 24.6667 → "24.67", 100 → "100", −0.004 → "0". */
export function formatDecimal(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return String(value);
  const fixed = value.toFixed(decimals);
  const trimmed = fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
  return trimmed === '-0' ? '0' : trimmed;
}

/**
 * How precisely a figure is written in a sentence: a number of decimals, or a number of
 * significant digits for a figure that spans decades (a motion of a few micrometres or of several
 * millimetres), which then keeps at least one decimal.
 */
export type FigurePrecision = number | { significant: number };

/** Decimals that show `significant` significant digits of `value`, at least `minDecimals`: (0.0812, 2) → 3, (7.44, 2) → 1. */
export function significantDecimals(value: number, significant: number, minDecimals = 1): number {
  if (!Number.isFinite(value) || value === 0) return minDecimals;
  return Math.max(minDecimals, significant - 1 - Math.floor(Math.log10(Math.abs(value))));
}

/**
 * An SI value as a sentence names it in the reader's units: `formatMeasure('deflection', 0.0066, 'SI')`
 * → "6.6 mm", `(…, 'US')` → "0.26 in". `precision` overrides the sentence precision of the quantity:
 * decimals, or `{ significant }` digits counted in the reader's unit (0.08 mm → "0.08 mm", "0.0031 in").
 */
export function formatMeasure(quantity: Quantity, si: number, system: UnitSystem, precision?: FigurePrecision): string {
  const display = toDisplay(quantity, si, system);
  const decimals =
    precision === undefined
      ? SENTENCE_DECIMALS[system][quantity]
      : typeof precision === 'number'
        ? precision
        : significantDecimals(display, precision.significant);
  return `${formatDecimal(display, decimals)} ${unitLabel(quantity, system)}`;
}

/** Significant digits an exported number keeps: enough for every double that came from a short decimal. */
export const EXPORT_SIGNIFICANT_DIGITS = 15;

/**
 * A number for a file meant for people: the shortest decimal within 15 significant digits, so a
 * conversion's binary noise disappears (400 lbf in N: 1779.2886461041999 → "1779.2886461042", the
 * exact product of 400 and 4.4482216152605) while every figure keeps its real precision.
 */
export function exportNumber(value: number): string {
  if (!Number.isFinite(value)) return '';
  if (value === 0) return '0';
  return String(Number(value.toPrecision(EXPORT_SIGNIFICANT_DIGITS)));
}

/** The same without binary noise, as a number (for values stored from a unit conversion). */
export function withoutBinaryNoise(value: number): number {
  return Number.isFinite(value) && value !== 0 ? Number(value.toPrecision(EXPORT_SIGNIFICANT_DIGITS)) : value;
}
