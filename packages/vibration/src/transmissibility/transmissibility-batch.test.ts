import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { transmissibilityBatch } from './transmissibility-batch.js';
import { transmissibilityHysteretic, transmissibilityViscous } from './transmissibility.js';

describe('transmissibilityBatch', () => {
  it('matches the scalar formulas for every candidate and frequency (row-major output)', () => {
    const n = 50;
    const fn = new Float64Array(n);
    const d = new Float64Array(n);
    const h = new Uint8Array(n);
    for (let i = 0; i < n; i++) {
      fn[i] = 2 + ((i * 7) % 13);
      d[i] = ((i * 3) % 11) / 20;
      h[i] = i % 2;
    }
    const freqs = [24.667, 49.333, 100];
    const out = new Float64Array(n * freqs.length);
    transmissibilityBatch(fn, d, h, freqs, out);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < freqs.length; j++) {
        const r = freqs[j] / fn[i];
        const expected = h[i] ? transmissibilityHysteretic(r, d[i]) : transmissibilityViscous(r, d[i]);
        expect(out[i * 3 + j]).toBeCloseTo(expected, 14);
      }
    }
  });

  it('rejects short arrays, non-positive fn and negative damping with the index in the field', () => {
    const one = new Float64Array([5]);
    expect(() => transmissibilityBatch(one, one, new Uint8Array(1), [10, 20], new Float64Array(1))).toThrow(/out/);
    expect(() => transmissibilityBatch(one, new Float64Array(0), new Uint8Array(1), [10], new Float64Array(1))).toThrow(
      VibrationInputError,
    );
    expect(() =>
      transmissibilityBatch(new Float64Array([5, 0]), new Float64Array(2), new Uint8Array(2), [10], new Float64Array(2)),
    ).toThrow(/fnHz\[1\]/);
    expect(() => transmissibilityBatch(one, new Float64Array([Number.NaN]), new Uint8Array(1), [10], new Float64Array(1))).toThrow(
      /damping\[0\]/,
    );
    expect(() => transmissibilityBatch(one, one, new Uint8Array(1), [-1], new Float64Array(1))).toThrow(/freqsHz\[0\]/);
  });
});
