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
 * An SI value as a sentence names it in the reader's units: `formatMeasure('deflection', 0.0066, 'SI')`
 * → "6.6 mm", `(…, 'US')` → "0.26 in". `decimals` overrides the sentence precision of the quantity.
 */
export function formatMeasure(quantity: Quantity, si: number, system: UnitSystem, decimals?: number): string {
  const display = toDisplay(quantity, si, system);
  return `${formatDecimal(display, decimals ?? SENTENCE_DECIMALS[system][quantity])} ${unitLabel(quantity, system)}`;
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
