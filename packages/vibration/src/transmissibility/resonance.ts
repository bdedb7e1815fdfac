import { requireNonNegative } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type Damping, dampingValue } from '../sdof/damping.js';
import { transmissibilityViscous } from './transmissibility.js';

/** Location and height of the transmissibility maximum. */
export interface TransmissibilityPeak {
  /** Frequency ratio of the maximum, r_p [–]. */
  frequencyRatio: number;
  /** T at the maximum [–]. */
  transmissibility: number;
}

/**
 * Resonance amplification: transmissibility at r = 1, √(1 + 4ζ²)/(2ζ) (viscous) or
 * √(1 + η²)/η (hysteretic). This is the start-up / coast-down amplification.
 * @param damping ζ or η, > 0 (an undamped system has no finite value)
 * @returns T(r = 1) [–]
 */
export function resonanceTransmissibility(damping: Damping): number {
  const v = dampingValue(damping);
  if (v === 0) {
    throw new VibrationInputError('damping', 'must be greater than zero for a finite resonance amplification', 'not-positive');
  }
  return damping.model === 'viscous' ? Math.sqrt(1 + 4 * v * v) / (2 * v) : Math.sqrt(1 + v * v) / v;
}

/**
 * Viscous transmissibility maximum: r_p = √(√(1 + 8ζ²) − 1)/(2ζ) (slightly below 1) and T(r_p).
 * @param dampingRatio ζ [–], > 0
 * @returns r_p and T_max
 */
export function viscousTransmissibilityPeak(dampingRatio: number): TransmissibilityPeak {
  requireNonNegative('dampingRatio', dampingRatio);
  if (dampingRatio === 0) {
    throw new VibrationInputError('dampingRatio', 'must be greater than zero for a finite peak', 'not-positive');
  }
  const z2 = dampingRatio * dampingRatio;
  // √(1+8ζ²) − 1 written as 8ζ²/(√(1+8ζ²) + 1) to avoid cancellation for small ζ.
  const s = (8 * z2) / (Math.sqrt(1 + 8 * z2) + 1);
  const rp = Math.sqrt(s) / (2 * dampingRatio);
  return { frequencyRatio: rp, transmissibility: transmissibilityViscous(rp, dampingRatio) };
}

/**
 * Transmissibility maximum for either damping model. The hysteretic maximum is exactly at r = 1.
 * @param damping ζ or η, > 0
 * @returns r_p and T_max
 */
export function transmissibilityPeak(damping: Damping): TransmissibilityPeak {
  if (damping.model === 'viscous') return viscousTransmissibilityPeak(damping.dampingRatio);
  return { frequencyRatio: 1, transmissibility: resonanceTransmissibility(damping) };
}
