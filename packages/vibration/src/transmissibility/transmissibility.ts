import { requireNonNegative, requirePositive } from '../errors/validate.js';
import { type Damping, dampingValue } from '../sdof/damping.js';

/**
 * Frequency ratio r = f/fn.
 * @param frequencyHz disturbing frequency f [Hz], ≥ 0
 * @param naturalFrequencyHz fn [Hz], > 0
 * @returns r [–]
 */
export function frequencyRatio(frequencyHz: number, naturalFrequencyHz: number): number {
  requireNonNegative('frequencyHz', frequencyHz);
  requirePositive('naturalFrequencyHz', naturalFrequencyHz);
  return frequencyHz / naturalFrequencyHz;
}

/**
 * Undamped transmissibility T = 1/|1 − r²|.
 * @param frequencyRatio r = f/fn [–], ≥ 0
 * @returns T [–]; +Infinity exactly at r = 1
 */
export function transmissibilityUndamped(frequencyRatio: number): number {
  requireNonNegative('frequencyRatio', frequencyRatio);
  return 1 / Math.abs(1 - frequencyRatio * frequencyRatio);
}

/**
 * Viscous transmissibility T = √(1 + (2ζr)²)/√((1 − r²)² + (2ζr)²).
 * @param frequencyRatio r [–], ≥ 0
 * @param dampingRatio ζ [–], ≥ 0
 * @returns T [–]; +Infinity only for ζ = 0 at r = 1
 */
export function transmissibilityViscous(frequencyRatio: number, dampingRatio: number): number {
  requireNonNegative('frequencyRatio', frequencyRatio);
  requireNonNegative('dampingRatio', dampingRatio);
  const r2 = frequencyRatio * frequencyRatio;
  const d = 4 * dampingRatio * dampingRatio * r2;
  const a = 1 - r2;
  return Math.sqrt((1 + d) / (a * a + d));
}

/**
 * Hysteretic (structural) transmissibility T = √(1 + η²)/√((1 − r²)² + η²).
 * @param frequencyRatio r [–], ≥ 0
 * @param lossFactor η [–], ≥ 0
 * @returns T [–]; +Infinity only for η = 0 at r = 1
 */
export function transmissibilityHysteretic(frequencyRatio: number, lossFactor: number): number {
  requireNonNegative('frequencyRatio', frequencyRatio);
  requireNonNegative('lossFactor', lossFactor);
  const a = 1 - frequencyRatio * frequencyRatio;
  const e2 = lossFactor * lossFactor;
  return Math.sqrt((1 + e2) / (a * a + e2));
}

/**
 * Force transmissibility |F_T|/|F| of a single-degree-of-freedom isolator on a rigid
 * foundation. For this model it equals the motion (base-excitation) transmissibility |X|/|Y_b|.
 * The damping model decides the formula (hysteretic for a catalog loss factor, viscous for a
 * damping ratio); no damping gives 1/|1 − r²|.
 * @param frequencyRatio r = f/fn [–], ≥ 0
 * @param damping ζ (viscous) or η (hysteretic); omitted = undamped
 * @returns T [–]
 */
export function transmissibility(frequencyRatio: number, damping?: Damping): number {
  const v = dampingValue(damping);
  if (damping === undefined) return transmissibilityUndamped(frequencyRatio);
  return damping.model === 'viscous' ? transmissibilityViscous(frequencyRatio, v) : transmissibilityHysteretic(frequencyRatio, v);
}

/** Motion (base-excitation) transmissibility |X|/|Y_b|; identical to {@link transmissibility} for the SDOF model. */
export const motionTransmissibility = transmissibility;
/** Force transmissibility |F_T|/|F|; identical to {@link transmissibility} for the SDOF model. */
export const forceTransmissibility = transmissibility;

/**
 * Transmissibility at a disturbing frequency for an isolator of natural frequency fn.
 * @param frequencyHz f [Hz], ≥ 0
 * @param naturalFrequencyHz fn [Hz], > 0
 * @param damping ζ or η; omitted = undamped
 * @returns T [–]
 */
export function transmissibilityAt(frequencyHz: number, naturalFrequencyHz: number, damping?: Damping): number {
  return transmissibility(frequencyRatio(frequencyHz, naturalFrequencyHz), damping);
}

/**
 * Deflection across the isolator under base excitation, |X − Y_b|/|Y_b|:
 * r²/√((1 − r²)² + (2ζr)²) (viscous) or r²/√((1 − r²)² + η²) (hysteretic).
 * @param frequencyRatio r [–], ≥ 0
 * @param damping ζ or η; omitted = undamped
 * @returns ratio [–]
 */
export function relativeDeflectionRatio(frequencyRatio: number, damping?: Damping): number {
  requireNonNegative('frequencyRatio', frequencyRatio);
  const v = dampingValue(damping);
  const r2 = frequencyRatio * frequencyRatio;
  const a = 1 - r2;
  const d = damping?.model === 'hysteretic' ? v * v : 4 * v * v * r2;
  return r2 / Math.sqrt(a * a + d);
}
