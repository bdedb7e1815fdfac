import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { expectRounded } from '../testing/expect-rounded.js';
import {
  angularNaturalFrequency,
  dampedNaturalFrequencyHz,
  naturalFrequencyHz,
  stiffnessForNaturalFrequency,
} from './natural-frequency.js';
import { dampingRatioFromCoefficient } from './damping.js';

// Model: docs/engineering/sdof.md §2–§3; check values: docs/engineering/check-values.md.
describe('natural frequency', () => {
  it('CV-01 [CF]: m = 500 kg, k = 2.0e6 N/m → ωn = 63.25 rad/s, fn = 10.07 Hz', () => {
    expectRounded(angularNaturalFrequency(2.0e6, 500), '63.25');
    expectRounded(naturalFrequencyHz(2.0e6, 500), '10.07');
    expectRounded(naturalFrequencyHz(2.0e6, 500), '10.066');
  });

  it('CV-02 [CF]: damped natural frequency ωd = 63.21 rad/s, fd = 10.06 Hz', () => {
    const zeta = dampingRatioFromCoefficient(2000, 2.0e6, 500);
    const fd = dampedNaturalFrequencyHz(naturalFrequencyHz(2.0e6, 500), zeta);
    expectRounded(fd, '10.06');
    expectRounded(fd * 2 * Math.PI, '63.21');
  });

  it('stiffnessForNaturalFrequency inverts naturalFrequencyHz', () => {
    expect(stiffnessForNaturalFrequency(naturalFrequencyHz(123456, 78.9), 78.9)).toBeCloseTo(123456, 6);
  });

  it('rejects zero or negative mass and stiffness, and ζ ≥ 1 for fd', () => {
    expect(() => naturalFrequencyHz(0, 10)).toThrow(VibrationInputError);
    expect(() => naturalFrequencyHz(1000, -1)).toThrow(/massKg/);
    expect(() => naturalFrequencyHz(Number.NaN, 1)).toThrow(/stiffnessNPerM/);
    expect(() => dampedNaturalFrequencyHz(10, 1)).toThrow(/dampingRatio/);
  });
});
