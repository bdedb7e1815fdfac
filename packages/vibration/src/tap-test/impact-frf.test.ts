import { abs, add, complex, divide, multiply, subtract, type Complex as MathComplex } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { identifyTapTest } from './identify-tap-test.js';
import { impactFrf, type ImpactFrf } from './impact-frf.js';
import { simulateImpactRecord, type ImpactSimulation } from './simulate-impact.js';

const M = 1000;
const FN = 5;
const K = M * (2 * Math.PI * FN) ** 2;

/**
 * Accelerance of m·ẍ + c·ẋ + k·x = F as the Laplace transfer function s²/(m·s² + c·s + k),
 * evaluated with mathjs complex arithmetic at s = σ + jω (σ = 1/τ gives the FRF of the
 * exponentially windowed impulse response h(t)·e^(−t/τ): the shift theorem of the Laplace transform).
 */
function trueAccelerance(zeta: number, f: number, sigma = 0): MathComplex {
  const c = 2 * zeta * Math.sqrt(K * M);
  const s = complex(sigma, 2 * Math.PI * f);
  const s2 = multiply(s, s) as MathComplex;
  return divide(s2, add(add(multiply(M, s2), multiply(c, s)), K)) as MathComplex;
}

/** Largest |H1 − H|/|H| over fn/2 … 2·fn. */
function worstError(frf: ImpactFrf, zeta: number, sigma = 0): number {
  let worst = 0;
  frf.frequencyHz.forEach((f, i) => {
    if (f < FN / 2 || f > 2 * FN) return;
    const h = trueAccelerance(zeta, f, sigma);
    worst = Math.max(
      worst,
      (abs(subtract(complex(frf.re[i], frf.im[i]), h) as MathComplex) as unknown as number) / (abs(h) as unknown as number),
    );
  });
  return worst;
}

const record = (zeta: number, overrides: Partial<ImpactSimulation> = {}) => {
  const spacing = overrides.durationS ? overrides.durationS / 5 : 12;
  return simulateImpactRecord({
    massKg: M,
    stiffnessNPerM: K,
    dampingRatio: zeta,
    sampleRateHz: 1024,
    durationS: 0.5 + 5 * spacing,
    // a soft tip: 20 ms half-sine pulses of about 2 kN, one every `spacing` seconds
    pulses: [0, 1, 2, 3, 4].map((i) => ({ timeS: 0.5 + i * spacing, peakForceN: 2000 + 150 * i, durationS: 0.02 })),
    noise: { forceN: 2, accelerationMS2: 0.002, seed: 11 },
    ...overrides,
  });
};

