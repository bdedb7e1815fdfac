import { formatMoney, type Quantity } from '@tacet/vibration';

import { formatNumber, type Units } from '@/lib/units';

import type { Mount } from '../types';
import { dampingOf, ratedDeflection, ratedNaturalFrequency } from './mount-figures';

export const NO_VALUE = '—';

/** A number in the user's units without the unit (for table cells whose header names it). */
export function displayNumber(units: Units, quantity: Quantity, siValue: number | null | undefined, digits?: number): string {
  if (siValue === null || siValue === undefined || !Number.isFinite(siValue)) return NO_VALUE;
  return formatNumber(units.toDisplay(quantity, siValue), digits);
}

/** A number in the user's units with the unit, e.g. "2,400 N" or "540 lbf". */
export function displayQuantity(units: Units, quantity: Quantity, siValue: number | null | undefined, digits?: number): string {
  if (siValue === null || siValue === undefined || !Number.isFinite(siValue)) return NO_VALUE;
  return units.format(quantity, siValue, digits);
}

/** Millimetres as the API gives them → metres, keeping null. */
export function mmToM(mm: number | null | undefined): number | null {
  return mm === null || mm === undefined ? null : mm / 1000;
}

/** "ζ 0.008 (viscous)" / "η 0.15 (hysteretic)". */
export function dampingText(mount: Pick<Mount, 'dampingRatio' | 'lossFactor'>): string {
  const damping = dampingOf(mount);
  if (!damping) return NO_VALUE;
  return `${damping.symbol} ${formatNumber(damping.value)} (${damping.model})`;
}

/** "−40 … 120 °C" in the user's temperature unit; one-sided ranges say so. */
export function temperatureRangeText(units: Units, minC: number | null, maxC: number | null, withUnit = true): string {
  const unit = withUnit ? ` ${units.label('temperature')}` : '';
  const value = (c: number) => formatNumber(units.toDisplay('temperature', c), 0).replace('-', '−');
  if (minC === null && maxC === null) return NO_VALUE;
  if (minC === null) return `up to ${value(maxC as number)}${unit}`;
  if (maxC === null) return `from ${value(minC)}${unit}`;
  return `${value(minC)} … ${value(maxC)}${unit}`;
}

/** "USD 48.20"-style price in the mount's own currency (no conversion; the glossary's money format). */
export function priceText(unitPrice: number | null, currency: string): string {
  if (unitPrice === null || !Number.isFinite(unitPrice)) return NO_VALUE;
  return formatMoney(unitPrice, currency);
}

export function leadTimeText(days: number | null): string {
  if (days === null || !Number.isFinite(days)) return NO_VALUE;
  return days === 1 ? '1 day' : `${formatNumber(days, 0)} days`;
}

/** The figures computed from the catalog values, in SI. */
export function ratedFigures(mount: Mount): { deflectionM: number; naturalFrequencyHz: number } {
  return { deflectionM: ratedDeflection(mount), naturalFrequencyHz: ratedNaturalFrequency(mount) };
}
