import { requireNonNegative, requirePositive } from '../errors/validate.js';

/**
 * Rotating unbalance force F_u = U·ω².
 * @param unbalanceKgM U = m_rot·e [kg·m], ≥ 0
 * @param speedRpm shaft speed N [rpm], > 0
 * @returns F_u [N]
 */
export function unbalanceForce(unbalanceKgM: number, speedRpm: number): number {
  requireNonNegative('unbalanceKgM', unbalanceKgM);
  const w = (2 * Math.PI * requirePositive('speedRpm', speedRpm)) / 60;
  return unbalanceKgM * w * w;
}

/**
 * Unbalance force of a rotor balanced to grade G (G = e·ω, e.g. G6.3 → 6.3 mm/s):
 * F_u = m_rot·G·ω. Grade values: ISO 21940-11 [REC, from memory].
 * @param rotorMassKg m_rot [kg], > 0
 * @param balanceGradeMmPerS G [mm/s] as the grade is named (6.3 for G6.3), > 0
 * @param speedRpm shaft speed N [rpm], > 0
 * @returns F_u [N]
 */
export function unbalanceForceFromBalanceGrade(rotorMassKg: number, balanceGradeMmPerS: number, speedRpm: number): number {
  requirePositive('rotorMassKg', rotorMassKg);
  requirePositive('balanceGradeMmPerS', balanceGradeMmPerS);
  const w = (2 * Math.PI * requirePositive('speedRpm', speedRpm)) / 60;
  return rotorMassKg * (balanceGradeMmPerS / 1000) * w;
}
