import { requireFinite, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/**
 * Isolation efficiency E = (1 − T)·100 %. Negative means amplification.
 * @param transmissibility T [–], ≥ 0
 * @returns E [%]
 */
export function isolationEfficiencyPct(transmissibility: number): number {
  if (!(transmissibility >= 0)) {
    throw new VibrationInputError('transmissibility', `must be ≥ 0 (got ${transmissibility})`, 'negative');
  }
  return (1 - transmissibility) * 100;
}

/**
 * Isolation in decibels I = −20·log10(T). Positive means isolation.
 * @param transmissibility T [–], > 0
 * @returns I [dB]
 */
export function isolationDb(transmissibility: number): number {
  if (!(transmissibility > 0)) {
    throw new VibrationInputError('transmissibility', `must be > 0 (got ${transmissibility})`, 'not-positive');
  }
  return -20 * Math.log10(transmissibility);
}

/**
 * Transmissibility for an isolation efficiency: T = 1 − E/100.
 * @param efficiencyPct E [%], < 100
 * @returns T [–]
 */
export function transmissibilityFromEfficiency(efficiencyPct: number): number {
  requireFinite('efficiencyPct', efficiencyPct);
  if (efficiencyPct >= 100) throw new VibrationInputError('efficiencyPct', 'must be below 100 %');
  return 1 - efficiencyPct / 100;
}

/**
 * Frequency ratio needed for an isolation efficiency with the undamped model:
 * r = √(1 + 1/(1 − E)), e.g. 2.449 for 80 %, 3.317 for 90 %, 4.583 for 95 %.
 * Damping raises the ratio needed slightly (hysteretic) or markedly (heavy viscous).
 * @param efficiencyPct E [%], 0 ≤ E < 100
 * @returns r [–]
 */
export function requiredFrequencyRatio(efficiencyPct: number): number {
  requireFinite('efficiencyPct', efficiencyPct);
  if (efficiencyPct < 0 || efficiencyPct >= 100) {
    throw new VibrationInputError('efficiencyPct', `must lie in [0, 100) (got ${efficiencyPct})`);
  }
  const t = 1 - efficiencyPct / 100;
  return Math.sqrt(1 + 1 / t);
}

/**
 * Highest isolator natural frequency that still reaches a frequency ratio at the lowest
 * disturbing frequency: fn,max = f_d,min/r_target.
 * @param lowestDisturbingFrequencyHz f_d,min [Hz], > 0
 * @param targetFrequencyRatio r_target [–], > 0
 * @returns fn,max [Hz]
 */
export function maxNaturalFrequencyForRatio(lowestDisturbingFrequencyHz: number, targetFrequencyRatio: number): number {
  requirePositive('lowestDisturbingFrequencyHz', lowestDisturbingFrequencyHz);
  requirePositive('targetFrequencyRatio', targetFrequencyRatio);
  return lowestDisturbingFrequencyHz / targetFrequencyRatio;
}
