import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { expectRounded } from '../testing/expect-rounded.js';
import {
  UNDAMPED,
  criticalDamping,
  dampingCoefficientFromRatio,
  dampingRatioFromCoefficient,
  dampingRatioFromLogDecrement,
  dampingRatioFromLossFactor,
  dampingRatioFromQualityFactor,
  equivalentViscousDampingRatio,
  hystereticDamping,
  logDecrementFromAmplitudes,
  logarithmicDecrement,
  lossFactorFromDampingRatio,
  qualityFactor,
  viscousDamping,
} from './damping.js';

// Model: docs/engineering/sdof.md §3–§6; check values: docs/engineering/check-values.md.
describe('damping', () => {
  it('CV-02 [CF]: c = 2000 N·s/m on CV-01 → cc = 6.325e4, ζ = 0.03162, Q = 15.81', () => {
    expectRounded(criticalDamping(2.0e6, 500), '6.325e4');
    const zeta = dampingRatioFromCoefficient(2000, 2.0e6, 500);
    expectRounded(zeta, '0.03162');
    expectRounded(qualityFactor(viscousDamping(zeta)), '15.81');
    expect(dampingCoefficientFromRatio(zeta, 2.0e6, 500)).toBeCloseTo(2000, 9);
  });

  it('η ↔ ζ at resonance (η = 2ζ) and Q = 1/η for hysteretic damping [CF]', () => {
    expect(lossFactorFromDampingRatio(0.05)).toBeCloseTo(0.1, 15);
    expect(dampingRatioFromLossFactor(0.4)).toBeCloseTo(0.2, 15);
    expect(qualityFactor(hystereticDamping(0.1))).toBeCloseTo(10, 12);
    expect(dampingRatioFromQualityFactor(15.811)).toBeCloseTo(0.031623, 5);
    // ζ_eq = η·ωn/(2ω): equals η/2 at r = 1 and η/6 at r = 3
    expect(equivalentViscousDampingRatio(0.2, 1)).toBeCloseTo(0.1, 15);
    expect(equivalentViscousDampingRatio(0.3, 3)).toBeCloseTo(0.05, 15);
  });

  it('logarithmic decrement Λ = 2πζ/√(1−ζ²) and its inverse [CF]', () => {
    expect(logarithmicDecrement(0)).toBe(0);
    expect(logarithmicDecrement(0.05)).toBeCloseTo((2 * Math.PI * 0.05) / Math.sqrt(1 - 0.0025), 14);
    for (const z of [0.001, 0.03162, 0.2, 0.7, 0.95]) {
      expect(dampingRatioFromLogDecrement(logarithmicDecrement(z))).toBeCloseTo(z, 12);
    }
    expect(logDecrementFromAmplitudes(16, 1, 1)).toBeCloseTo(Math.log(16), 14);
    expect(logDecrementFromAmplitudes(4, 1, 0.5)).toBeCloseTo(Math.log(16), 14);
  });

  it('rejects invalid damping inputs with a typed error', () => {
    expect(() => viscousDamping(-0.1)).toThrow(VibrationInputError);
    expect(() => hystereticDamping(Number.NaN)).toThrow(/lossFactor/);
    expect(() => qualityFactor(UNDAMPED)).toThrow(/damping/);
    expect(() => logarithmicDecrement(1)).toThrow(/dampingRatio/);
    expect(() => logDecrementFromAmplitudes(1, 2)).toThrow(/laterAmplitude/);
    expect(() => criticalDamping(1, 0)).toThrow(/massKg/);
  });
});
