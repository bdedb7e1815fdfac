/** Flexible support in series with a mount (docs/engineering/whole-machine.md §9). */
import { requireNonNegative, requirePositive } from '../errors/validate.js';

/**
 * Stiffness of a mount on a flexible support, the two in series: k_eff = k_m·k_s/(k_m + k_s).
 * @param mountNPerM k_m [N/m], ≥ 0
 * @param supportNPerM k_s [N/m], > 0; Infinity (a rigid support) gives k_m
 * @returns k_eff [N/m]
 */
export function seriesStiffness(mountNPerM: number, supportNPerM: number): number {
  const km = requireNonNegative('mountNPerM', mountNPerM);
  if (supportNPerM === Infinity) return km;
  if (km === 0) return requirePositive('supportNPerM', supportNPerM) * 0;
  const ks = requirePositive('supportNPerM', supportNPerM);
  return (km * ks) / (km + ks);
}
