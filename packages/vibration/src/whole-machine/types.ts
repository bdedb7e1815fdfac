/**
 * Public types of the whole-machine model: a rigid body on N resilient mounts driven by harmonic
 * sources, solved in six degrees of freedom about the CG (docs/engineering/whole-machine.md).
 * SI at every boundary: kg, m, s, N, N/m, Hz, rad; speeds in rpm where the name says so.
 */
import { type InertiaTensor } from '../assembly/mass-properties.js';
import { type Axis, type Vec3 } from '../geometry/vector.js';
import { type PrincipalStiffness } from '../modes/mount-stiffness.js';
import { type Damping } from '../sdof/damping.js';

/** The supported rigid body (`massProperties(components)` gives one). */
export interface WholeMachineBody {
  /** m [kg], > 0. */
  massKg: number;
  /** CG position in the axes of the mount and source positions [m] (x along the skid, y lateral, z up). */
  cg: Vec3;
  /** Inertia tensor J_G about the CG in body axes [kg·m²] (tensor convention, positive definite). */
  inertia: InertiaTensor;
}

/** One resilient mount of the whole-machine model. */
export interface WholeMachineMount {
  /** Free text carried to the results (e.g. "A1"). */
  label?: string;
  /** Elastic centre of the mount [m], same axes as `cg`. */
  position: Vec3;
  /**
   * Dynamic translational stiffness diag(kx, ky, kz) in body axes [N/m], ≥ 0 each
   * (kz = n_d·k_v, kx = ky = n_d·k_h; any flexible support already in series, see `seriesStiffness`).
   */
  stiffness: PrincipalStiffness;
  /**
   * Damping of this mount: hysteretic k(1 + iη) or viscous k(1 + 2iζω/ω_v) with
   * ω_v = √(Σkz/m) the uncoupled bounce estimate. Omitted = undamped.
   */
  damping?: Damping;
}

/** Input of {@link prepareWholeMachine}. */
export interface WholeMachineModel {
  body: WholeMachineBody;
  /** The mounts (at least one; the body must be restrained in all six coordinates to have finite response). */
  mounts: readonly WholeMachineMount[];
}

/** Options of {@link prepareWholeMachine}. */
export interface PrepareWholeMachineOptions {
  /**
   * Factor applied to every mount stiffness (the stiffness band: 0.85 and 1.15 for ±15 %) [–], > 0.
   * ω_v for viscous rows is taken with the scaled stiffnesses. Default 1.
   */
  stiffnessFactor?: number;
}

/**
 * How a source's force acts.
 * - `rotating`: a force of constant magnitude F turning in the plane normal to `axis`, in the
 *   right-handed sense about +axis (an unbalance on a shaft along `axis`).
 * - `directional`: a force F·cos(ωt) along `axis`.
 */
export type SourceKind = 'rotating' | 'directional';

/** A harmonic force at one point, at one frequency (for {@link wholeMachineResponse}). */
export interface HarmonicSourceAt {
  /** Point where the force acts [m], same axes as `cg`; its moment about the CG is r × F. */
  at: Vec3;
  kind: SourceKind;
  axis: Axis;
  /** Force amplitude F [N], ≥ 0 (the peak over a cycle of the applied force). */
  amplitudeN: number;
}

/**
 * A source over a speed range (for {@link speedSweep}, {@link resonancePassage}). Its frequency is
 * `order`·n/60 [Hz] at shaft speed n [rpm], or the fixed `frequencyHz` when that is given.
 * Its amplitude is `amplitudeN` [N], or for an unbalance (`unbalance` given) m_r·e·ω² with
 * e = G/Ω_max, ω = 2π·f, Ω_max = 2π·n_max/60 (ISO 21940-11: G = e·Ω).
 */
export interface SpeedSource {
  /** Point where the force acts [m]. */
  at: Vec3;
  kind: SourceKind;
  axis: Axis;
  /** Multiple of shaft speed [–], > 0; default 1. Ignored when `frequencyHz` is given. */
  order?: number;
  /** Fixed frequency [Hz], > 0 (e.g. twice the supply frequency); overrides `order`. */
  frequencyHz?: number;
  /** Constant amplitude [N], ≥ 0; required unless `unbalance` is given. */
  amplitudeN?: number;
  /** Rotating unbalance: rotor mass [kg] and balance grade G [mm/s] (6.3 for G6.3). */
  unbalance?: { rotorMassKg: number; balanceGradeMmPerS: number };
}

/** A band of speeds the drive skips [rpm], min < max. The edges are running speeds; the interior is not. */
export interface SpeedBand {
  min: number;
  max: number;
}

