import { requireNonNegative, requirePositive } from '../errors/validate.js';

/**
 * Pressure thrust of a flexible pipe connector, F = p·A_eff with A_eff = π·D_eff²/4. Isolators
 * are not designed to resist it: it needs control rods or anchors.
 * @param pressurePa gauge pressure p [Pa], ≥ 0 (1 bar = 1e5 Pa)
 * @param effectiveDiameterM effective diameter D_eff [m], > 0
 * @returns thrust [N]
 */
export function pressureThrust(pressurePa: number, effectiveDiameterM: number): number {
  requireNonNegative('pressurePa', pressurePa);
  requirePositive('effectiveDiameterM', effectiveDiameterM);
  return (pressurePa * Math.PI * effectiveDiameterM * effectiveDiameterM) / 4;
}
