import { describe, expect, it } from 'vitest';
import { expectRounded } from '../testing/expect-rounded.js';
import { fitDynamicStiffness } from './dynamic-stiffness-fit.js';

// Model: docs/engineering/identification.md §5; check values: docs/engineering/check-values.md.
describe('least-squares fit of the dynamic stiffness', () => {
  it('CV-23 [CF]: two samples (2 Hz, 20 Hz) → m = 500.0 kg, k = 2.000e6 N/m, c = 2000 N·s/m', () => {
    const fit = fitDynamicStiffness([2, 20], [1.921043e6, -5.895684e6], [2.5133e4, 2.51327e5]);
    expectRounded(fit.massKg, '500.0');
    expectRounded(fit.stiffnessNPerM, '2.000e6');
    expectRounded(fit.dampingCoefficientNsPerM, '2000');
    expect(fit.points).toBe(2);
    expect(fit.relativeResidual).toBeLessThan(1e-9);
    expectRounded(fit.naturalFrequencyHz, '10.07');
  });

  it('recovers a hysteretic loss factor from Im K_d = η·k', () => {
    const f = [1, 3, 5, 8, 13];
    const re = f.map((x) => 1e6 - 250 * (2 * Math.PI * x) ** 2);
    const im = f.map(() => 0.15 * 1e6);
    const fit = fitDynamicStiffness(f, re, im);
    expect(fit.stiffnessNPerM).toBeCloseTo(1e6, 3);
    expect(fit.massKg).toBeCloseTo(250, 8);
    expect(fit.lossFactor).toBeCloseTo(0.15, 12);
  });

  it('needs two distinct frequencies and equal-length arrays', () => {
    expect(() => fitDynamicStiffness([5, 5], [1, 2], [0, 0])).toThrow(/frequencyHz/);
    expect(() => fitDynamicStiffness([5], [1], [0])).toThrow(/frequencyHz/);
    expect(() => fitDynamicStiffness([1, 2], [1], [0, 0])).toThrow(/re/);
    expect(() => fitDynamicStiffness([0, 2], [1, 1], [0, 0])).toThrow(/frequencyHz\[0\]/);
  });
});
