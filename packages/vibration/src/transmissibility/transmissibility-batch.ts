import { VibrationInputError } from '../errors/vibration-input-error.js';

/**
 * Zero-allocation transmissibility kernel for ranking many candidates.
 *
 * For candidate i and frequency j writes T into `out[i·nf + j]` (nf = freqsHz.length):
 * hysteretic `√(1 + η²)/√((1 − r²)² + η²)` when `isHysteretic[i]` is non-zero, else viscous
 * `√(1 + (2ζr)²)/√((1 − r²)² + (2ζr)²)`, with r = f_j/fn_i.
 *
 * @param fnHz natural frequency of each candidate [Hz], > 0
 * @param damping ζ (viscous) or η (hysteretic) of each candidate [–], ≥ 0
 * @param isHysteretic 1 where `damping[i]` is a loss factor, 0 where it is a damping ratio
 * @param freqsHz disturbing frequencies [Hz], ≥ 0
 * @param out receives candidates × frequencies values (row-major); length ≥ fnHz.length·nf
 * @throws VibrationInputError on mismatched lengths or a non-positive fn / negative damping
 */
export function transmissibilityBatch(
  fnHz: Float64Array,
  damping: Float64Array,
  isHysteretic: Uint8Array,
  freqsHz: ArrayLike<number>,
  out: Float64Array,
): void {
  const n = fnHz.length;
  const nf = freqsHz.length;
  if (damping.length < n) throw new VibrationInputError('damping', `must have ${n} entries`, 'length-mismatch');
  if (isHysteretic.length < n) throw new VibrationInputError('isHysteretic', `must have ${n} entries`, 'length-mismatch');
  if (out.length < n * nf) throw new VibrationInputError('out', `must hold ${n * nf} values`, 'length-mismatch');
  for (let j = 0; j < nf; j++) {
    if (!(freqsHz[j] >= 0) || freqsHz[j] === Infinity) {
      throw new VibrationInputError(`freqsHz[${j}]`, 'must be a finite number ≥ 0', 'out-of-range');
    }
  }
  for (let i = 0; i < n; i++) {
    const fn = fnHz[i];
    const v = damping[i];
    if (!(fn > 0) || fn === Infinity) throw new VibrationInputError(`fnHz[${i}]`, 'must be a finite number > 0', 'not-positive');
    if (!(v >= 0) || v === Infinity) throw new VibrationInputError(`damping[${i}]`, 'must be a finite number ≥ 0', 'negative');
    const inv = 1 / fn;
    const base = i * nf;
    if (isHysteretic[i] !== 0) {
      const e2 = v * v;
      const num = 1 + e2;
      for (let j = 0; j < nf; j++) {
        const r = freqsHz[j] * inv;
        const a = 1 - r * r;
        out[base + j] = Math.sqrt(num / (a * a + e2));
      }
    } else {
      const z4 = 4 * v * v;
      for (let j = 0; j < nf; j++) {
        const r = freqsHz[j] * inv;
        const r2 = r * r;
        const a = 1 - r2;
        const d = z4 * r2;
        out[base + j] = Math.sqrt((1 + d) / (a * a + d));
      }
    }
  }
}