/** Steady forced response at one frequency (from {@link wholeMachineResponse}). */
export interface WholeMachineResponse {
  /** f [Hz]. */
  frequencyHz: number;
  /** Peak over a cycle of the applied force [N] (= amplitudeN). */
  appliedPeakForceN: number;
  /** q = [u_x, u_y, u_z (m), θ_x, θ_y, θ_z (rad)], complex amplitude: real parts. */
  displacementRe: Float64Array;
  /** Imaginary parts of q. */
  displacementIm: Float64Array;
  /** Per-mount dynamic force into the foundation, complex 3-vectors [N], struct-of-arrays: mount i at [3i, 3i+1, 3i+2] (x, y, z), real parts. */
  mountForceRe: Float64Array;
  /** Imaginary parts of the mount forces [N]. */
  mountForceIm: Float64Array;
  /** Per-mount peak force over a cycle √((‖v‖² + |v·v|)/2) [N]. */
  mountPeakForceN: Float64Array;
  /** Per-mount peak motion of the mount point over a cycle (u = u_cg + θ × r) [m]. */
  mountPeakMotionM: Float64Array;
  /** Whole-machine transmissibility Σ peak mount force / peak applied force [–] (0 when the force is 0). */
  transmissibility: number;
}

/** One crossing of a source order with an undamped rigid-body mode (from {@link crossingSpeeds}). */
export interface ModeCrossing {
  /** Index of the mode in the list given (lowest first for `rigidBodyModes`). */
  modeIndex: number;
  /** f_j [Hz]. */
  modeFrequencyHz: number;
  /** Source order o [–]. */
  order: number;
  /** n = 60·f_j/o [rpm]. */
  speedRpm: number;
}

/** Input of {@link crossingSpeeds}. */
export interface CrossingInput {
  /** Undamped mode frequencies f_j [Hz]; zero or negative entries (mechanisms) are skipped. */
  modeFrequenciesHz: readonly number[];
  /** Source order o [–], > 0. */
  order: number;
  /** Running range [rpm], 0 < minRpm ≤ maxRpm. */
  minRpm: number;
  maxRpm: number;
  /** Bands the drive skips; a crossing strictly inside one is not listed (one on an edge is). */
  skipBandsRpm?: readonly SpeedBand[];
}

/** Input of {@link speedSweep}. */
export interface SpeedSweepInput {
  source: SpeedSource;
  /** Running range [rpm], 0 < minRpm ≤ maxRpm (equal for a fixed-speed machine). */
  minRpm: number;
  maxRpm: number;
  skipBandsRpm?: readonly SpeedBand[];
  /**
   * Undamped mode frequencies [Hz] whose crossings join the grid; default: the system's own
   * modes (`wholeMachineModes`, one eigen-solve per system, cached). A caller that has the modes
   * at stiffness factor 1 may pass f_j·√φ for a system prepared with factor φ (K → φK scales every
   * ω² by φ) and save the eigen-solve.
   */
  modeFrequenciesHz?: readonly number[];
  /** Largest grid step as a share of speed [%], > 0, default 0.5. */
  maxStepPct?: number;
  /** Return the whole curve (default false). */
  curve?: boolean;
}

/** One evaluated point of a sweep. */
export interface SweepPoint {
  /** Shaft speed n [rpm]. */
  speedRpm: number;
  /** Source frequency f [Hz]. */
  frequencyHz: number;
  /** Whole-machine transmissibility [–]. */
  transmissibility: number;
  /** Source amplitude at that speed [N]. */
  amplitudeN: number;
}

/** Result of {@link speedSweep}. */
export interface SpeedSweepResult {
  /** The point of highest transmissibility (refined between grid points when the maximum lies between them). */
  worst: SweepPoint;
  /** Crossings of this source's order inside the range (empty for a fixed-frequency source). */
  crossings: ModeCrossing[];
  /** Number of 6×6 solves made. */
  evaluations: number;
  /** The grid, ascending speed, when `curve` was asked for (struct-of-arrays). */
  curve?: { speedRpm: Float64Array; frequencyHz: Float64Array; transmissibility: Float64Array; amplitudeN: Float64Array };
}

/** Input of {@link resonancePassage}. */
export interface PassageInput {
  /** The sources; only those with `unbalance` are used (start-up and coast-down through the modes). */
  sources: readonly SpeedSource[];
  /** Lowest running speed [rpm], > 0: modes crossed below it are passed through. */
  minRpm: number;
  /** Highest running speed [rpm] (for e = G/Ω_max), ≥ minRpm. */
  maxRpm: number;
  /** Undamped mode frequencies [Hz]; default: the system's own modes. */
  modeFrequenciesHz?: readonly number[];
}

/** Steady motion at a mode crossed on start-up (from {@link resonancePassage}). */
export interface PassagePoint {
  modeIndex: number;
  modeFrequencyHz: number;
  /** Index of the source in `PassageInput.sources`. */
  sourceIndex: number;
  /** n = 60·f_j/o [rpm], below minRpm. */
  speedRpm: number;
  /** Largest peak motion over the mount points [m] for that source at that speed. */
  motionM: number;
}
