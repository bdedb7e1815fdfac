import { requireFinite, requirePositive } from '../errors/validate.js';

/** Input of {@link cornerMountLoads}: four equal mounts at (±a, ±b). */
export interface CornerMountsInput {
  /** Half the mount spacing along x, a [m]. */
  halfSpacingX: number;
  /** Half the mount spacing along y, b [m]. */
  halfSpacingY: number;
  /** Supported weight W [N]. */
  weightN: number;
  /** CG offset (e_x, e_y) from the centre of the mount pattern [m]. */
  cgOffset: { x: number; y: number };
  /** Stiffness of each mount k [N/m] (optional: only the deflections need it). */
  stiffnessNPerM?: number;
}

/** Closed-form loads of four equal corner mounts. Arrays are in the order (+,+), (+,−), (−,+), (−,−). */
export interface CornerMountsResult {
  /** F_i = (W/4)·(1 + s_x·e_x/a + s_y·e_y/b) [N]. */
  loadsN: [number, number, number, number];
  /** δ_i = F_i/k [m] (when the stiffness is given). */
  deflectionsM?: [number, number, number, number];
  /** w = W/(4k) [m] (when the stiffness is given). */
  deflectionAtOriginM?: number;
  /** β_x = W·e_x/(4k·a²) [rad] (when the stiffness is given). */
  tiltX?: number;
  /** β_y = W·e_y/(4k·b²) [rad] (when the stiffness is given). */
  tiltY?: number;
  /** |e_x|/a + |e_y|/b < 1: no corner lifts. */
  noLiftOff: boolean;
}

/**
 * Rigid-frame loads on four equal corner mounts at (±a, ±b) with the CG offset (e_x, e_y):
 * F_i = (W/4)·(1 + s_x·e_x/a + s_y·e_y/b). Not the "lever-rule product"
 * (W/4)(1 ± e_x/a)(1 ± e_y/b), which violates the rigid-plane condition for equal springs.
 * @param input a, b [m], W [N], CG offset [m], optional k [N/m]
 * @returns loads [N] in the order (+,+), (+,−), (−,+), (−,−); deflections [m] and tilts [rad] if k is given
 */
export function cornerMountLoads(input: CornerMountsInput): CornerMountsResult {
  const a = requirePositive('halfSpacingX', input.halfSpacingX);
  const b = requirePositive('halfSpacingY', input.halfSpacingY);
  const w = requirePositive('weightN', input.weightN);
  const ex = requireFinite('cgOffset.x', input.cgOffset?.x);
  const ey = requireFinite('cgOffset.y', input.cgOffset?.y);
  const q = w / 4;
  const loads: [number, number, number, number] = [
    q * (1 + ex / a + ey / b),
    q * (1 + ex / a - ey / b),
    q * (1 - ex / a + ey / b),
    q * (1 - ex / a - ey / b),
  ];
  const result: CornerMountsResult = { loadsN: loads, noLiftOff: Math.abs(ex) / a + Math.abs(ey) / b < 1 };
  if (input.stiffnessNPerM !== undefined) {
    const k = requirePositive('stiffnessNPerM', input.stiffnessNPerM);
    result.deflectionsM = loads.map((f) => f / k) as [number, number, number, number];
    result.deflectionAtOriginM = w / (4 * k);
    result.tiltX = (w * ex) / (4 * k * a * a);
    result.tiltY = (w * ey) / (4 * k * b * b);
  }
  return result;
}
