import { describe, expect, it } from 'vitest';
import { expectRounded } from '../testing/expect-rounded.js';
import { exponentialWindowDampingCorrection, halfPowerDamping } from './half-power.js';

// Model: docs/engineering/identification.md §3, §7; check values: docs/engineering/check-values.md.
describe('half-power damping', () => {
  it('CV-22 [CF] simple case: f₁ = 9.5, f₂ = 10.5, f_p = 10 → ζ = 0.05, η = 0.10', () => {
    const d = halfPowerDamping(9.5, 10.5, 10);
    expect(d.dampingRatio).toBeCloseTo(0.05, 15);
    expect(d.lossFactor).toBeCloseTo(0.1, 15);
  });
  it('CV-22 [CF]: exact half-power points of CV-02, r² = 1 − 2ζ² ∓ 2ζ√(1−ζ²) → 9.732, 10.369; ζ_est = 0.03169', () => {
    // CV-22 divides the unrounded bandwidth 0.6373 Hz; with f₁, f₂ rounded to 3 decimals ζ would be 0.03167
    const fn = Math.sqrt(2e6 / 500) / (2 * Math.PI);
    const z = 2000 / (2 * Math.sqrt(2e6 * 500));
    const f1 = fn * Math.sqrt(1 - 2 * z * z - 2 * z * Math.sqrt(1 - z * z));
    const f2 = fn * Math.sqrt(1 - 2 * z * z + 2 * z * Math.sqrt(1 - z * z));
    const fp = fn * Math.sqrt(1 - 2 * z * z);
    expectRounded(f1, '9.732');
    expectRounded(f2, '10.369');
    expectRounded(fp, '10.056');
    expectRounded(halfPowerDamping(f1, f2, fp).dampingRatio, '0.03169');
  });
  it('CV-24 [REC: Ewins, from memory]: fn = 10 Hz, τ = 2 s → Δζ = 0.007958', () => {
    expectRounded(exponentialWindowDampingCorrection(10, 2), '0.007958');
  });
  it('rejects an inverted band', () => {
    expect(() => halfPowerDamping(10.5, 9.5, 10)).toThrow(/upperHz/);
  });
});
