/**
 * The prepared whole-machine system: matrices and work buffers built once per candidate and
 * reused for every frequency (docs/engineering/whole-machine.md §2–§3).
 */
import { type RigidBodyModesResult } from '../modes/rigid-body-modes.js';
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
  };
}

/**
 * Builds the system matrices and work buffers of a rigid body on mounts.
 * @param model body (m [kg], CG [m], J_G [kg·m²]) and mounts (positions [m], diag(kx, ky, kz) [N/m], damping)
 * @param options stiffness factor (stiffness band)
 * @returns the prepared system
 * @throws VibrationInputError for invalid input (field paths `body.massKg`, `mounts[i].stiffness.z`...)
 */
export function prepareWholeMachine(model: WholeMachineModel, options: PrepareWholeMachineOptions = {}): WholeMachineSystem {
  void model;
  void options;
  throw new Error('not implemented yet');
}

/**
 * The undamped rigid-body modes of the system (`rigidBodyModes`, cached on the system).
 * @returns modes lowest first [Hz]
 */
export function wholeMachineModes(system: WholeMachineSystem): RigidBodyModesResult {
  void system;
  throw new Error('not implemented yet');
}
