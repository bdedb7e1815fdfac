import { requireNonNegative } from '../errors/validate.js';
import { type Matrix3, requireRotation } from '../geometry/vector.js';

/** Principal stiffnesses of a mount along its own axes [N/m] (upright mount: x, y shear, z compression). */
export interface PrincipalStiffness {
  x: number;
  y: number;
  z: number;
}

/**
 * A mount's 3×3 translational stiffness in body axes: k = R·diag(k_p, k_q, k_r)·Rᵀ, where the
 * columns of R are the mount's axes in body coordinates. Use dynamic values (n_d × static).
 * @param stiffness principal stiffnesses along the mount axes [N/m], ≥ 0
 * @param orientation R (default identity: mount axes = body axes)
 * @returns k (rows) [N/m]
 */
export function mountStiffnessMatrix(stiffness: PrincipalStiffness, orientation?: Matrix3, field = 'stiffness'): number[][] {
  const d = [
    requireNonNegative(`${field}.x`, stiffness?.x),
    requireNonNegative(`${field}.y`, stiffness?.y),
    requireNonNegative(`${field}.z`, stiffness?.z),
  ];
  if (!orientation) {
    return [
      [d[0], 0, 0],
      [0, d[1], 0],
      [0, 0, d[2]],
    ];
  }
  const r = requireRotation('orientation', orientation);
  const k: number[][] = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (let a = 0; a < 3; a++) {
    for (let b = 0; b < 3; b++) {
      k[a][b] = r[a][0] * d[0] * r[b][0] + r[a][1] * d[1] * r[b][1] + r[a][2] * d[2] * r[b][2];
    }
  }
  return k;
}
