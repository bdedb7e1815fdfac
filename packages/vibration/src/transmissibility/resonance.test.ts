import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { UNDAMPED, hystereticDamping, viscousDamping } from '../sdof/damping.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { resonanceTransmissibility, transmissibilityPeak, viscousTransmissibilityPeak } from './resonance.js';
import { transmissibilityViscous } from './transmissibility.js';

// Model: docs/engineering/transmissibility.md §6; check values: docs/engineering/check-values.md.
describe('resonance amplification', () => {
  it('CV-10 [CF]: T(r=1) = 10.05 for ζ = 0.05 and for η = 0.1; ζ = 0.2 → 2.693', () => {
    expectRounded(resonanceTransmissibility(viscousDamping(0.05)), '10.05');
    expectRounded(resonanceTransmissibility(hystereticDamping(0.1)), '10.05');
    expectRounded(resonanceTransmissibility(viscousDamping(0.2)), '2.693');
  });

  it('CV-10 [CF]: viscous peak ζ = 0.05 → r_p = 0.9975, T_max = 10.06; ζ = 0.2 → 0.9647, 2.734', () => {
    const a = viscousTransmissibilityPeak(0.05);
    expectRounded(a.frequencyRatio, '0.9975');
    expectRounded(a.transmissibility, '10.06');
    const b = transmissibilityPeak(viscousDamping(0.2));
    expectRounded(b.frequencyRatio, '0.9647');
    expectRounded(b.transmissibility, '2.734');
  });

  it('the viscous peak is a maximum (neighbours are lower) and the hysteretic peak is at r = 1', () => {
    for (const z of [0.01, 0.1, 0.3, 0.7]) {
      const p = viscousTransmissibilityPeak(z);
      expect(transmissibilityViscous(p.frequencyRatio * 1.001, z)).toBeLessThan(p.transmissibility);
      expect(transmissibilityViscous(p.frequencyRatio * 0.999, z)).toBeLessThan(p.transmissibility);
    }
    expect(transmissibilityPeak(hystereticDamping(0.2))).toEqual({
      frequencyRatio: 1,
      transmissibility: Math.sqrt(1.04) / 0.2,
    });
  });

  it('an undamped system has no finite resonance amplification → typed error', () => {
    expect(() => resonanceTransmissibility(UNDAMPED)).toThrow(VibrationInputError);
    expect(() => viscousTransmissibilityPeak(0)).toThrow(/dampingRatio/);
  });
});
