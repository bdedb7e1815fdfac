import { requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { isInsideConvexHull } from '../geometry/convex-hull.js';
import { type PlanPoint, requirePlanPoint } from '../geometry/vector.js';

/** A condition the engineer must see beside the loads. */
export interface MountLoadWarning {
  code: 'cg-outside-mount-polygon' | 'mount-lift-off' | 'mount-overloaded';
  message: string;
  /** Index of the mount point concerned, where there is one. */
  pointIndex?: number;
}

/** Input of {@link mountLoads}. */
export interface MountLoadsInput {
  /** Plan positions of the mounts [m] (mounts in one horizontal plane), at least 3, not collinear. */
  points: readonly PlanPoint[];
  /** Vertical static stiffness [N/m]: one value for equal mounts, or one per point. */
  stiffnessNPerM: number | readonly number[];
  /** Supported weight W [N] (operating weight). */
  weightN: number;
  /** Plan position of the centre of gravity [m]. */
  cg: PlanPoint;
}

/** Loads and deflections on mounts under a rigid frame. */
export interface MountLoadsResult {
  /** Vertical load per point F_i [N], in the order of `points`. Negative = the point would lift. */
  loadsN: number[];
  /** Static deflection per point δ_i = F_i/k_i [m], downward positive. */
  deflectionsM: number[];
  /** Deflection of the rigid plane at the origin w [m]. */
  deflectionAtOriginM: number;
  /** Slope of the deflection plane along x, β_x = ∂δ/∂x [rad]. */
  tiltX: number;
  /** Slope of the deflection plane along y, β_y = ∂δ/∂y [rad]. */
  tiltY: number;
  /** Level error Δδ = max δ_i − min δ_i [m]. */
  levelErrorM: number;
  /** CG outside the mount polygon, points that would lift. */
  warnings: MountLoadWarning[];
}

/** @internal Relative singularity threshold of the 2×2 moment matrix. */
const COLLINEAR_TOLERANCE = 1e-10;

/** @internal Validated inputs. */
export interface PreparedLayout {
  n: number;
  x: Float64Array;
  y: Float64Array;
}

/** @internal Checks the layout: ≥ 3 finite points, not collinear (unit weights). */
export function prepareLayout(points: readonly PlanPoint[], field = 'points'): PreparedLayout {
  if (!Array.isArray(points)) throw new VibrationInputError(field, 'must be a list of points', 'empty');
  if (points.length < 3) {
    throw new VibrationInputError(field, `needs at least 3 mounts (got ${points.length})`, 'too-few-mounts');
  }
  const n = points.length;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  points.forEach((p, i) => {
    requirePlanPoint(`${field}[${i}]`, p);
    x[i] = p.x;
    y[i] = p.y;
  });
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i] / n;
    my += y[i] / n;
  }
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] - mx;
    const dy = y[i] - my;
    sxx += dx * dx;
    syy += dy * dy;
    sxy += dx * dy;
  }
  const tr = sxx + syy;
  if (tr === 0 || sxx * syy - sxy * sxy <= COLLINEAR_TOLERANCE * tr * tr) {
    throw new VibrationInputError(field, 'mounts are collinear (or coincide): the frame would tip', 'collinear-mounts');
  }
  return { n, x, y };
}

/**
 * @internal Solves the rigid-plane 3×3 system for one stiffness set, writing loads into
 * `out[offset..offset+n)`. Solved about the stiffness centroid, where the system splits into
 * ΣF = W and a 2×2 moment system. Returns [w, β_x, β_y] through `plane`.
 */
export function solveRigidPlane(
  x: Float64Array,
  y: Float64Array,
  k: ArrayLike<number>,
  kOffset: number,
  n: number,
  weightN: number,
  cgX: number,
  cgY: number,
  out: Float64Array | number[],
  offset: number,
  plane: Float64Array | number[],
): void {
  let ks = 0;
  let kx = 0;
  let ky = 0;
  for (let i = 0; i < n; i++) {
    const ki = k[kOffset + i];
    ks += ki;
    kx += ki * x[i];
    ky += ki * y[i];
  }
  const xc = kx / ks;
  const yc = ky / ks;
  let kxx = 0;
  let kyy = 0;
  let kxy = 0;
  for (let i = 0; i < n; i++) {
    const ki = k[kOffset + i];
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
  for (let i = 0; i < n; i++) {
    out[offset + i] = k[kOffset + i] * (w0 + bx * (x[i] - xc) + by * (y[i] - yc));
  }
  plane[0] = w0 - bx * xc - by * yc;
  plane[1] = bx;
  plane[2] = by;
}

/** @internal Builds the warnings for a solved layout. */
export function loadWarnings(points: readonly PlanPoint[], cg: PlanPoint, loadsN: readonly number[]): MountLoadWarning[] {
  const warnings: MountLoadWarning[] = [];
  if (!isInsideConvexHull(cg, points)) {
    warnings.push({
      code: 'cg-outside-mount-polygon',
      message: 'The centre of gravity lies outside (or on the edge of) the polygon of the mounts: the assembly is not stable on them.',
    });
  }
  loadsN.forEach((f, i) => {
    if (f < 0) {
      warnings.push({
        code: 'mount-lift-off',
        message: `Mount ${i + 1} would need to pull (${f.toFixed(1)} N): it lifts off; move mounts or the CG.`,
        pointIndex: i,
      });
    }
  });
  return warnings;
}

function stiffnessArray(stiffness: number | readonly number[], n: number): Float64Array {
  const k = new Float64Array(n);
  if (typeof stiffness === 'number') {
    k.fill(requirePositive('stiffnessNPerM', stiffness));
  } else {
    if (!Array.isArray(stiffness) || stiffness.length !== n) {
      throw new VibrationInputError('stiffnessNPerM', `must be one number or ${n} values, one per point`, 'length-mismatch');
    }
    stiffness.forEach((v, i) => (k[i] = requirePositive(`stiffnessNPerM[${i}]`, v)));
  }
  return k;
}

/**
 * Vertical loads on N ≥ 3 mounts under a rigid frame. The deflection is a plane
 * δ_i = w + β_x·x_i + β_y·y_i, F_i = k_i·δ_i, with ΣF = W and the moments of W about x and y
 * balanced (the 3×3 system of docs/engineering/mount-loads.md §2). With 3 mounts the loads follow from statics
 * alone; with more they depend on the stiffnesses. Use static stiffness here.
 *
 * Loads are the linear solution: a negative load means the point would lift and is reported
 * as a warning, as is a CG outside the mount polygon.
 * @param input points [m], stiffness [N/m], weight [N], CG [m]
 * @returns loads [N], deflections [m], plane (w [m], tilts [rad]), level error [m], warnings
 * @throws VibrationInputError with code `too-few-mounts` or `collinear-mounts`
 */
export function mountLoads(input: MountLoadsInput): MountLoadsResult {
  const { n, x, y } = prepareLayout(input.points);
  const k = stiffnessArray(input.stiffnessNPerM, n);
  const weightN = requirePositive('weightN', input.weightN);
  const cg = requirePlanPoint('cg', input.cg);
  const loads = new Array<number>(n);
  const plane = [0, 0, 0];
  solveRigidPlane(x, y, k, 0, n, weightN, cg.x, cg.y, loads, 0, plane);
  const deflections = loads.map((f, i) => f / k[i]);
  return {
    loadsN: loads,
    deflectionsM: deflections,
    deflectionAtOriginM: plane[0],
    tiltX: plane[1],
    tiltY: plane[2],
    levelErrorM: Math.max(...deflections) - Math.min(...deflections),
    warnings: loadWarnings(input.points, cg, loads),
  };
}
