import { describe, expect, it } from 'vitest';
import { expectRounded } from '../testing/expect-rounded.js';
import { seriesStiffness } from './series-stiffness.js';
import { naturalFrequencyHz } from '../sdof/natural-frequency.js';

// Model: docs/engineering/static-deflection.md §6, whole-machine.md §9; check values: docs/engineering/check-values.md CV-39, CV-50.
describe('mount on a flexible support (springs in series)', () => {
  it('CV-39, CV-50.[CF, hand calculation]: 100 N/mm on 1000 N/mm → 1e5·1e6/1.1e6 = 90 909.09 N/m', () => {
    expectRounded(seriesStiffness(1e5, 1e6), '90909.09');
  });
  it('CV-39, CV-50.[CF]: a support ten times stiffer lowers the bounce frequency by 1 − √(10/11) = 4.65 %', () => {
    const rigid = naturalFrequencyHz(1e5, 100);
    const flexible = naturalFrequencyHz(seriesStiffness(1e5, 1e6), 100);
    expectRounded((1 - flexible / rigid) * 100, '4.65');
  });
  it('equal springs in series halve the stiffness [CF]', () => {
    expect(seriesStiffness(2e5, 2e5)).toBeCloseTo(1e5, 9);
  });
  it('a rigid support (Infinity) leaves the mount stiffness', () => {
    expect(seriesStiffness(1e5, Number.POSITIVE_INFINITY)).toBe(1e5);
  });
  it('rejects a support of zero stiffness', () => {
    expect(() => seriesStiffness(1e5, 0)).toThrow(/supportNPerM/);
  });
});
