import { demoCandidates } from '@/testing/design-fakes';

import { formatMoney, formatUtilizationRange, shortLabel, worstIsolationPct } from './candidate-format';
import { sortCandidates } from './candidates-table';

const rows = () => demoCandidates().map((candidate, index) => ({ rank: index + 1, candidate }));

describe('candidate figures', () => {
  it('takes the worst isolation over the disturbing frequencies', () => {
    const [spring] = demoCandidates();
    expect(worstIsolationPct(spring!)).toBe(Math.min(...spring!.isolation.map((i) => i.efficiencyPct)));
    expect(worstIsolationPct(spring!)).toBe(spring!.isolation[0]!.efficiencyPct);
  });

  it('shows the utilisation range and money', () => {
    expect(formatUtilizationRange(demoCandidates()[0]!)).toBe('0.68–0.85');
    expect(formatMoney(368, 'USD')).toBe('$368');
    expect(formatMoney(null, 'USD')).toBe('—');
    expect(formatMoney(1200, 'not a code')).toBe('1,200 not a code');
  });

  it('shortens disturbing-frequency labels for chart lines', () => {
    expect(shortLabel('1× shaft at 1480 rpm')).toBe('1× shaft');
    expect(shortLabel('vane pass (6 vanes) at 1480 rpm')).toBe('vane pass');
    expect(shortLabel('2× line (50 Hz supply)')).toBe('2× line');
    expect(shortLabel('1× shaft at 900 rpm (minimum speed)')).toBe('1× shaft, min speed');
  });
});

describe('sorting candidates', () => {
  it('sorts by any column either way, keeping the rank for ties', () => {
    expect(sortCandidates(rows(), { column: 'price', direction: 'asc' }).map((r) => r.rank)).toEqual([3, 2, 1]);
    expect(sortCandidates(rows(), { column: 'fn', direction: 'desc' }).map((r) => r.rank)).toEqual([3, 2, 1]);
    expect(sortCandidates(rows(), { column: 'supplier', direction: 'asc' }).map((r) => r.rank)).toEqual([1, 3, 2]);
    expect(sortCandidates(rows(), { column: 'verdict', direction: 'asc' }).map((r) => r.rank)).toEqual([1, 2, 3]);
  });

  it('puts missing values last in both directions', () => {
    const list = rows();
    list[0]!.candidate.totalPrice = null;
    expect(sortCandidates(list, { column: 'price', direction: 'asc' }).map((r) => r.rank)).toEqual([3, 2, 1]);
    expect(sortCandidates(list, { column: 'price', direction: 'desc' }).map((r) => r.rank)).toEqual([2, 3, 1]);
  });
});
