import { demoCandidates } from '@/testing/design-fakes';

import { bestOf } from './candidate-comparison';
import {
  formatMoney,
  formatUtilizationRange,
  governingIsolation,
  shortLabel,
  utilizationBasis,
  utilizationRange,
  worstIsolationPct,
} from './candidate-format';
import { formatShare, modeMotionText } from './mode-format';
import { sortCandidates } from './candidates-table';

const rows = () => demoCandidates().map((candidate, index) => ({ rank: index + 1, candidate }));

describe('candidate figures', () => {
  it('takes the worst isolation over the disturbing frequencies', () => {
    const [spring] = demoCandidates();
    expect(worstIsolationPct(spring!)).toBe(Math.min(...spring!.isolation.map((i) => i.efficiencyPct)));
    expect(worstIsolationPct(spring!)).toBe(spring!.isolation[0]!.efficiencyPct);
  });

  it('shows the utilisation range and money', () => {
    // utilisation as a percentage and money in the glossary's one format, as everywhere
    expect(formatUtilizationRange(demoCandidates()[0]!)).toBe('68–85 %');
    expect(formatMoney(368, 'USD')).toBe('USD 368.00');
    expect(formatMoney(1240.5, 'USD')).toBe('USD 1,240.50');
    expect(formatMoney(null, 'USD')).toBe('—');
  });

  it('puts the utilisation on the checks’ basis: the heaviest point with the weight margin, the lightest without', () => {
    const spring = { ...demoCandidates()[0]!, weightMarginPct: 10 };
    // CV-15 loads 2186.1 … 2717.3 N on 3200 N mounts
    const [low, high] = utilizationRange(spring);
    expect(low).toBeCloseTo(2186.1 / 3200, 12);
    expect(high).toBeCloseTo((2717.3 / 3200) * 1.1, 12);
    expect(formatUtilizationRange(spring)).toBe('68–93 %');
    expect(utilizationBasis(spring)).toContain('with the 10 % weight margin');
    // a candidate kept from before the margin travelled with it: none assumed
    const old = { ...spring, weightMarginPct: undefined };
    expect(formatUtilizationRange(old)).toBe('68–85 %');
  });

  it('takes the server’s utilizationWithMargin when it states it', () => {
    const spring = demoCandidates()[0]!;
    const stated = { ...spring, perPoint: spring.perPoint.map((p) => ({ ...p, utilizationWithMargin: p.utilization * 1.2 })) };
    expect(utilizationRange(stated)[1]).toBeCloseTo((2717.3 / 3200) * 1.2, 12);
  });

  it('finds the governing isolation row', () => {
    const [spring] = demoCandidates();
    expect(governingIsolation(spring!)?.frequencyHz).toBeCloseTo(1480 / 60, 12);
    expect(governingIsolation({ ...spring!, isolation: [] })).toBeNull();
  });

  it('marks the best figure of a comparison row, and none when all agree or one has none', () => {
    expect([...bestOf([3.15, 3.6, 12.5], 'low')]).toEqual([0]);
    expect([...bestOf([97.9, 99.1, 57.8], 'high')]).toEqual([1]);
    expect([...bestOf([5, 5], 'low')]).toEqual([]);
    expect([...bestOf([5, NaN], 'low')]).toEqual([]);
    expect([...bestOf([4, 4, 9], 'low')]).toEqual([0, 1]);
    // figures that read the same (100.0 % and 100.0 %) are not told apart
    expect([...bestOf([99.996, 99.9991], 'high', (v) => Math.round(v * 10) / 10)]).toEqual([]);
  });

  it('names a mode by the motions that carry it (docs/engineering/rigid-body-modes.md §6)', () => {
    const fractions = { surge: 0, sway: 0.05, bounce: 0, roll: 0.4, pitch: 0, yaw: 0.55 };
    expect(modeMotionText({ frequencyHz: 3, dominant: 'yaw', coupled: true, energyFractions: fractions })).toEqual({
      name: 'yaw + roll (mixed)',
      mixed: true,
      shares: 'yaw 55 %, roll 40 %',
    });
    expect(
      modeMotionText({
        frequencyHz: 3,
        dominant: 'bounce',
        coupled: false,
        energyFractions: { ...fractions, sway: 0, roll: 0, yaw: 0, bounce: 1 },
      }),
    ).toEqual({ name: 'bounce — vertical', mixed: false, shares: '' });
    expect(modeMotionText({ frequencyHz: 3, dominant: 'yaw', coupled: true }).name).toBe('mostly yaw — about z (mixed)');
    // a mixed mode never reads as 90 %
    expect(formatShare(0.8962)).toBe('89.6 %');
    expect(formatShare(0.8999)).toBe('89.9 %');
    expect(formatShare(0.9)).toBe('90 %');
    expect(formatShare(0.054)).toBe('5 %');
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
