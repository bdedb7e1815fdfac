import { requireFinite, requireNonNegative, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/**
 * Damping of a resilient element, in one of the two models the trade uses.
 * - `viscous`: dashpot, force c·ẋ; given as damping ratio ζ = c/c_c [–].
 * - `hysteretic` (structural): complex stiffness k(1 + jη); given as loss factor η [–].
 *   Elastomers behave much closer to this model.
 */
export type Damping =
  { readonly model: 'viscous'; readonly dampingRatio: number } | { readonly model: 'hysteretic'; readonly lossFactor: number };

/** No damping (viscous with ζ = 0). */
export const UNDAMPED: Damping = Object.freeze({ model: 'viscous', dampingRatio: 0 });

/** Viscous damping with damping ratio ζ [–]. */
export function viscousDamping(dampingRatio: number): Damping {
  return { model: 'viscous', dampingRatio: requireNonNegative('dampingRatio', dampingRatio) };
}

/** Hysteretic (structural) damping with loss factor η [–]. */
export function hystereticDamping(lossFactor: number): Damping {
  return { model: 'hysteretic', lossFactor: requireNonNegative('lossFactor', lossFactor) };
}

/** @internal Checks a {@link Damping} value; returns ζ or η. */
export function dampingValue(damping: Damping | undefined, field = 'damping'): number {
  if (damping === undefined) return 0;
  if (damping.model === 'viscous') return requireNonNegative(`${field}.dampingRatio`, damping.dampingRatio);
  if (damping.model === 'hysteretic') return requireNonNegative(`${field}.lossFactor`, damping.lossFactor);
  throw new VibrationInputError(`${field}.model`, "must be 'viscous' or 'hysteretic'", 'out-of-range');
}

/**
 * Critical damping coefficient c_c = 2·√(k·m).
 * @param stiffnessNPerM k [N/m], > 0
 * @param massKg m [kg], > 0
 * @returns c_c [N·s/m]
 */
export function criticalDamping(stiffnessNPerM: number, massKg: number): number {
  requirePositive('stiffnessNPerM', stiffnessNPerM);
  requirePositive('massKg', massKg);
  return 2 * Math.sqrt(stiffnessNPerM * massKg);
}

/**
 * Damping ratio from a viscous coefficient: ζ = c / (2√(k·m)).
 * @param dampingCoefficientNsPerM c [N·s/m], ≥ 0
 * @param stiffnessNPerM k [N/m]
 * @param massKg m [kg]
 * @returns ζ [–]
 */
export function dampingRatioFromCoefficient(dampingCoefficientNsPerM: number, stiffnessNPerM: number, massKg: number): number {
  requireNonNegative('dampingCoefficientNsPerM', dampingCoefficientNsPerM);
  return dampingCoefficientNsPerM / criticalDamping(stiffnessNPerM, massKg);
}

/**
 * Viscous coefficient from a damping ratio: c = ζ·2√(k·m).
 * @param dampingRatio ζ [–], ≥ 0
 * @param stiffnessNPerM k [N/m]
 * @param massKg m [kg]
 * @returns c [N·s/m]
 */
export function dampingCoefficientFromRatio(dampingRatio: number, stiffnessNPerM: number, massKg: number): number {
  requireNonNegative('dampingRatio', dampingRatio);
  return dampingRatio * criticalDamping(stiffnessNPerM, massKg);
}

/**
 * Loss factor with the same resonant amplification as a damping ratio: η = 2ζ (exact at r = 1).
 * @param dampingRatio ζ [–]
 * @returns η [–]
 */
export function lossFactorFromDampingRatio(dampingRatio: number): number {
  return 2 * requireNonNegative('dampingRatio', dampingRatio);
}

/**
 * Damping ratio equivalent to a loss factor at resonance: ζ ≈ η/2.
 * @param lossFactor η [–]
 * @returns ζ [–]
 */
export function dampingRatioFromLossFactor(lossFactor: number): number {
  return requireNonNegative('lossFactor', lossFactor) / 2;
}

/**
 * Equivalent viscous damping ratio of hysteretic damping at a frequency ratio r:
 * ζ_eq = η/(2r) (from c_eq = η·k/ω).
 * @param lossFactor η [–]
 * @param frequencyRatio r = f/fn [–], > 0
 * @returns ζ_eq [–]
 */
export function equivalentViscousDampingRatio(lossFactor: number, frequencyRatio: number): number {
  requireNonNegative('lossFactor', lossFactor);
  requirePositive('frequencyRatio', frequencyRatio);
  return lossFactor / (2 * frequencyRatio);
}

/**
 * Quality factor Q: 1/(2ζ) for viscous damping, 1/η for hysteretic damping — the displacement
 * amplification k|X|/|F| at r = 1.
 * @param damping ζ or η, > 0
 * @returns Q [–]
 */
export function qualityFactor(damping: Damping): number {
  const v = dampingValue(damping);
  if (v === 0) throw new VibrationInputError('damping', 'must be greater than zero for a finite quality factor', 'not-positive');
  return damping.model === 'viscous' ? 1 / (2 * v) : 1 / v;
}

/**
 * Damping ratio from a quality factor: ζ = 1/(2Q).
 * @param q Q [–], > 0
 * @returns ζ [–]
 */
export function dampingRatioFromQualityFactor(q: number): number {
  return 1 / (2 * requirePositive('qualityFactor', q));
}

/**
 * Logarithmic decrement of free decay: Λ = ln(x_n/x_{n+1}) = 2πζ/√(1 − ζ²).
 * @param dampingRatio ζ [–], 0 ≤ ζ < 1 (underdamped)
 * @returns Λ [–]
 */
export function logarithmicDecrement(dampingRatio: number): number {
  requireFinite('dampingRatio', dampingRatio);
  if (dampingRatio < 0 || dampingRatio >= 1) {
    throw new VibrationInputError('dampingRatio', `must lie in [0, 1) for a decaying oscillation (got ${dampingRatio})`);
  }
  return (2 * Math.PI * dampingRatio) / Math.sqrt(1 - dampingRatio * dampingRatio);
}

/**
 * Damping ratio from a logarithmic decrement: ζ = Λ/√(4π² + Λ²).
 * @param logDecrement Λ [–], ≥ 0
 * @returns ζ [–]
 */
export function dampingRatioFromLogDecrement(logDecrement: number): number {
  requireNonNegative('logDecrement', logDecrement);
  return logDecrement / Math.sqrt(4 * Math.PI * Math.PI + logDecrement * logDecrement);
}

/**
 * Logarithmic decrement from two peak amplitudes n cycles apart: Λ = ln(x₀/x_n)/n.
 * @param firstAmplitude x₀ (any unit), > 0
 * @param laterAmplitude x_n (same unit), > 0
 * @param cycles n, > 0 (may be fractional, e.g. 0.5 for a half cycle)
 * @returns Λ [–]
 */
export function logDecrementFromAmplitudes(firstAmplitude: number, laterAmplitude: number, cycles = 1): number {
  requirePositive('firstAmplitude', firstAmplitude);
  requirePositive('laterAmplitude', laterAmplitude);
  requirePositive('cycles', cycles);
  if (laterAmplitude > firstAmplitude) {
    throw new VibrationInputError('laterAmplitude', 'must not exceed the first amplitude for a decaying oscillation');
  }
  return Math.log(firstAmplitude / laterAmplitude) / cycles;
}
