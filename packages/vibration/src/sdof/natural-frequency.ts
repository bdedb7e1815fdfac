import { requireFinite, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/**
 * Undamped angular natural frequency ωn = √(k/m).
 * @param stiffnessNPerM k [N/m], > 0
 * @param massKg m [kg], > 0
 * @returns ωn [rad/s]
 */
export function angularNaturalFrequency(stiffnessNPerM: number, massKg: number): number {
  requirePositive('stiffnessNPerM', stiffnessNPerM);
  requirePositive('massKg', massKg);
  return Math.sqrt(stiffnessNPerM / massKg);
}

/**
 * Undamped natural frequency fn = √(k/m)/(2π).
 * @param stiffnessNPerM k [N/m], > 0 (use the dynamic stiffness for elastomers)
 * @param massKg m [kg], > 0
 * @returns fn [Hz]
 */
export function naturalFrequencyHz(stiffnessNPerM: number, massKg: number): number {
  return angularNaturalFrequency(stiffnessNPerM, massKg) / (2 * Math.PI);
}

/**
 * Stiffness that gives a natural frequency: k = m·(2π·fn)².
 * @param naturalFrequencyHz fn [Hz], > 0
 * @param massKg m [kg], > 0
 * @returns k [N/m]
 */
export function stiffnessForNaturalFrequency(naturalFrequencyHz: number, massKg: number): number {
  requirePositive('naturalFrequencyHz', naturalFrequencyHz);
  requirePositive('massKg', massKg);
  const w = 2 * Math.PI * naturalFrequencyHz;
  return massKg * w * w;
}

/**
 * Damped natural frequency fd = fn·√(1 − ζ²).
 * @param naturalFrequencyHz fn [Hz], > 0
 * @param dampingRatio ζ [–], 0 ≤ ζ < 1
 * @returns fd [Hz]
 */
export function dampedNaturalFrequencyHz(naturalFrequencyHz: number, dampingRatio: number): number {
  requirePositive('naturalFrequencyHz', naturalFrequencyHz);
  requireFinite('dampingRatio', dampingRatio);
  if (dampingRatio < 0 || dampingRatio >= 1) {
    throw new VibrationInputError('dampingRatio', `must lie in [0, 1) for an oscillating system (got ${dampingRatio})`);
  }
  return naturalFrequencyHz * Math.sqrt(1 - dampingRatio * dampingRatio);
}
