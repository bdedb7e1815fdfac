import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { linSpace } from '../frf/frequency-grid.js';
import { sdofFrf } from '../frf/sdof-frf.js';
import { dampingRatioFromCoefficient, hystereticDamping, viscousDamping } from '../sdof/damping.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { findResonancePeak, identifyFromFrf } from './identify-from-frf.js';

const CV02 = { massKg: 500, stiffnessNPerM: 2.0e6, damping: viscousDamping(dampingRatioFromCoefficient(2000, 2.0e6, 500)) };

// Model: docs/engineering/identification.md §1–§6; check values: docs/engineering/check-values.md.
describe('identification from a measured FRF', () => {
  it('CV-22 [CF]: receptance of CV-02 at 0.01 Hz lines → f_p = 10.056, f₁ = 9.732, f₂ = 10.369, ζ = 0.03169', () => {
    const curve = sdofFrf(CV02, 'receptance', linSpace(0.5, 20, 1951));
    const id = identifyFromFrf({ frequencyHz: curve.frequencyHz, kind: 'receptance', re: curve.re, im: curve.im });
    expect(id.quality).toBe('good');
    expect(id.reasons).toEqual([]);
    expectRounded(id.naturalFrequencyHz!, '10.056');
    expectRounded(id.halfPower!.lowerHz, '9.732');
    expectRounded(id.halfPower!.upperHz, '10.369');
    expectRounded(id.halfPower!.dampingRatio, '0.03169');
    // exact data: the fit returns the system itself (CV-23 method)
    expect(id.fit!.stiffnessNPerM).toBeCloseTo(2e6, 0);
    expect(id.fit!.massKg).toBeCloseTo(500, 6);
    expect(id.fit!.dampingCoefficientNsPerM).toBeCloseTo(2000, 6);
    // Re K_d at f ≤ 0.25 fn is k − mω², a little below k
    expect(id.lowFrequencyStiffnessNPerM! / 2e6).toBeGreaterThan(0.97);
    expect(id.lowFrequencyStiffnessNPerM! / 2e6).toBeLessThan(1);
  });

  it('accelerance, mobility and magnitude/phase inputs give the same figures as receptance', () => {
    const f = linSpace(1, 25, 481);
    const ref = (() => {
      const c = sdofFrf(CV02, 'receptance', f);
      return identifyFromFrf({ frequencyHz: f, kind: 'receptance', re: c.re, im: c.im });
    })();
    for (const kind of ['accelerance', 'mobility'] as const) {
      const c = sdofFrf(CV02, kind, f);
      const a = identifyFromFrf({ frequencyHz: f, kind, re: c.re, im: c.im });
      const b = identifyFromFrf({ frequencyHz: f, kind, magnitude: c.magnitude, phaseDeg: c.phaseDeg });
      for (const id of [a, b]) {
        expect(id.naturalFrequencyHz).toBeCloseTo(ref.naturalFrequencyHz!, 9);
        expect(id.halfPower!.dampingRatio).toBeCloseTo(ref.halfPower!.dampingRatio, 9);
        expect(id.fit!.stiffnessNPerM).toBeCloseTo(ref.fit!.stiffnessNPerM, 0);
      }
    }
  });

  it('hysteretic data: half-power η ≈ loss factor and the fit returns η from Im K_d = η·k', () => {
    const sys = { massKg: 800, stiffnessNPerM: 1.5e6, damping: hystereticDamping(0.08) };
    const f = linSpace(0.2, 15, 1481);
    const c = sdofFrf(sys, 'receptance', f);
    const id = identifyFromFrf({ frequencyHz: f, kind: 'receptance', re: c.re, im: c.im });
    expect(id.halfPower!.lossFactor).toBeCloseTo(0.08, 3);
    expect(id.fit!.lossFactor).toBeCloseTo(0.08, 9);
  });

  it('flags coarse resolution, a peak at the edge, too few points and no clear peak', () => {
    const coarse = linSpace(2, 20, 19); // 1 Hz lines, bandwidth ≈ 0.64 Hz
    const c = sdofFrf(CV02, 'receptance', coarse);
    const a = identifyFromFrf({ frequencyHz: coarse, kind: 'receptance', re: c.re, im: c.im });
    expect(a.quality).toBe('fair');
    expect(a.reasons.map((r) => r.code)).toContain('resolution-too-coarse');

    const above = linSpace(12, 30, 50);
    const e = sdofFrf(CV02, 'receptance', above);
    const b = identifyFromFrf({ frequencyHz: above, kind: 'receptance', re: e.re, im: e.im });
    expect(b.quality).toBe('poor');
    expect(b.reasons.map((r) => r.code)).toEqual(['peak-at-edge']);
    expect(b.naturalFrequencyHz).toBeUndefined();

    const few = identifyFromFrf({ frequencyHz: [9, 10, 11], kind: 'receptance', re: [1, 2, 1], im: [0, 0, 0] });
    expect(few.reasons.map((r) => r.code)).toEqual(['too-few-points']);
    expect(few.quality).toBe('poor');

    const flat = linSpace(1, 20, 40);
    const mag = Array.from(flat, (x) => 1 + 0.1 * Math.exp(-((x - 10) ** 2)));
    const d = identifyFromFrf({ frequencyHz: flat, kind: 'receptance', magnitude: mag, phaseDeg: mag.map(() => 0) });
    expect(d.reasons.map((r) => r.code)).toEqual(['no-clear-peak']);
  });

  it('parabolic interpolation finds the vertex of a sampled parabola exactly (unequal spacing)', () => {
    const f = [1, 2, 2.5, 4, 5];
    const m = f.map((x) => 10 - (x - 2.8) ** 2);
    const p = findResonancePeak(f, m)!;
    expect(p.frequencyHz).toBeCloseTo(2.8, 12);
    expect(p.magnitude).toBeCloseTo(10, 12);
  });

  it('rejects empty, ragged, non-increasing or non-finite data with a typed error', () => {
    expect(() => identifyFromFrf({ frequencyHz: [], kind: 'receptance', re: [], im: [] })).toThrow(VibrationInputError);
    expect(() => identifyFromFrf({ frequencyHz: [1, 2], kind: 'receptance', re: [1], im: [1, 2] })).toThrow(/re/);
    expect(() => identifyFromFrf({ frequencyHz: [1, 1], kind: 'receptance', re: [1, 1], im: [1, 2] })).toThrow(/strictly increasing/);
    expect(() => identifyFromFrf({ frequencyHz: [1, 2], kind: 'receptance', re: [1, Number.NaN], im: [1, 2] })).toThrow(/re\[1\]/);
    expect(() => identifyFromFrf({ frequencyHz: [1, 2], kind: 'receptance' })).toThrow(/magnitude and phaseDeg/);
  });
});
