import { formatMoney } from '@tacet/vibration';

const NO_VALUE = '—';

/** A price with its currency code and two decimals, e.g. "USD 1,240.50"; a dash when unknown. */
export function formatPrice(amount: number | null | undefined, currency: string | null): string {
  if (amount === null || amount === undefined || !Number.isFinite(amount)) return NO_VALUE;
  if (!currency) return amount.toFixed(2);
  return formatMoney(amount, currency);
}

/** Lead time in days, e.g. "21 days"; a dash when unknown. */
export function formatLeadTime(days: number | null | undefined): string {
  if (days === null || days === undefined) return NO_VALUE;
  return days === 1 ? '1 day' : `${days} days`;
}

/** A file-name-safe base for a design's documents, e.g. "chw-pump-p-3-skid-rev2". */
export function documentBaseName(name: string, revision: number): string {
  const slug = name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
  return `${slug || 'design'}-rev${revision}`;
}
