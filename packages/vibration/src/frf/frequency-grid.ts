import { requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

function requireCount(n: number): void {
  if (!Number.isInteger(n) || n < 2) throw new VibrationInputError('n', `must be a whole number ≥ 2 (got ${n})`);
}

/**
 * Logarithmically spaced frequencies from fMin to fMax inclusive (endpoints exact).
 * @param fMinHz first frequency [Hz], > 0
 * @param fMaxHz last frequency [Hz], > fMinHz
 * @param n number of points, ≥ 2
 * @returns frequencies [Hz]
 */
export function logSpace(fMinHz: number, fMaxHz: number, n: number): Float64Array {
  requirePositive('fMinHz', fMinHz);
  requirePositive('fMaxHz', fMaxHz);
  if (!(fMaxHz > fMinHz)) throw new VibrationInputError('fMaxHz', 'must be greater than fMinHz');
  requireCount(n);
  const out = new Float64Array(n);
  const a = Math.log(fMinHz);
  const step = (Math.log(fMaxHz) - a) / (n - 1);
  for (let i = 0; i < n; i++) out[i] = Math.exp(a + step * i);
  out[0] = fMinHz;
  out[n - 1] = fMaxHz;
  return out;
}

/**
 * Evenly spaced frequencies from fMin to fMax inclusive (spectral lines of an analyser).
 * @param fMinHz first frequency [Hz], ≥ 0
 * @param fMaxHz last frequency [Hz], > fMinHz
 * @param n number of points, ≥ 2
 * @returns frequencies [Hz]
 */
export function linSpace(fMinHz: number, fMaxHz: number, n: number): Float64Array {
  if (!Number.isFinite(fMinHz) || fMinHz < 0) throw new VibrationInputError('fMinHz', 'must be a finite number ≥ 0');
  requirePositive('fMaxHz', fMaxHz);
  if (!(fMaxHz > fMinHz)) throw new VibrationInputError('fMaxHz', 'must be greater than fMinHz');
  requireCount(n);
  const out = new Float64Array(n);
  const step = (fMaxHz - fMinHz) / (n - 1);
  for (let i = 0; i < n; i++) out[i] = fMinHz + step * i;
  out[n - 1] = fMaxHz;
  return out;
}
