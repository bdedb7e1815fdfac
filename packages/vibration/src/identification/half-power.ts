import { requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/** Damping from a half-power bandwidth. */
export interface HalfPowerDamping {
  /** ζ ≈ (f₂ − f₁)/(2·f_p) [–]. */
  dampingRatio: number;
  /** η ≈ (f₂ − f₁)/f_p [–]. */
  lossFactor: number;
}

/**
 * Damping from the half-power (−3 dB) bandwidth: ζ ≈ (f₂ − f₁)/(2·f_p), η ≈ (f₂ − f₁)/f_p.
 * Valid for light damping (ζ ≲ 0.1) and well-separated modes.
 * @param lowerHz f₁ [Hz], > 0
 * @param upperHz f₂ [Hz], > f₁
 * @param peakHz f_p [Hz], > 0
 * @returns ζ and η [–]
 */
export function halfPowerDamping(lowerHz: number, upperHz: number, peakHz: number): HalfPowerDamping {
  requirePositive('lowerHz', lowerHz);
  requirePositive('upperHz', upperHz);
  requirePositive('peakHz', peakHz);
  if (!(upperHz > lowerHz)) throw new VibrationInputError('upperHz', 'must be above the lower half-power frequency');
  const bw = upperHz - lowerHz;
  return { dampingRatio: bw / (2 * peakHz), lossFactor: bw / peakHz };
}

/**
 * Apparent damping added by an exponential window w(t) = e^(−t/τ) on a tap-test record:
 * Δζ = 1/(ωn·τ), so ζ_true = ζ_measured − Δζ. [REC: Ewins, Modal Testing, from memory]
 * @param naturalFrequencyHz fn [Hz], > 0
 * @param timeConstantS τ [s], > 0
 * @returns Δζ [–]
 */
export function exponentialWindowDampingCorrection(naturalFrequencyHz: number, timeConstantS: number): number {
  requirePositive('naturalFrequencyHz', naturalFrequencyHz);
  requirePositive('timeConstantS', timeConstantS);
  return 1 / (2 * Math.PI * naturalFrequencyHz * timeConstantS);
}
