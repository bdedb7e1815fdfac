import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { UNDAMPED, hystereticDamping, viscousDamping } from '../sdof/damping.js';
import { naturalFrequencyFromStaticDeflection } from '../sdof/static-deflection.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { isolationDb, isolationEfficiencyPct } from './isolation.js';
import {
  frequencyRatio,
  relativeDeflectionRatio,
  transmissibility,
  transmissibilityAt,
  transmissibilityHysteretic,
  transmissibilityUndamped,
  transmissibilityViscous,
} from './transmissibility.js';

// Model: docs/engineering/transmissibility.md §1–§7, §10; check values: docs/engineering/check-values.md.
describe('transmissibility', () => {
  it('CV-05 [CF]: r = 3, ζ = 0.05 → T = 0.1304, E = 86.96 %, 17.69 dB', () => {
    const t = transmissibility(3, viscousDamping(0.05));
    expectRounded(t, '0.1304');
    expectRounded(isolationEfficiencyPct(t), '86.96');
    expectRounded(isolationDb(t), '17.69');
  });

  it('CV-06 [CF]: undamped r = 3 → 0.1250, 87.50 %, 18.06 dB; r = 2.5, 4, 5', () => {
    const t = transmissibility(3);
    expectRounded(t, '0.1250');
    expectRounded(isolationEfficiencyPct(t), '87.50');
    expectRounded(isolationDb(t), '18.06');
    expectRounded(transmissibilityUndamped(2.5), '0.1905');
    expectRounded(transmissibilityUndamped(4), '0.06667');
    expectRounded(transmissibilityUndamped(5), '0.04167');
    expect(transmissibility(3, UNDAMPED)).toBe(t);
  });

  it('CV-07 [CF]: viscous damping penalty', () => {
    expectRounded(transmissibilityViscous(3, 0.2), '0.1931');
    expectRounded(transmissibilityViscous(3, 0.5), '0.3701');
    expectRounded(transmissibilityViscous(10, 0), '0.01010');
    expectRounded(transmissibilityViscous(10, 0.2), '0.04161');
    expectRounded(isolationDb(transmissibilityViscous(3, 0.2)), '14.28');
  });

  it('CV-08 [CF]: hysteretic r = 3, η = 0.1 → 0.1256 (18.02 dB); η = 0.4 → 0.1345; r = 10, η = 0.4 → 0.01088', () => {
    const t = transmissibility(3, hystereticDamping(0.1));
    expectRounded(t, '0.1256');
    expectRounded(isolationDb(t), '18.02');
    expectRounded(transmissibilityHysteretic(3, 0.4), '0.1345');
    expectRounded(isolationDb(transmissibilityHysteretic(3, 0.4)), '17.43');
    expectRounded(transmissibilityHysteretic(10, 0.4), '0.01088');
  });

  it('CV-09 [CF]: T = 1 at r = √2 for ζ = 0.05, 0.2 and η = 0.4', () => {
    for (const d of [viscousDamping(0.05), viscousDamping(0.2), hystereticDamping(0.4), UNDAMPED]) {
      expect(transmissibility(Math.SQRT2, d)).toBeCloseTo(1, 12);
    }
  });

  it('CV-12 [CF; n_d illustrative]: ignoring n_d = 1.4 turns r = 3 into 2.535, T = 0.1842', () => {
    const fnStatic = naturalFrequencyFromStaticDeflection(0.005);
    const fnDynamic = naturalFrequencyFromStaticDeflection(0.005, 1.4);
    const r = frequencyRatio(3 * fnStatic, fnDynamic);
    expectRounded(r, '2.535');
    expectRounded(transmissibility(r), '0.1842');
  });

  it('CV-13 [CF]: 1480 rpm on springs δ = 25 mm → r = 7.825, T = 0.01660 (98.34 %, 35.60 dB); ζ = 0.05 → 0.02108', () => {
    const fn = naturalFrequencyFromStaticDeflection(0.025);
    const r = frequencyRatio(1480 / 60, fn);
    expectRounded(r, '7.825');
    const t = transmissibilityAt(1480 / 60, fn);
    expectRounded(t, '0.01660');
    expectRounded(isolationEfficiencyPct(t), '98.34');
    expectRounded(isolationDb(t), '35.60');
    expectRounded(transmissibilityAt(1480 / 60, fn, viscousDamping(0.05)), '0.02108');
  });

  it('T → 1 as r → 0 and the undamped value is +Infinity exactly at r = 1 (never NaN)', () => {
    expect(transmissibility(0, viscousDamping(0.3))).toBe(1);
    expect(transmissibility(0, hystereticDamping(0.3))).toBe(1);
    expect(transmissibility(1)).toBe(Number.POSITIVE_INFINITY);
  });

  it('relative deflection across the isolator r²/√((1−r²)² + (2ζr)²) [CF]', () => {
    expect(relativeDeflectionRatio(0)).toBe(0);
    expect(relativeDeflectionRatio(3)).toBeCloseTo(9 / 8, 14);
    expect(relativeDeflectionRatio(1, viscousDamping(0.05))).toBeCloseTo(10, 12);
    expect(relativeDeflectionRatio(1, hystereticDamping(0.1))).toBeCloseTo(10, 12);
  });

  it('rejects negative ratios, non-finite damping and an unknown model', () => {
    expect(() => transmissibility(-1)).toThrow(VibrationInputError);
    expect(() => transmissibility(2, { model: 'viscous', dampingRatio: Number.NaN })).toThrow(/damping.dampingRatio/);
    expect(() => transmissibility(2, { model: 'coulomb' } as never)).toThrow(/damping.model/);
    expect(() => frequencyRatio(10, 0)).toThrow(/naturalFrequencyHz/);
  });
});
