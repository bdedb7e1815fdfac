import { requireFinite, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type PlanPoint } from '../geometry/vector.js';
import { prepareLayout } from './mount-loads.js';

/** A mount layout prepared once for {@link mountLoadsBatch}. */
export interface MountLayout {
  /** Number of mount points. */
  readonly pointCount: number;
  /** @internal */
  readonly x: Float64Array;
  /** @internal */
  readonly y: Float64Array;
}

/**
 * Checks a layout once (≥ 3 points, not collinear) for repeated load solutions.
 * @param points plan positions [m]
 * @throws VibrationInputError `too-few-mounts` / `collinear-mounts`
 */
export function prepareMountLayout(points: readonly PlanPoint[]): MountLayout {
  const { n, x, y } = prepareLayout(points);
  return { pointCount: n, x, y };
}

/**
 * Zero-allocation rigid-frame loads for many candidate stiffness sets on one layout (the
 * selection hot path). Candidate c has stiffnesses `stiffnessNPerM[c·N + i]` (N = points) and
 * receives its loads in `outLoadsN[c·N + i]`. Same solution as {@link mountLoads}; lift-off
 * shows as a negative load.
 * @param layout from {@link prepareMountLayout}
 * @param weightN W [N]
 * @param cgX plan CG x [m]
 * @param cgY plan CG y [m]
 * @param stiffnessNPerM candidates × points vertical static stiffnesses [N/m], > 0
 * @param outLoadsN candidates × points loads [N]
 * @param outTotalStiffnessNPerM optional, receives Σk_i per candidate [N/m] (for the bounce
 *   estimate fn,v = √(n_d·Σk/m)/2π without a second pass)
 */
export function mountLoadsBatch(
  layout: MountLayout,
  weightN: number,
  cgX: number,
  cgY: number,
  stiffnessNPerM: Float64Array,
  outLoadsN: Float64Array,
  outTotalStiffnessNPerM?: Float64Array,
): void {
  requirePositive('weightN', weightN);
  requireFinite('cgX', cgX);
  requireFinite('cgY', cgY);
  const n = layout.pointCount;
  if (stiffnessNPerM.length % n !== 0) {
    throw new VibrationInputError('stiffnessNPerM', `length must be a multiple of ${n} points`, 'length-mismatch');
  }
  const candidates = stiffnessNPerM.length / n;
  if (outLoadsN.length < stiffnessNPerM.length) {
    throw new VibrationInputError('outLoadsN', `must hold ${stiffnessNPerM.length} values`, 'length-mismatch');
  }
  if (outTotalStiffnessNPerM !== undefined && outTotalStiffnessNPerM.length < candidates) {
    throw new VibrationInputError('outTotalStiffnessNPerM', `must hold ${candidates} values`, 'length-mismatch');
  }
  const x = layout.x;
  const y = layout.y;
  const k = stiffnessNPerM;
  const out = outLoadsN;
  // Same algorithm as solveRigidPlane, specialised for typed arrays (monomorphic, fused checks).
  for (let c = 0; c < candidates; c++) {
    const o = c * n;
    let ks = 0;
    let kx = 0;
    let ky = 0;
    for (let i = 0; i < n; i++) {
      const ki = k[o + i];
      if (!(ki > 0) || ki === Infinity) {
        throw new VibrationInputError(`stiffnessNPerM[${o + i}]`, 'must be a finite number > 0', 'not-positive');
      }
      ks += ki;
      kx += ki * x[i];
      ky += ki * y[i];
    }
    if (outTotalStiffnessNPerM !== undefined) outTotalStiffnessNPerM[c] = ks;
    const xc = kx / ks;
    const yc = ky / ks;
    let kxx = 0;
    let kyy = 0;
    let kxy = 0;
    for (let i = 0; i < n; i++) {
      const ki = k[o + i];
      const dx = x[i] - xc;
      const dy = y[i] - yc;
      kxx += ki * dx * dx;
      kyy += ki * dy * dy;
      kxy += ki * dx * dy;
    }
    const det = kxx * kyy - kxy * kxy;
    const mx = weightN * (cgX - xc);
    const my = weightN * (cgY - yc);
    const bx = (kyy * mx - kxy * my) / det;
    const by = (kxx * my - kxy * mx) / det;
    const w0 = weightN / ks;
    for (let i = 0; i < n; i++) out[o + i] = k[o + i] * (w0 + bx * (x[i] - xc) + by * (y[i] - yc));
  }
}
