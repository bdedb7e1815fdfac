import { Matrix, solve } from 'ml-matrix';
import { requireAllFinite, requireNonEmpty, requirePositive, requireSameLength } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/** Least-squares SDOF parameters from dynamic-stiffness samples. */
export interface DynamicStiffnessFit {
  /** k from Re K_d = k − m·ω² [N/m]. */
  stiffnessNPerM: number;
  /** m from the same fit [kg]. */
  massKg: number;
  /** Viscous c from Im K_d = c·ω (least squares through the origin) [N·s/m]. */
  dampingCoefficientNsPerM: number;
  /** Hysteretic η from Im K_d = η·k (mean of Im K_d over k) [–]. */
  lossFactor: number;
  /** ζ = c/(2√(k·m)) [–] (NaN-free: 0 when k or m is not positive). */
  dampingRatio: number;
  /** √(k/m)/2π [Hz] (0 when k or m is not positive). */
  naturalFrequencyHz: number;
  /** RMS of the Re K_d residuals over the RMS of Re K_d [–]. */
  relativeResidual: number;
  /** Number of samples used. */
  points: number;
}

/**
 * Fits Re K_d = k − m·ω² (least squares, ml-matrix QR) and Im K_d = c·ω / η·k to samples of the
 * dynamic stiffness K_d = F/X = 1/α, giving k, m and damping together.
 * @param frequencyHz sample frequencies [Hz], > 0, at least 2 distinct
 * @param re Re K_d [N/m]
 * @param im Im K_d [N/m]
 * @returns k [N/m], m [kg], c [N·s/m], η, ζ, fn [Hz], residual
 */
export function fitDynamicStiffness(frequencyHz: ArrayLike<number>, re: ArrayLike<number>, im: ArrayLike<number>): DynamicStiffnessFit {
  requireNonEmpty('frequencyHz', frequencyHz);
  const n = frequencyHz.length;
  requireSameLength('re', re, n);
  requireSameLength('im', im, n);
  for (let i = 0; i < n; i++) requirePositive(`frequencyHz[${i}]`, frequencyHz[i]);
  requireAllFinite('re', re);
  requireAllFinite('im', im);
  const w2 = Array.from(frequencyHz, (f) => (2 * Math.PI * f) ** 2);
  if (n < 2 || Math.max(...w2) - Math.min(...w2) <= 1e-12 * Math.max(...w2)) {
    throw new VibrationInputError('frequencyHz', 'needs at least two distinct frequencies to separate k and m', 'out-of-range');
  }
  // scale columns so that the QR solve is well conditioned: [1, −ω²/s]·[k, m·s]ᵀ
  const s = Math.max(...w2);
  const A = new Matrix(n, 2);
  const b = new Matrix(n, 1);
  for (let i = 0; i < n; i++) {
    A.set(i, 0, 1);
    A.set(i, 1, -w2[i] / s);
    b.set(i, 0, re[i]);
  }
  const x = solve(A, b);
  const k = x.get(0, 0);
  const m = x.get(1, 0) / s;
  let res2 = 0;
  let ref2 = 0;
  let imW = 0;
  let wW = 0;
  let imSum = 0;
  for (let i = 0; i < n; i++) {
    const r = re[i] - (k - m * w2[i]);
    res2 += r * r;
    ref2 += re[i] * re[i];
    const w = Math.sqrt(w2[i]);
    imW += im[i] * w;
    wW += w2[i];
    imSum += im[i];
  }
  const c = imW / wW;
  const physical = k > 0 && m > 0;
  return {
    stiffnessNPerM: k,
    massKg: m,
    dampingCoefficientNsPerM: c,
    lossFactor: k !== 0 ? imSum / n / k : 0,
    dampingRatio: physical ? c / (2 * Math.sqrt(k * m)) : 0,
    naturalFrequencyHz: physical ? Math.sqrt(k / m) / (2 * Math.PI) : 0,
    relativeResidual: ref2 > 0 ? Math.sqrt(res2 / ref2) : 0,
    points: n,
  };
}
