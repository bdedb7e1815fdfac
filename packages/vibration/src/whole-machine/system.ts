/**
 * The prepared whole-machine system: matrices and work buffers built once per candidate and
 * reused for every frequency (docs/engineering/whole-machine.md §2–§3).
 */
import { requireFinite, requireNonEmpty, requireNonNegative, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { requireVec3 } from '../geometry/vector.js';
import { type RigidBodyModesResult, rigidBodyModes } from '../modes/rigid-body-modes.js';
import { type PrepareWholeMachineOptions, type WholeMachineModel } from './types.js';

/**
 * A rigid body on mounts, ready to solve at many frequencies. Build it with
 * {@link prepareWholeMachine}; treat the fields as read-only.
 *
 * K(ω) = K + i·(H + ω·V): K the real stiffness, H = Σ η_i·K_i (hysteretic rows),
 * V = Σ (2ζ_i/ω_v)·K_i (viscous rows), all 6×6 about the CG, row-major Float64Array(36).
 */
export interface WholeMachineSystem {
  readonly model: WholeMachineModel;
  /** Number of mounts N. */
  readonly mountCount: number;
  /** m [kg]. */
  readonly massKg: number;
  /** Stiffness factor applied [–]. */
  readonly stiffnessFactor: number;
  /** ω_v = √(Σ kz / m) [rad/s] (with the factor applied). */
  readonly bounceOmegaRadPerS: number;
  /** 6×6 mass matrix M [kg, kg·m²], row-major. */
  readonly mass: Float64Array;
  /** 6×6 real stiffness K [N/m, N, N·m/rad], row-major. */
  readonly stiffness: Float64Array;
  /** 6×6 hysteretic part H [same units as K]. */
  readonly hysteretic: Float64Array;
  /** 6×6 viscous part V [N·s/m...]: the imaginary stiffness at ω is ω·V. */
  readonly viscous: Float64Array;
  /** Mount arms r_i = p_i − r_G [m], struct-of-arrays: mount i at [3i, 3i+1, 3i+2]. */
  readonly arm: Float64Array;
  /** Mount stiffnesses kx, ky, kz [N/m] (with the factor applied), mount i at [3i..3i+2]. */
  readonly mountStiffness: Float64Array;
  /** Per-mount hysteretic loss factor η_i [–] (0 for viscous or undamped rows). */
  readonly lossFactor: Float64Array;
  /** Per-mount viscous coefficient 2ζ_i/ω_v [s] (0 for hysteretic or undamped rows). */
  readonly viscousPerOmega: Float64Array;
  /** The undamped modes (computed on first use by `wholeMachineModes`). */
  modes?: RigidBodyModesResult;
  /** Work buffers (internal). */
  readonly work: {
    readonly aRe: Float64Array;
    readonly aIm: Float64Array;
    readonly bRe: Float64Array;
    readonly bIm: Float64Array;
    /** Generalised load of the current source (force and moment about the CG), 6 entries. */
    readonly loadRe: Float64Array;
    readonly loadIm: Float64Array;
  };
}

/**
 * Builds the system matrices and work buffers of a rigid body on mounts
 * (docs/engineering/whole-machine.md §2–§3). Each mount i adds T_iᵀ·k_i·T_i with
 * T_i = [I₃ | −skew(r_i)] (so that u_i = u_G + θ × r_i) to K, η_i times that to H, and
 * 2ζ_i/ω_v times that to V.
 * @param model body (m [kg], CG [m], J_G [kg·m²]) and mounts (positions [m], diag(kx, ky, kz) [N/m], damping)
 * @param options stiffness factor (stiffness band)
 * @returns the prepared system
 * @throws VibrationInputError for invalid input (field paths `body.massKg`, `mounts[i].stiffness.z`...)
 */
export function prepareWholeMachine(model: WholeMachineModel, options: PrepareWholeMachineOptions = {}): WholeMachineSystem {
  if (model == null || typeof model !== 'object') throw new VibrationInputError('model', 'must be given', 'empty');
  const body = model.body;
  if (body == null || typeof body !== 'object') throw new VibrationInputError('body', 'must be given', 'empty');
  const massKg = requirePositive('body.massKg', body.massKg);
  const cg = requireVec3('body.cg', body.cg);
  const j = body.inertia;
  if (j == null || typeof j !== 'object') throw new VibrationInputError('body.inertia', 'must be given', 'not-finite');
  for (const key of ['xx', 'yy', 'zz', 'xy', 'xz', 'yz'] as const) requireFinite(`body.inertia.${key}`, j[key]);
  requirePositiveDefinite3(j.xx, j.yy, j.zz, j.xy, j.xz, j.yz);
  const factor = options.stiffnessFactor === undefined ? 1 : requirePositive('stiffnessFactor', options.stiffnessFactor);
  const mounts = model.mounts;
  requireNonEmpty('mounts', mounts);
  const n = mounts.length;

  const arm = new Float64Array(3 * n);
  const mountStiffness = new Float64Array(3 * n);
  const lossFactor = new Float64Array(n);
  const zeta = new Float64Array(n);
  let sumKz = 0;
  let anyViscous = false;
  for (let i = 0; i < n; i++) {
    const mount = mounts[i];
    if (mount == null || typeof mount !== 'object') throw new VibrationInputError(`mounts[${i}]`, 'must be a mount', 'empty');
    const p = requireVec3(`mounts[${i}].position`, mount.position);
    const k = mount.stiffness;
    if (k == null || typeof k !== 'object') throw new VibrationInputError(`mounts[${i}].stiffness`, 'must be {x, y, z}', 'not-finite');
    arm[3 * i] = p.x - cg.x;
    arm[3 * i + 1] = p.y - cg.y;
    arm[3 * i + 2] = p.z - cg.z;
    mountStiffness[3 * i] = factor * requireNonNegative(`mounts[${i}].stiffness.x`, k.x);
    mountStiffness[3 * i + 1] = factor * requireNonNegative(`mounts[${i}].stiffness.y`, k.y);
    mountStiffness[3 * i + 2] = factor * requireNonNegative(`mounts[${i}].stiffness.z`, k.z);
    sumKz += mountStiffness[3 * i + 2];
    const d = mount.damping;
    if (d === undefined) continue;
    if (d?.model === 'hysteretic') lossFactor[i] = requireNonNegative(`mounts[${i}].damping.lossFactor`, d.lossFactor);
    else if (d?.model === 'viscous') {
      zeta[i] = requireNonNegative(`mounts[${i}].damping.dampingRatio`, d.dampingRatio);
      if (zeta[i] > 0) anyViscous = true;
    } else throw new VibrationInputError(`mounts[${i}].damping.model`, "must be 'viscous' or 'hysteretic'", 'out-of-range');
  }
  const bounceOmegaRadPerS = Math.sqrt(sumKz / massKg);
  if (anyViscous && !(bounceOmegaRadPerS > 0)) {
    throw new VibrationInputError(
      'mounts',
      'need vertical stiffness for viscous damping (it is referred to the bounce frequency)',
      'not-positive',
    );
  }
  const viscousPerOmega = new Float64Array(n);
  for (let i = 0; i < n; i++) viscousPerOmega[i] = zeta[i] > 0 ? (2 * zeta[i]) / bounceOmegaRadPerS : 0;

  const mass = new Float64Array(36);
  mass[0] = mass[7] = mass[14] = massKg;
  mass[21] = j.xx;
  mass[22] = mass[27] = j.xy;
  mass[23] = mass[33] = j.xz;
  mass[28] = j.yy;
  mass[29] = mass[34] = j.yz;
  mass[35] = j.zz;

  const stiffness = new Float64Array(36);
  const hysteretic = new Float64Array(36);
  const viscous = new Float64Array(36);
  const t = new Float64Array(18); // T_i, 3 rows × 6
  for (let i = 0; i < n; i++) {
    const rx = arm[3 * i];
    const ry = arm[3 * i + 1];
    const rz = arm[3 * i + 2];
    // rows of T = [I | −skew(r)]: u_i = u + θ × r
    t.fill(0);
    t[0] = 1;
    t[4] = rz;
    t[5] = -ry;
    t[7] = 1;
    t[9] = -rz;
    t[11] = rx;
    t[14] = 1;
    t[15] = ry;
    t[16] = -rx;
    const eta = lossFactor[i];
    const c = viscousPerOmega[i];
    for (let p = 0; p < 3; p++) {
      const kp = mountStiffness[3 * i + p];
      if (kp === 0) continue;
      for (let a = 0; a < 6; a++) {
        const ta = t[6 * p + a];
        if (ta === 0) continue;
        for (let b = 0; b < 6; b++) {
          const v = kp * ta * t[6 * p + b];
          stiffness[6 * a + b] += v;
          if (eta !== 0) hysteretic[6 * a + b] += eta * v;
          if (c !== 0) viscous[6 * a + b] += c * v;
        }
      }
    }
  }

  return {
    model,
    mountCount: n,
    massKg,
    stiffnessFactor: factor,
    bounceOmegaRadPerS,
    mass,
    stiffness,
    hysteretic,
    viscous,
    arm,
    mountStiffness,
    lossFactor,
    viscousPerOmega,
    work: {
      aRe: new Float64Array(36),
      aIm: new Float64Array(36),
      bRe: new Float64Array(6),
      bIm: new Float64Array(6),
      loadRe: new Float64Array(6),
      loadIm: new Float64Array(6),
    },
  };
}

/**
 * The undamped rigid-body modes of the system (`rigidBodyModes` on the real stiffness with the
 * stiffness factor applied), computed once and cached on the system.
 * @returns modes lowest first [Hz]
 */
export function wholeMachineModes(system: WholeMachineSystem): RigidBodyModesResult {
  if (system.modes) return system.modes;
  const { body } = system.model;
  const n = system.mountCount;
  const mounts = new Array(n);
  for (let i = 0; i < n; i++) {
    mounts[i] = {
      position: system.model.mounts[i].position,
      stiffness: { x: system.mountStiffness[3 * i], y: system.mountStiffness[3 * i + 1], z: system.mountStiffness[3 * i + 2] },
    };
  }
  system.modes = rigidBodyModes({ massKg: body.massKg, inertia: body.inertia, cg: body.cg, mounts });
  return system.modes;
}

/** Sylvester's criterion on J_G. */
function requirePositiveDefinite3(xx: number, yy: number, zz: number, xy: number, xz: number, yz: number): void {
  const m2 = xx * yy - xy * xy;
  const det = xx * (yy * zz - yz * yz) - xy * (xy * zz - yz * xz) + xz * (xy * yz - yy * xz);
  if (!(xx > 0 && m2 > 0 && det > 0)) {
    throw new VibrationInputError(
      'body.inertia',
      'is not positive definite (check the moments and products of inertia)',
      'not-positive-definite',
    );
  }
}
