import { requirePositive } from '../errors/validate.js';

/**
 * First surge (internal) frequency of a coil spring held between parallel plates:
 * f_s ≈ ½·√(k/m_s). Above it the SDOF transmissibility is optimistic.
 * Basis: docs/engineering/sdof.md §8 [REC: Shigley, Mechanical Engineering Design; Wahl,
 * Mechanical Springs — from memory].
 * @param stiffnessNPerM spring rate k [N/m], > 0
 * @param activeCoilMassKg mass of the active coils m_s [kg], > 0
 * @returns f_s [Hz]
 */
export function coilSpringSurgeFrequencyHz(stiffnessNPerM: number, activeCoilMassKg: number): number {
  requirePositive('stiffnessNPerM', stiffnessNPerM);
  requirePositive('activeCoilMassKg', activeCoilMassKg);
  return 0.5 * Math.sqrt(stiffnessNPerM / activeCoilMassKg);
}
