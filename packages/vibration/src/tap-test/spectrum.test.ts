import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { nextPowerOfTwo, realSpectrum } from './spectrum.js';
import { seededNormal } from './simulate-impact.js';

/** The DFT by its definition X_k = Σ x_n·e^(−j2πkn/N) (Oppenheim & Schafer, Discrete-Time Signal Processing, the DFT pair). */
function directDft(x: number[], size: number): { re: number[]; im: number[] } {
  const re: number[] = [];
  const im: number[] = [];
  for (let k = 0; k <= size / 2; k++) {
    let r = 0;
    let i = 0;
    for (let n = 0; n < x.length; n++) {
      r += x[n] * Math.cos((2 * Math.PI * k * n) / size);
      i -= x[n] * Math.sin((2 * Math.PI * k * n) / size);
    }
    re.push(r);
    im.push(i);
  }
  return { re, im };
}

describe('real spectrum (fft.js)', () => {
  it('equals the DFT by its definition for random blocks, zero-padded to a power of two', () => {
    const normal = seededNormal(3);
    for (const [length, size] of [
      [4, 4],
      [5, 8],
      [64, 64],
      [300, 512],
      [1000, 1024],
    ]) {
      const x = Array.from({ length }, () => normal());
      const fast = realSpectrum(x, size);
      const slow = directDft(x, size);
      const scale = Math.max(...slow.re.map(Math.abs));
      for (let k = 0; k <= size / 2; k++) {
        expect(Math.abs(fast.re[k] - slow.re[k])).toBeLessThan(1e-9 * scale);
        expect(Math.abs(fast.im[k] - slow.im[k])).toBeLessThan(1e-9 * scale);
      }
    }
  });

  it('a unit impulse has a flat spectrum; a cosine on a line puts N/2 on that line (closed forms)', () => {
    const impulse = realSpectrum([1, 0, 0, 0, 0, 0, 0, 0]);
    expect(Array.from(impulse.re)).toEqual([1, 1, 1, 1, 1]);
    const n = 256;
    const c = realSpectrum(Array.from({ length: n }, (_, i) => Math.cos((2 * Math.PI * 10 * i) / n)));
    expect(c.re[10]).toBeCloseTo(n / 2, 9);
    expect(Math.abs(c.re[11])).toBeLessThan(1e-9);
  });

  it('pads to the next power of two and refuses other sizes', () => {
    expect(nextPowerOfTwo(1)).toBe(4);
    expect(nextPowerOfTwo(1025)).toBe(2048);
    expect(realSpectrum([1, 2, 3]).size).toBe(4);
    expect(() => realSpectrum([1, 2], 6)).toThrow(VibrationInputError);
    expect(() => realSpectrum([1, 2, 3, 4, 5], 4)).toThrow(/at most 4/);
    expect(() => realSpectrum([1, Number.NaN])).toThrow(/samples\[1\]/);
  });
});
