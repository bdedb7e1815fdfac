import { formatMeasure, fromDisplay, toDisplay, unitLabel, type Quantity, type UnitSystem } from '@tacet/vibration';
import { useMemo } from 'react';

import { useAuth } from './auth';

const NO_VALUE = '—';

const formatters = new Map<string, Intl.NumberFormat>();

function numberFormat(options: Intl.NumberFormatOptions): Intl.NumberFormat {
  const key = JSON.stringify(options);
  let formatter = formatters.get(key);
  if (!formatter) {
    formatter = new Intl.NumberFormat('en-US', options);
    formatters.set(key, formatter);
  }
  return formatter;
}

/**
 * Formats a display value. With `digits`, exactly that many decimals; without, three
 * significant figures (25.4, 1.00, 0.236), but never rounding away whole units (12,345).
 */
export function formatNumber(value: number, digits?: number): string {
  if (!Number.isFinite(value)) return NO_VALUE;
  if (digits !== undefined) {
    return numberFormat({ minimumFractionDigits: digits, maximumFractionDigits: digits }).format(value);
  }
  if (Math.abs(value) >= 1000) return numberFormat({ maximumFractionDigits: 0 }).format(value);
  if (value === 0) return '0';
  return numberFormat({ minimumSignificantDigits: 3, maximumSignificantDigits: 3 }).format(value);
}

/** `format` for a given unit system, usable outside React (reports, tests). */
export function formatQuantity(quantity: Quantity, siValue: number, system: UnitSystem, digits?: number): string {
  if (!Number.isFinite(siValue)) return NO_VALUE;
  return `${formatNumber(toDisplay(quantity, siValue, system), digits)} ${unitLabel(quantity, system)}`;
}

export interface Units {
  system: UnitSystem;
  /** SI value → text with the unit, e.g. `format('deflection', 0.0254)` → "25.4 mm" or "1.00 in". */
  format: (quantity: Quantity, siValue: number, digits?: number) => string;
  /** SI value → text with the precision of the server's words ("6.6 mm" / "0.26 in"), for a figure shown beside a reason or note. */
  measure: (quantity: Quantity, siValue: number) => string;
  /** The unit symbol shown for a quantity, e.g. "mm" or "in". */
  label: (quantity: Quantity) => string;
  /** SI value → number in the user's units (for inputs). */
  toDisplay: (quantity: Quantity, siValue: number) => number;
  /** Number typed in the user's units → SI value. */
  toSi: (quantity: Quantity, displayValue: number) => number;
}

export function unitsFor(system: UnitSystem): Units {
  return {
    system,
    format: (quantity, siValue, digits) => formatQuantity(quantity, siValue, system, digits),
    measure: (quantity, siValue) => (Number.isFinite(siValue) ? formatMeasure(quantity, siValue, system) : NO_VALUE),
    label: (quantity) => unitLabel(quantity, system),
    toDisplay: (quantity, siValue) => toDisplay(quantity, siValue, system),
    toSi: (quantity, displayValue) => fromDisplay(quantity, displayValue, system),
  };
}

/** Units of the signed-in user's preference (SI when nobody is signed in). */
export function useUnits(): Units {
  const system = useAuth().user?.unitSystem ?? 'SI';
  return useMemo(() => unitsFor(system), [system]);
}
