import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { expectRounded } from '../testing/expect-rounded.js';
import {
  isolationDb,
  isolationEfficiencyPct,
  maxNaturalFrequencyForRatio,
  requiredFrequencyRatio,
  transmissibilityFromEfficiency,
} from './isolation.js';
import { transmissibilityUndamped } from './transmissibility.js';

// Model: docs/engineering/transmissibility.md §8–§9; check values: docs/engineering/check-values.md.
describe('isolation figures', () => {
  it('E = (1 − T)·100 % and I = −20·log10 T; amplification gives negative figures', () => {
    expect(isolationEfficiencyPct(0.125)).toBeCloseTo(87.5, 12);
    expect(isolationEfficiencyPct(2)).toBeCloseTo(-100, 12);
    expect(isolationDb(0.1)).toBeCloseTo(20, 12);
    expect(isolationDb(10)).toBeCloseTo(-20, 12);
    expect(transmissibilityFromEfficiency(90)).toBeCloseTo(0.1, 14);
  });

  it('CV-30 [CF]: undamped r for E = 80/90/95/98 % → 2.449, 3.317, 4.583, 7.141', () => {
    expectRounded(requiredFrequencyRatio(80), '2.449');
    expectRounded(requiredFrequencyRatio(90), '3.317');
    expectRounded(requiredFrequencyRatio(95), '4.583');
    expectRounded(requiredFrequencyRatio(98), '7.141');
    expect(transmissibilityUndamped(requiredFrequencyRatio(87.5))).toBeCloseTo(0.125, 12);
    expect(maxNaturalFrequencyForRatio(24.667, 3)).toBeCloseTo(8.2223, 4);
  });

  it('rejects impossible figures', () => {
    expect(() => isolationDb(0)).toThrow(VibrationInputError);
    expect(() => isolationEfficiencyPct(Number.NaN)).toThrow(/transmissibility/);
    expect(() => requiredFrequencyRatio(100)).toThrow(/efficiencyPct/);
    expect(() => transmissibilityFromEfficiency(100)).toThrow(/efficiencyPct/);
  });
});
