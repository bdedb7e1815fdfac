import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { UNDAMPED, dampingRatioFromCoefficient, hystereticDamping, viscousDamping } from '../sdof/damping.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { complexAbs, complexArgDeg } from './complex.js';
import { logSpace } from './frequency-grid.js';
import { type FrfKind, decibels, sdofFrf, sdofFrfAt } from './sdof-frf.js';

const CV02 = { massKg: 500, stiffnessNPerM: 2.0e6, damping: viscousDamping(dampingRatioFromCoefficient(2000, 2.0e6, 500)) };

// Model: docs/engineering/frf.md §1–§4; check values: docs/engineering/check-values.md.
describe('SDOF frequency response functions', () => {
  it('CV-03 [CF]: system of CV-02 at 10 Hz', () => {
    const kd = sdofFrfAt(CV02, 'dynamicStiffness', 10);
    expectRounded(kd.re, '2.608e4');
    expectRounded(kd.im, '1.257e5');
    expectRounded(complexAbs(kd), '1.283e5');
    const a = sdofFrfAt(CV02, 'receptance', 10);
    expectRounded(complexAbs(a), '7.792e-6');
    expectRounded(complexArgDeg(a), '-78.28');
    const y = sdofFrfAt(CV02, 'mobility', 10);
    expectRounded(complexAbs(y), '4.896e-4');
    expectRounded(complexArgDeg(y), '11.72');
    const acc = sdofFrfAt(CV02, 'accelerance', 10);
    expectRounded(complexAbs(acc), '3.076e-2');
    expectRounded(complexArgDeg(acc), '101.7');
    expectRounded(complexAbs(sdofFrfAt(CV02, 'apparentMass', 10)), '32.51');
  });

  it('CV-04 [CF]: 1 Hz → |α| = 5.050e-7, φ = −0.364°; 100 Hz → |M_app| = 494.9 kg, φ_α = −179.6°', () => {
    const lo = sdofFrfAt(CV02, 'receptance', 1);
    expectRounded(complexAbs(lo), '5.050e-7');
    expectRounded(complexArgDeg(lo), '-0.364');
    expectRounded(complexAbs(sdofFrfAt(CV02, 'apparentMass', 100)), '494.9');
    expectRounded(complexArgDeg(sdofFrfAt(CV02, 'receptance', 100)), '-179.6');
  });

  it('relations between kinds: Y = jωα, A = −ω²α, Z = K_d/(jω), M_app = −K_d/ω², φ_Y = φ_α + 90°, φ_A = φ_α + 180° [CF]', () => {
    const f = logSpace(0.5, 200, 60);
    const curves = Object.fromEntries(
      (['receptance', 'mobility', 'accelerance', 'dynamicStiffness', 'impedance', 'apparentMass'] as FrfKind[]).map((k) => [
        k,
        sdofFrf(CV02, k, f),
      ]),
    ) as Record<FrfKind, ReturnType<typeof sdofFrf>>;
    for (let i = 0; i < f.length; i++) {
      const w = 2 * Math.PI * f[i];
      const alpha = curves.receptance.magnitude[i];
      expect(curves.mobility.magnitude[i] / (w * alpha)).toBeCloseTo(1, 12);
      expect(curves.accelerance.magnitude[i] / (w * w * alpha)).toBeCloseTo(1, 12);
      expect(curves.dynamicStiffness.magnitude[i] * alpha).toBeCloseTo(1, 12);
      expect(curves.impedance.magnitude[i] * w * alpha).toBeCloseTo(1, 12);
      expect(curves.apparentMass.magnitude[i] * w * w * alpha).toBeCloseTo(1, 12);
      expect(curves.mobility.phaseDeg[i]).toBeCloseTo(curves.receptance.phaseDeg[i] + 90, 9);
      expect(curves.accelerance.phaseDeg[i]).toBeCloseTo(curves.receptance.phaseDeg[i] + 180, 9);
      expect(curves.receptance.phaseDeg[i]).toBeLessThanOrEqual(0);
      expect(curves.receptance.phaseDeg[i]).toBeGreaterThan(-180);
    }
  });

  it('limits: K_d(0) = k, k·|α| = 1/(2ζ) at fn (phase −90°), accelerance → 1/m far above fn [CF]', () => {
    expect(sdofFrfAt(CV02, 'dynamicStiffness', 0)).toEqual({ re: 2.0e6, im: 0 });
    const fn = Math.sqrt(2.0e6 / 500) / (2 * Math.PI);
    const zeta = (CV02.damping as { dampingRatio: number }).dampingRatio;
    const atFn = sdofFrfAt(CV02, 'receptance', fn);
    expect(complexAbs(atFn) * 2.0e6).toBeCloseTo(1 / (2 * zeta), 9);
    expect(complexArgDeg(atFn)).toBeCloseTo(-90, 9);
    expect(complexAbs(sdofFrfAt(CV02, 'accelerance', 1e5)) * 500).toBeCloseTo(1, 6);
  });

  it('hysteretic: K_d = k(1 + jη) − mω²; phase at ω → 0 is −atan(η) (model artefact) [CF]', () => {
    const sys = { massKg: 500, stiffnessNPerM: 2e6, damping: hystereticDamping(0.2) };
    expect(sdofFrfAt(sys, 'dynamicStiffness', 0)).toEqual({ re: 2e6, im: 4e5 });
    expect(complexArgDeg(sdofFrfAt(sys, 'receptance', 0))).toBeCloseTo((-Math.atan(0.2) * 180) / Math.PI, 12);
    const fn = Math.sqrt(2e6 / 500) / (2 * Math.PI);
    expect(complexAbs(sdofFrfAt(sys, 'receptance', fn)) * 2e6).toBeCloseTo(1 / 0.2, 9);
  });

  it('undamped receptance is real, with phase −180° above resonance', () => {
    const c = sdofFrf({ massKg: 1, stiffnessNPerM: 1, damping: UNDAMPED }, 'receptance', [0.05, 1]);
    expect(c.phaseDeg[0]).toBe(0);
    expect(c.phaseDeg[1]).toBe(-180);
  });

  it('decibels with a stated reference', () => {
    expect(decibels(1e-6, 1)).toBeCloseTo(-120, 12);
    expect(decibels(10, 1)).toBeCloseTo(20, 12);
  });

  it('rejects empty grids, f = 0 for impedance, negative frequencies and unknown kinds', () => {
    expect(() => sdofFrf(CV02, 'receptance', [])).toThrow(VibrationInputError);
    expect(() => sdofFrf(CV02, 'impedance', [0, 1])).toThrow(/frequenciesHz\[0\]/);
    expect(() => sdofFrfAt(CV02, 'receptance', -1)).toThrow(/frequencyHz/);
    expect(() => sdofFrfAt(CV02, 'compliance' as FrfKind, 1)).toThrow(/kind/);
    expect(() => sdofFrfAt({ ...CV02, massKg: 0 }, 'receptance', 1)).toThrow(/massKg/);
  });
});
