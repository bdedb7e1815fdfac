import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { M_PER_IN } from '../units/constants.js';
import { hzToCpm } from '../units/convert.js';
import {
  dynamicStiffnessFromStatic,
  naturalFrequencyFromStaticDeflection,
  staticDeflection,
  staticDeflectionForNaturalFrequency,
} from './static-deflection.js';
import { naturalFrequencyHz } from './natural-frequency.js';

// Model: docs/engineering/static-deflection.md §1–§5; check values: docs/engineering/check-values.md.
describe('static deflection ↔ natural frequency', () => {
  it('CV-11 [CF]: δ = 25 mm → 3.152 Hz; 1 in → 3.127 Hz = 187.6 cpm; 2 in → 2.211 Hz; fn = 5 Hz → 9.936 mm', () => {
    expectRounded(naturalFrequencyFromStaticDeflection(0.025), '3.152');
    expectRounded(naturalFrequencyFromStaticDeflection(M_PER_IN), '3.127');
    expectRounded(hzToCpm(naturalFrequencyFromStaticDeflection(M_PER_IN)), '187.6');
    expectRounded(naturalFrequencyFromStaticDeflection(2 * M_PER_IN), '2.211');
    expectRounded(staticDeflectionForNaturalFrequency(5) * 1000, '9.936');
  });

  it('CV-12 [CF; n_d illustrative]: δ_st = 5 mm, n_d = 1.4 → 7.048 Hz static, 8.340 Hz dynamic', () => {
    expectRounded(naturalFrequencyFromStaticDeflection(0.005), '7.048');
    expectRounded(naturalFrequencyFromStaticDeflection(0.005, 1.4), '8.340');
    expect(staticDeflectionForNaturalFrequency(naturalFrequencyFromStaticDeflection(0.005, 1.4), 1.4)).toBeCloseTo(0.005, 14);
  });

  it('δ = W/k agrees with fn = √(k/m)/2π when W = m·g', () => {
    const m = 750;
    const k = 3.3e5;
    const delta = staticDeflection(m * 9.80665, k);
    expect(naturalFrequencyFromStaticDeflection(delta)).toBeCloseTo(naturalFrequencyHz(k, m), 12);
    expect(dynamicStiffnessFromStatic(k, 1.4)).toBeCloseTo(4.62e5, 6);
  });

  it('rejects zero deflection and a non-positive dynamic stiffness ratio', () => {
    expect(() => naturalFrequencyFromStaticDeflection(0)).toThrow(VibrationInputError);
    expect(() => naturalFrequencyFromStaticDeflection(0.01, 0)).toThrow(/dynamicStiffnessRatio/);
    expect(() => staticDeflection(100, Number.POSITIVE_INFINITY)).toThrow(/stiffnessNPerM/);
  });
});
