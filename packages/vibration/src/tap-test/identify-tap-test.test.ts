import { describe, expect, it } from 'vitest';
import { linSpace } from '../frf/frequency-grid.js';
import { sdofFrf } from '../frf/sdof-frf.js';
import { viscousDamping } from '../sdof/damping.js';
import { identifyTapTest } from './identify-tap-test.js';
import { seededNormal } from './simulate-impact.js';

const M = 1250;
const K = 1.6e6;
const FN = Math.sqrt(K / M) / (2 * Math.PI); // 5.694 Hz

/**
 * Half-power estimate of ζ from an exact viscous receptance (closed form): the half-power points
 * are at r² = 1 − 2ζ² ∓ 2ζ√(1 − ζ²) and the peak at r² = 1 − 2ζ², so
 * ζ_hp = (r₂ − r₁)/(2·r_p). It is the method's own bias: +0.5 % at ζ = 0.05, +2.1 % at ζ = 0.1.
 */
function halfPowerBias(zeta: number): number {
  const r1 = Math.sqrt(1 - 2 * zeta * zeta - 2 * zeta * Math.sqrt(1 - zeta * zeta));
  const r2 = Math.sqrt(1 - 2 * zeta * zeta + 2 * zeta * Math.sqrt(1 - zeta * zeta));
  return (r2 - r1) / (2 * Math.sqrt(1 - 2 * zeta * zeta));
}

/** An FRF file as a spectrum analyser writes it: lines every Δf, with 1 % complex noise. */
function measured(zeta: number, kind: 'receptance' | 'mobility' | 'accelerance', noise: number, seed: number) {
  // Δf ≤ (f₂ − f₁)/10: the resolution the method's source asks for, with a margin [CP]
  const df = Math.min(0.05, (2 * zeta * FN) / 10);
  const f = linSpace(df, 25, Math.round(25 / df));
  const curve = sdofFrf({ massKg: M, stiffnessNPerM: K, damping: viscousDamping(zeta) }, kind, f);
  const normal = seededNormal(seed);
  const re = Array.from(curve.re);
  const im = Array.from(curve.im);
  for (let i = 0; i < re.length; i++) {
    const a = 1 + noise * normal();
    const b = noise * normal();
    [re[i], im[i]] = [re[i] * a - im[i] * b, re[i] * b + im[i] * a];
  }
  return {
    frequencyHz: Array.from(f),
    re,
    im,
    magnitude: re.map((r, i) => Math.hypot(r, im[i])),
    phaseDeg: re.map((r, i) => (Math.atan2(im[i], r) * 180) / Math.PI),
  };
}

describe('tap-test identification from synthetic FRFs of a known one-mass system (sdofFrf, closed form)', () => {
  it('ζ_hp closed form: the half-power method reads ζ a little high (docs/engineering/tap-test.md §5)', () => {
    expect(halfPowerBias(0.05) / 0.05 - 1).toBeCloseTo(0.005, 3);
    expect(halfPowerBias(0.1) / 0.1 - 1).toBeCloseTo(0.021, 3);
  });

  it('exact data: fn = f_p/√(1 − 2ζ²) within 0.1 %, ζ equal to the closed-form half-power value within 0.5 %', () => {
    for (const zeta of [0.01, 0.03, 0.05, 0.1]) {
      const data = measured(zeta, 'receptance', 0, 1);
      const id = identifyTapTest({ kind: 'receptance', frequencyHz: data.frequencyHz, re: data.re, im: data.im }, { massKg: M });
      expect(Math.abs(id.naturalFrequencyHz! / FN - 1), `ζ = ${zeta}`).toBeLessThan(0.001);
      expect(Math.abs(id.dampingRatio! / halfPowerBias(zeta) - 1), `ζ = ${zeta}`).toBeLessThan(0.005);
      expect(id.quality).toBe('good');
    }
  });

  it('1 % noise, three quantities, both file forms: fn within 1 %, ζ within 5 % (half-power bias + noise), k = m·(2π·fn)² within 2 %', () => {
    for (const zeta of [0.01, 0.02, 0.05, 0.1]) {
      for (const kind of ['receptance', 'mobility', 'accelerance'] as const) {
        const data = measured(zeta, kind, 0.01, 17);
        for (const frf of [
          { kind, frequencyHz: data.frequencyHz, re: data.re, im: data.im },
          { kind, frequencyHz: data.frequencyHz, magnitude: data.magnitude, phaseDeg: data.phaseDeg },
        ]) {
          const id = identifyTapTest(frf, { massKg: M });
          const what = `ζ = ${zeta}, ${kind}`;
          expect(Math.abs(id.naturalFrequencyHz! / FN - 1), what).toBeLessThan(0.01);
          expect(Math.abs(id.dampingRatio! / zeta - 1), `${what}: ζ = ${id.dampingRatio}`).toBeLessThan(0.05);
          expect(Math.abs(id.stiffnessNPerM! / K - 1), what).toBeLessThan(0.02);
          expect(id.windowDampingCorrection).toBe(0);
        }
      }
    }
  });

  it('says when the resolution is too coarse, the record too short or the coherence low', () => {
    const zeta = 0.02;
    const f = linSpace(0.5, 20, 40); // 0.5 Hz lines, half-power band ≈ 0.23 Hz
    const c = sdofFrf({ massKg: M, stiffnessNPerM: K, damping: viscousDamping(zeta) }, 'accelerance', f);
    const id = identifyTapTest(
      { kind: 'accelerance', frequencyHz: f, re: c.re, im: c.im },
      { recordDurationS: 2, coherence: Array.from(f, () => 0.6) },
    );
    expect(id.quality).toBe('fair');
    expect(id.reasons.map((r) => r.code)).toEqual(['resolution-too-coarse']);
    expect(id.warnings.map((w) => w.code)).toEqual(['record-too-short', 'low-coherence']);
    expect(id.warnings[0].message).toMatch(/needs \d/);
    expect(id.stiffnessNPerM).toBeUndefined();
  });

  it('a window correction as large as the damping leaves ζ unidentified and says why; no peak → poor, no figures', () => {
    const data = measured(0.02, 'accelerance', 0, 1);
    const id = identifyTapTest(
      { kind: 'accelerance', frequencyHz: data.frequencyHz, re: data.re, im: data.im },
      { exponentialTimeConstantS: 0.5 },
    );
    expect(id.dampingRatio).toBeUndefined();
    expect(id.naturalFrequencyHz).toBe(id.peakFrequencyHz);
    expect(id.warnings.map((w) => w.code)).toEqual(['window-correction-too-large']);

    const above = linSpace(12, 30, 60);
    const c = sdofFrf({ massKg: M, stiffnessNPerM: K, damping: viscousDamping(0.05) }, 'receptance', above);
    const none = identifyTapTest({ kind: 'receptance', frequencyHz: above, re: c.re, im: c.im });
    expect(none.quality).toBe('poor');
    expect(none.naturalFrequencyHz).toBeUndefined();
    expect(none.reasons.map((r) => r.code)).toEqual(['peak-at-edge']);
  });
});
