/**
 * The whole-machine kernel's inner loop (internal, not exported from the package): the load of a
 * source, the 6×6 solve on the system's work buffers, the sums over the mounts. No allocation.
 * docs/engineering/whole-machine.md §3–§5.
 */
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { requireVec3 } from '../geometry/vector.js';
import { solveComplexInPlace } from './complex-solve.js';
import { type WholeMachineSystem } from './system.js';
import { type HarmonicSourceAt, type SourceKind } from './types.js';

/** docs/engineering/whole-machine.md §4: √((‖v‖² + |v·v|)/2) of v = (xr + i·xi, yr + i·yi, zr + i·zi). */
export function peak3(xr: number, yr: number, zr: number, xi: number, yi: number, zi: number): number {
  const rr = xr * xr + yr * yr + zr * zr;
  const ii = xi * xi + yi * yi + zi * zi;
  const ri = xr * xi + yr * yi + zr * zi;
  const dotRe = rr - ii;
  const dotIm = 2 * ri;
  return Math.sqrt(0.5 * (rr + ii + Math.hypot(dotRe, dotIm)));
}

const AXIS_INDEX = { x: 0, y: 1, z: 2 } as const;

/** @internal Checks kind and axis; returns the axis index. */
export function requireKindAxis(kind: SourceKind, axis: string, field = 'source'): 0 | 1 | 2 {
  if (kind !== 'rotating' && kind !== 'directional') {
    throw new VibrationInputError(`${field}.kind`, "must be 'rotating' or 'directional'", 'out-of-range');
  }
  const a = AXIS_INDEX[axis as keyof typeof AXIS_INDEX];
  if (a === undefined) throw new VibrationInputError(`${field}.axis`, "must be 'x', 'y' or 'z'", 'out-of-range');
  return a;
}

/** Writes the complex force vector of a unit-amplitude source into out (re at 0..2, im at 3..5). */
export function unitForce(kind: SourceKind, a: 0 | 1 | 2, out: Float64Array): void {
  out.fill(0);
  if (kind === 'directional') {
    out[a] = 1;
    return;
  }
  // rotating right-handed about +axis: the next axis (cyclic) carries −i
  const b = (a + 1) % 3;
  const c = (a + 2) % 3;
  out[b] = 1;
  out[3 + c] = -1;
}

/** Scratch for `setUnitLoad` (the kernel is synchronous, so one buffer serves every call). */
const UNIT_FORCE = new Float64Array(6);

/**
 * @internal Writes the unit-amplitude generalised load of a source (force and its moment r × F
 * about the CG) into `system.work.loadRe/loadIm`.
 */
export function setUnitLoad(system: WholeMachineSystem, source: Pick<HarmonicSourceAt, 'at' | 'kind' | 'axis'>, field = 'source'): void {
  const a = requireKindAxis(source?.kind, source?.axis, field);
  const p = requireVec3(`${field}.at`, source.at);
  const cg = system.model.body.cg;
  const rx = p.x - cg.x;
  const ry = p.y - cg.y;
  const rz = p.z - cg.z;
  const f = UNIT_FORCE;
  unitForce(source.kind, a, f);
  const { loadRe, loadIm } = system.work;
  for (let part = 0; part < 2; part++) {
    const out = part === 0 ? loadRe : loadIm;
    const fx = f[3 * part];
    const fy = f[3 * part + 1];
    const fz = f[3 * part + 2];
    out[0] = fx;
    out[1] = fy;
    out[2] = fz;
    out[3] = ry * fz - rz * fy;
    out[4] = rz * fx - rx * fz;
    out[5] = rx * fy - ry * fx;
  }
}

/**
 * @internal Solves (K + i(H + ωV) − ω²M)q = load for the load in the work buffers; q is left in
 * `work.bRe/bIm`. Returns false when the matrix is singular (an undamped resonance, or a mechanism at ω = 0).
 */
export function solveAt(system: WholeMachineSystem, omega: number): boolean {
  const { aRe, aIm, bRe, bIm, loadRe, loadIm } = system.work;
  const { stiffness, mass, hysteretic, viscous } = system;
  const w2 = omega * omega;
  for (let i = 0; i < 36; i++) {
    aRe[i] = stiffness[i] - w2 * mass[i];
    aIm[i] = hysteretic[i] + omega * viscous[i];
  }
  for (let i = 0; i < 6; i++) {
    bRe[i] = loadRe[i];
    bIm[i] = loadIm[i];
  }
  return solveComplexInPlace(6, aRe, aIm, bRe, bIm);
}

/**
 * @internal Σ over mounts of the peak force for the solution in the work buffers [N per N of load].
 */
export function sumOfPeakMountForces(system: WholeMachineSystem, omega: number): number {
  const { bRe: q, bIm: qi } = system.work;
  const { arm, mountStiffness: k, lossFactor, viscousPerOmega } = system;
  let sum = 0;
  for (let i = 0; i < system.mountCount; i++) {
    const rx = arm[3 * i];
    const ry = arm[3 * i + 1];
    const rz = arm[3 * i + 2];
    const uxr = q[0] + q[4] * rz - q[5] * ry;
    const uyr = q[1] + q[5] * rx - q[3] * rz;
    const uzr = q[2] + q[3] * ry - q[4] * rx;
    const uxi = qi[0] + qi[4] * rz - qi[5] * ry;
    const uyi = qi[1] + qi[5] * rx - qi[3] * rz;
    const uzi = qi[2] + qi[3] * ry - qi[4] * rx;
    const d = lossFactor[i] + omega * viscousPerOmega[i];
    const kx = k[3 * i];
    const ky = k[3 * i + 1];
    const kz = k[3 * i + 2];
    sum += peak3(
      kx * (uxr - d * uxi),
      ky * (uyr - d * uyi),
      kz * (uzr - d * uzi),
      kx * (uxi + d * uxr),
      ky * (uyi + d * uyr),
      kz * (uzi + d * uzr),
    );
  }
  return sum;
}

/** @internal Largest peak motion over the mount points for the solution in the work buffers [m per N of load]. */
export function maxPeakMountMotion(system: WholeMachineSystem): number {
  const { bRe: q, bIm: qi } = system.work;
  const { arm } = system;
  let max = 0;
  for (let i = 0; i < system.mountCount; i++) {
    const rx = arm[3 * i];
    const ry = arm[3 * i + 1];
    const rz = arm[3 * i + 2];
    const m = peak3(
      q[0] + q[4] * rz - q[5] * ry,
      q[1] + q[5] * rx - q[3] * rz,
      q[2] + q[3] * ry - q[4] * rx,
      qi[0] + qi[4] * rz - qi[5] * ry,
      qi[1] + qi[5] * rx - qi[3] * rz,
      qi[2] + qi[3] * ry - qi[4] * rx,
    );
    if (m > max) max = m;
  }
  return max;
}
