import { measure } from '../common/units/reader-words.js';

/** Number formatting for the words of reasons and labels (not for the figures, which stay unrounded). */

/** At most `digits` decimals, trailing zeros dropped: 24.6667 → "24.67", 100 → "100". */
export function formatNumber(value: number, digits = 2): string {
  if (!Number.isFinite(value)) return String(value);
  const fixed = value.toFixed(digits);
  return fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
}

/** A frequency as the reasons name it: "24.67 Hz", "148 Hz". */
export const formatHz = (hz: number): string => `${formatNumber(hz, hz >= 100 ? 1 : 2)} Hz`;

/** A shaft speed as the reasons name it: "1480 rpm". */
export const formatRpm = (rpm: number): string => `${formatNumber(rpm, 0)} rpm`;

/** A ratio as a whole percentage: 1.12 → "112 %". */
export const formatPct = (ratio: number): string => `${Math.round(ratio * 100)} %`;

/** A percentage value with one decimal: 85.14 → "85.1 %". */
export const formatPctValue = (pct: number): string => `${formatNumber(pct, 1)} %`;

/**
 * A motion at the mounts, given in mm (the API's unit for it), as a figure mark written in the
 * reader's units with two significant digits and at least one decimal: 0.0812 mm → "0.081 mm" or
 * "0.0032 in", 7.44 mm → "7.4 mm" or "0.29 in". A motion of a few micrometres stays readable.
 */
export const motionMeasure = (mm: number): string => measure('deflection', mm / 1000, { significant: 2 });
