import { formatMoney as glossaryMoney, formatUtilisation } from '@tacet/vibration';

import type { Candidate } from '@/types/design-api';
import type { Model2Candidate } from '@/types/model2-api';

const hz3 = new Intl.NumberFormat('en-US', { minimumSignificantDigits: 3, maximumSignificantDigits: 3, useGrouping: false });
const pct1 = new Intl.NumberFormat('en-US', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const two = new Intl.NumberFormat('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
const upTo1 = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 });
const t3 = new Intl.NumberFormat('en-US', { minimumSignificantDigits: 3, maximumSignificantDigits: 3 });

export const NO_VALUE = '—';

/** Stable identity of a candidate within a run. */
export function candidateKey(candidate: Candidate): string {
  return candidate.kind === 'series' ? `series:${candidate.seriesId ?? candidate.label}` : `mount:${candidate.mountId ?? candidate.label}`;
}

export function formatFrequency(hz: number): string {
  return Number.isFinite(hz) ? `${hz3.format(hz)} Hz` : NO_VALUE;
}

export function formatPct(value: number): string {
  return Number.isFinite(value) ? `${pct1.format(value)} %` : NO_VALUE;
}

export function formatRatio(value: number): string {
  return Number.isFinite(value) ? two.format(value) : NO_VALUE;
}

export function formatTransmissibility(value: number): string {
  return Number.isFinite(value) ? t3.format(value) : NO_VALUE;
}

/** Money in the glossary's one format ("USD 1,240.50"); a dash when unknown. */
export function formatMoney(amount: number | null, currency: string): string {
  if (amount === null || !Number.isFinite(amount)) return NO_VALUE;
  return glossaryMoney(amount, currency);
}

export function formatDays(days: number | null): string {
  if (days === null || !Number.isFinite(days)) return NO_VALUE;
  return days === 1 ? '1 day' : `${days} days`;
}

/**
 * The isolation the verdict is checked against [%]: the whole machine's worst over the running
 * range when the result carries it, else the lowest of the bounce estimate over the disturbing
 * frequencies.
 */
export function worstIsolationPct(candidate: Candidate): number {
  const whole = (candidate as Candidate & Model2Candidate).wholeMachine;
  if (whole) return whole.worst.efficiencyPct;
  return candidate.isolation.length === 0 ? NaN : Math.min(...candidate.isolation.map((i) => i.efficiencyPct));
}

/** Where the verdict's isolation is worst: "at 1,200 rpm" (whole machine) or "at 24.7 Hz" (estimate); null when unknown. */
export function worstIsolationWhere(candidate: Candidate): string | null {
  const whole = (candidate as Candidate & Model2Candidate).wholeMachine;
  if (whole) {
    const { speedRpm, frequencyHz } = whole.worst;
    return typeof speedRpm === 'number' && Number.isFinite(speedRpm)
      ? `at ${Math.round(speedRpm).toLocaleString('en-US')} rpm`
      : `at ${formatFrequency(frequencyHz)}`;
  }
  const governing = governingIsolation(candidate);
  return governing ? `at ${formatFrequency(governing.frequencyHz)}` : null;
}

/** What the candidate's figures assumed for values the catalog does not give. */
export function assumptionsOf(candidate: Candidate): string[] {
  return (candidate as Candidate & Model2Candidate).assumptions ?? [];
}

/** The allowance on the weight the candidate's checks applied [%] (0 for a candidate stored before it was kept). */
export function weightMarginPct(candidate: Candidate): number {
  return candidate.weightMarginPct ?? 0;
}

/** A point's utilisation as the upper check compares it: load × (1 + margin) / rated load. */
export function utilizationWithMargin(candidate: Candidate, utilization: number): number {
  return utilization * (1 + weightMarginPct(candidate) / 100);
}

/**
 * The utilisation on the checks' basis: the lowest point's as it is (the lower limit), the
 * highest point's with the weight margin (the upper limit), so that the range is what the
 * checks compare with the window.
 */
export function utilizationRange(candidate: Candidate): [number, number] {
  const values = candidate.perPoint.map((p) => p.utilization);
  // the server states the upper check's basis per point (utilizationWithMargin); older stored candidates lack it
  const upper = candidate.perPoint.map((p) => p.utilizationWithMargin ?? utilizationWithMargin(candidate, p.utilization));
  return values.length === 0 ? [NaN, NaN] : [Math.min(...values), Math.max(...upper)];
}

export function formatUtilizationRange(candidate: Candidate): string {
  const [low, high] = utilizationRange(candidate);
  if (!Number.isFinite(low)) return NO_VALUE;
  // Percent, as everywhere (glossary): "73 %" or "73–97 %".
  const [lowPct, highPct] = [formatUtilisation(low), formatUtilisation(high)];
  return lowPct === highPct ? lowPct : `${lowPct.replace(' %', '')}–${highPct}`;
}

/** A weight margin in % as written in sentences: 10, 7.5. */
export function formatMargin(pct: number): string {
  return upTo1.format(pct);
}

/** How the utilisation range reads, for a tooltip or a caption. */
export function utilizationBasis(candidate: Candidate): string {
  const margin = weightMarginPct(candidate);
  return margin > 0
    ? `Load ÷ rated load, from the lightest point to the heaviest with the ${formatMargin(margin)} % weight margin — as the checks compare it.`
    : 'Load ÷ rated load, from the lightest point to the heaviest — as the checks compare it.';
}

/** The isolation row with the lowest efficiency (the governing disturbing frequency), or null. */
export function governingIsolation(candidate: Candidate): Candidate['isolation'][number] | null {
  let worst: Candidate['isolation'][number] | null = null;
  for (const row of candidate.isolation) if (!worst || row.efficiencyPct < worst.efficiencyPct) worst = row;
  return worst;
}

/** Every reason and note of a candidate, reasons first. */
export function allRemarks(candidate: Candidate): string[] {
  return [...candidate.reasons, ...(candidate.notes ?? [])];
}

/** Why it fails, or else its first note, or that it meets every requirement. */
export function firstReason(candidate: Candidate): string {
  return candidate.reasons[0] ?? candidate.notes?.[0] ?? (candidate.passes ? 'Meets every requirement' : NO_VALUE);
}

export const KIND_LABELS: Record<Candidate['kind'], string> = {
  uniform: 'One part',
  series: 'Sized per point',
};

/** "1× shaft at 1480 rpm" → "1× shaft": short enough to sit beside a line on a chart. */
export function shortLabel(label: string): string {
  return label
    .replace(/ at [\d.,]+ rpm \(minimum speed\)/, ', min speed')
    .replace(/ at [\d.,]+ rpm \(maximum speed\)/, ', max speed')
    .replace(/ at [\d.,]+ rpm.*$/, '')
    .replace(/ \(\d+ (vanes|blades)\)/, '')
    .replace(/ \(\d+(\.\d+)? Hz supply\)/, '');
}
