import { requirePositive } from '../errors/validate.js';

/**
 * Stiffness of a mount standing on a flexible support (floor, steel frame), the two springs in
 * series: k_eff = k_m·k_s/(k_m + k_s) = 1/(1/k_m + 1/k_s). A rigid support is
 * `Number.POSITIVE_INFINITY` and gives k_m. Basis: docs/engineering/static-deflection.md §6.
 * @param mountNPerM mount stiffness k_m [N/m], > 0
 * @param supportNPerM support stiffness under the mount k_s [N/m], > 0 (Infinity: rigid)
 * @returns k_eff [N/m]
 */
export function seriesStiffness(mountNPerM: number, supportNPerM: number): number {
  requirePositive('mountNPerM', mountNPerM);
  if (supportNPerM === Number.POSITIVE_INFINITY) return mountNPerM;
  requirePositive('supportNPerM', supportNPerM);
  return 1 / (1 / mountNPerM + 1 / supportNPerM);
}
