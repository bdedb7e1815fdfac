import { describe, expect, it } from 'vitest';
import { hystereticDamping, viscousDamping } from '../sdof/damping.js';
import { stiffnessForNaturalFrequency } from '../sdof/natural-frequency.js';
import { naturalFrequencyFromStaticDeflection } from '../sdof/static-deflection.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { harmonicForceResponse } from './harmonic-response.js';

// Model: docs/engineering/transmissibility.md §10; check values: docs/engineering/check-values.md.
describe('harmonic force response', () => {
  it('CV-25 [CF]: F0 = 500 N at 1480 rpm, fn = 3.152 Hz → X = 21.16 µm (1000 kg), 7.054 µm (3000 kg), F_T = 8.301 N', () => {
    const fn = naturalFrequencyFromStaticDeflection(0.025);
    for (const [m, x] of [
      [1000, '21.16'],
      [3000, '7.054'],
    ] as const) {
      const res = harmonicForceResponse({
        massKg: m,
        stiffnessNPerM: stiffnessForNaturalFrequency(fn, m),
        forceAmplitudeN: 500,
        frequencyHz: 1480 / 60,
      });
      expectRounded(res.displacementAmplitudeM * 1e6, x);
      expectRounded(res.transmittedForceN, '8.301');
      expectRounded(res.transmissibility, '0.01660');
    }
  });

  it('k·|X|/F0 equals 1/(2ζ) at resonance (viscous) and 1/η (hysteretic) [CF]', () => {
    const base = { massKg: 100, stiffnessNPerM: 100 * (2 * Math.PI * 5) ** 2, forceAmplitudeN: 10, frequencyHz: 5 };
    const v = harmonicForceResponse({ ...base, damping: viscousDamping(0.05) });
    expect((v.displacementAmplitudeM * base.stiffnessNPerM) / 10).toBeCloseTo(10, 10);
    const h = harmonicForceResponse({ ...base, damping: hystereticDamping(0.2) });
    expect((h.displacementAmplitudeM * base.stiffnessNPerM) / 10).toBeCloseTo(5, 10);
  });

  it('rejects a negative force amplitude', () => {
    expect(() => harmonicForceResponse({ massKg: 1, stiffnessNPerM: 1, forceAmplitudeN: -1, frequencyHz: 1 })).toThrow(/forceAmplitudeN/);
  });
});
