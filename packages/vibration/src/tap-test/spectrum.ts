import FFT from 'fft.js';
import { requireAllFinite, requireNonEmpty } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/** One-sided spectrum of a real block: lines 0 … N/2 of the discrete Fourier transform. */
export interface RealSpectrum {
  /** FFT size N (a power of two ≥ 4; the block is zero-padded to it). */
  size: number;
  /** Re X_k = Σ x_n·cos(2πkn/N), k = 0 … N/2. */
  re: Float64Array;
  /** Im X_k = −Σ x_n·sin(2πkn/N), k = 0 … N/2. */
  im: Float64Array;
}

/** The smallest power of two ≥ n (and ≥ 4, the smallest size fft.js transforms). */
export function nextPowerOfTwo(n: number): number {
  if (!Number.isFinite(n) || n < 1) throw new VibrationInputError('n', `must be a finite number ≥ 1 (got ${n})`);
  let size = 4;
  while (size < n) size *= 2;
  return size;
}

/** Largest FFT size accepted (2^22 lines, about 70 MB of working arrays). */
export const MAX_FFT_SIZE = 2 ** 22;

const transforms = new Map<number, FFT>();

/**
 * Discrete Fourier transform X_k = Σ_{n=0}^{N−1} x_n·e^(−j2πkn/N) of a real block, zero-padded
 * to `size`, computed with fft.js (radix-4, pure JavaScript). No scaling: ratios of spectra
 * (FRFs) need none. Only the lines 0 … N/2 are returned (the rest are their conjugates).
 * @param samples the block x_n (any unit), at most `size` values
 * @param size FFT size N, a power of two ≥ 4 (default: the next power of two of the block)
 * @returns Re and Im of X_k, k = 0 … N/2
 */
export function realSpectrum(samples: ArrayLike<number>, size = nextPowerOfTwo(samples.length)): RealSpectrum {
  requireNonEmpty('samples', samples);
  requireAllFinite('samples', samples);
  if (!Number.isInteger(size) || size < 4 || size > MAX_FFT_SIZE || (size & (size - 1)) !== 0) {
    throw new VibrationInputError('size', `must be a power of two from 4 to ${MAX_FFT_SIZE} (got ${size})`);
  }
  if (samples.length > size) throw new VibrationInputError('samples', `has ${samples.length} values; at most ${size} fit the FFT size`);
  let fft = transforms.get(size);
  if (!fft) {
    fft = new FFT(size);
    if (transforms.size > 8) transforms.clear();
    transforms.set(size, fft);
  }
  const input = new Array<number>(size).fill(0);
  for (let i = 0; i < samples.length; i++) input[i] = samples[i];
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, input);
  const lines = size / 2 + 1;
  const re = new Float64Array(lines);
  const im = new Float64Array(lines);
  for (let k = 0; k < lines; k++) {
    re[k] = out[2 * k];
    im[k] = out[2 * k + 1];
  }
  return { size, re, im };
}