describe('H1 from a raw impact record (synthetic, simulated with RK4 from a known one-mass system)', () => {
  it('5 hits, ζ = 0.05, 0.1 % force and 0.1 % response noise: H1 matches the closed-form accelerance within 2 % over fn/2 … 2fn; coherence ≈ 1', () => {
    const frf = impactFrf(record(0.05));
    expect(frf.hits.map((h) => h.timeS)).toEqual(frf.hits.map((_, i) => expect.closeTo(0.5 + 12 * i, 2)));
    expect(frf.hitsAveraged).toBe(5);
    expect(frf.exponentialTimeConstantS).toBeNull();
    expect(frf.blockDurationS).toBeCloseTo(12, 1);
    expect(frf.resolutionHz).toBe(1024 / 16384);
    expect(worstError(frf, 0.05)).toBeLessThan(0.02);
    const atFn = frf.frequencyHz.findIndex((f) => f >= FN);
    expect(frf.coherence![atFn]).toBeGreaterThan(0.99);
    expect(frf.warnings).toEqual([]);
    // a 20 ms half-sine has its first spectral zero at 1.5/T = 75 Hz: the usable band ends below it
    expect(frf.usableBandHz.max).toBeGreaterThan(40);
    expect(frf.usableBandHz.max).toBeLessThan(75);
  });

  it('identification from the H1: fn within 1 %, ζ within 5 %, k from the mass within 2 % (ζ = 0.02, 0.05, 0.1)', () => {
    for (const zeta of [0.02, 0.05, 0.1]) {
      const frf = impactFrf(record(zeta, zeta < 0.05 ? { durationS: 5 * 40 } : {}));
      const id = identifyTapTest(
        { kind: 'accelerance', frequencyHz: frf.frequencyHz, re: frf.re, im: frf.im },
        {
          massKg: M,
          exponentialTimeConstantS: frf.exponentialTimeConstantS,
          recordDurationS: frf.blockDurationS,
          coherence: frf.coherence,
        },
      );
      expect(id.naturalFrequencyHz! / FN - 1, `ζ = ${zeta}`).toBeLessThan(0.01);
      expect(Math.abs(id.naturalFrequencyHz! / FN - 1)).toBeLessThan(0.01);
      expect(Math.abs(id.dampingRatio! / zeta - 1), `ζ = ${zeta}: ${id.dampingRatio}`).toBeLessThan(0.05);
      expect(Math.abs(id.stiffnessNPerM! / K - 1)).toBeLessThan(0.02);
      expect(id.meanCoherence).toBeGreaterThan(0.95);
      expect(id.warnings).toEqual([]);
    }
  });

  it('a response that has not died away gets the exponential window; H1 is then the FRF of h(t)·e^(−t/τ) and the corrected ζ is nearer the truth', () => {
    // ζ = 0.01 needs 5/(ζωn) ≈ 16 s; a 6 s record after the hit is too short
    const frf = impactFrf(record(0.01, { durationS: 6.5, pulses: [{ timeS: 0.5, peakForceN: 2000, durationS: 0.02 }] }));
    const tau = frf.exponentialTimeConstantS!;
    expect(tau).toBeGreaterThan(0);
    expect(frf.warnings.map((w) => w.code)).toContain('exponential-window');
    expect(worstError(frf, 0.01, 1 / tau)).toBeLessThan(0.03);
    const id = identifyTapTest(
      { kind: 'accelerance', frequencyHz: frf.frequencyHz, re: frf.re, im: frf.im },
      { exponentialTimeConstantS: tau, recordDurationS: frf.blockDurationS },
    );
    // Ewins (Modal Testing, from memory): Δζ = 1/(ωn·τ)
    expect(id.windowDampingCorrection).toBeCloseTo(1 / (2 * Math.PI * id.peakFrequencyHz! * tau), 12);
    expect(Math.abs(id.dampingRatio! - 0.01)).toBeLessThan(Math.abs(id.measuredDampingRatio! - 0.01));
    expect(Math.abs(id.naturalFrequencyHz! / FN - 1)).toBeLessThan(0.01);
    expect(id.warnings.map((w) => w.code)).toContain('record-too-short');
  });

  it('separates hits by threshold crossings: a double hit and a clipped force are left out and named', () => {
    const base = record(0.05);
    const double = simulateImpactRecord({
      massKg: M,
      stiffnessNPerM: K,
      dampingRatio: 0.05,
      sampleRateHz: 1024,
      durationS: 60,
      pulses: [
        ...[0, 1, 2, 3, 4].map((i) => ({ timeS: 0.5 + 12 * i, peakForceN: 2000, durationS: 0.02 })),
        { timeS: 12.6, peakForceN: 900, durationS: 0.02 }, // hit 2 bounces back 0.1 s later
      ],
      clipAt: { forceN: 1e9 },
    });
    const frf = impactFrf(double);
    expect(frf.hits).toHaveLength(5);
    expect(frf.hits[1].problems).toEqual(['double-hit']);
    expect(frf.hits[1].used).toBe(false);
    expect(frf.hitsAveraged).toBe(4);
    expect(frf.warnings.map((w) => w.code)).toEqual(['double-hit', 'few-hits']);
    expect(frf.warnings[0].message).toMatch(/hit 2 and left out/);

    const clipped = impactFrf({ ...base, forceN: base.forceN.map((f, i) => (i > 12 * 1024 && i < 14 * 1024 ? Math.min(f, 1500) : f)) });
    expect(clipped.hits[1].problems).toContain('force-clipped');
    expect(clipped.warnings.map((w) => w.code)).toContain('force-clipped');

    const overload = impactFrf({ ...base, accelerationMS2: base.accelerationMS2.map((a) => Math.max(-1.2, Math.min(1.2, a))) });
    expect(overload.warnings.map((w) => w.code)).toContain('response-clipped');
    expect(overload.hitsAveraged).toBe(5); // every hit is clipped: averaged anyway, with the warning
    expect(overload.warnings.find((w) => w.code === 'response-clipped')!.message).toMatch(/averaged anyway/);
  });

  it('one hit: no coherence and a warning; a last hit cut short is dropped; a negative hammer sign works', () => {
    const one = impactFrf(record(0.05, { pulses: [{ timeS: 0.5, peakForceN: 2000, durationS: 0.02 }], durationS: 12 }));
    expect(one.coherence).toBeNull();
    expect(one.warnings.map((w) => w.code)).toEqual(['few-hits']);
    expect(worstError(one, 0.05)).toBeLessThan(0.08); // no averaging: about √5 times the noise of five hits

    const cut = impactFrf(
      record(0.05, {
        durationS: 40,
        pulses: [0.5, 12.5, 24.5, 36.5].map((timeS) => ({ timeS, peakForceN: 2000, durationS: 0.02 })),
      }),
    );
    expect(cut.hits[3].problems).toEqual(['short-tail']);
    expect(cut.hitsAveraged).toBe(3);
    expect(cut.warnings.map((w) => w.code)).toContain('last-hit-dropped');

    const base = record(0.05);
    const flipped = impactFrf({ ...base, forceN: base.forceN.map((f) => -f) });
    const i = flipped.frequencyHz.findIndex((f) => f >= FN);
    const straight = impactFrf(base);
    expect(flipped.re[i]).toBeCloseTo(-straight.re[i], 12);
    expect(flipped.hitsAveraged).toBe(5);
  });

  it('refuses a record without a hit, of unequal lengths or too short, with a typed error', () => {
    const zeros = new Array(1000).fill(0);
    expect(() => impactFrf({ sampleRateHz: 100, forceN: zeros, accelerationMS2: zeros })).toThrow(/no hammer hit/);
    expect(() => impactFrf({ sampleRateHz: 100, forceN: zeros, accelerationMS2: zeros.slice(1) })).toThrow(VibrationInputError);
    expect(() => impactFrf({ sampleRateHz: 100, forceN: [1, 2], accelerationMS2: [1, 2] })).toThrow(/at least 64 samples/);
    const near = zeros.map((_, i) => (i % 40 === 5 ? 100 : 0));
    expect(() => impactFrf({ sampleRateHz: 100, forceN: near, accelerationMS2: zeros }, { minHitSpacingS: 0.1 })).toThrow(/too close/);
  });
});
