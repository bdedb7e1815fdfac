import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, inverse } from 'ml-matrix';
import { type InertiaTensor } from '../assembly/mass-properties.js';
import { requireFinite, requireNonEmpty, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type Matrix3, type Vec3, requireVec3 } from '../geometry/vector.js';
import { type PrincipalStiffness, mountStiffnessMatrix } from './mount-stiffness.js';

/** The six rigid-body coordinates: translations along x, y, z and rotations about x, y, z. */
export type RigidBodyDof = 'surge' | 'sway' | 'bounce' | 'roll' | 'pitch' | 'yaw';

/** Order of the coordinates q = [u_x, u_y, u_z, θ_x, θ_y, θ_z]. */
export const RIGID_BODY_DOFS: readonly RigidBodyDof[] = Object.freeze(['surge', 'sway', 'bounce', 'roll', 'pitch', 'yaw']);

/**
 * Share of a mode's kinetic energy that one coordinate must carry for the mode to count as a
 * pure motion; below it the mode is coupled (docs/engineering/rigid-body-modes.md §6, a design
 * choice).
 */
export const PURE_MODE_SHARE = 0.9;

/** A resilient mount for the 6-DOF model. */
export interface ResilientMount {
  /** Elastic centre of the mount (normally mid-height of the resilient element), same axes as `cg` [m]. */
  position: Vec3;
  /** Principal dynamic stiffnesses along the mount's own axes [N/m], ≥ 0. */
  stiffness: PrincipalStiffness;
  /** Rotation whose columns are the mount's axes in body coordinates (default: aligned). */
  orientation?: Matrix3;
}

/** Input of {@link rigidBodyModes}. */
export interface RigidBodyModesInput {
  /** m [kg], > 0. */
  massKg: number;
  /** Inertia tensor about the CG in body axes [kg·m²] (positive definite). */
  inertia: InertiaTensor;
  /** CG position in the axes of the mount positions [m] (default: origin). */
  cg?: Vec3;
  /** The mounts. */
  mounts: readonly ResilientMount[];
}

/** One rigid-body mode. */
export interface RigidBodyMode {
  /** Natural frequency f = √λ/2π [Hz]; 0 for a mechanism or an instability. */
  frequencyHz: number;
  /** λ = ω² [rad²/s²]. */
  eigenvalue: number;
  /** DOF with the largest kinetic-energy fraction. */
  dominant: RigidBodyDof;
  /** Kinetic-energy fraction per DOF, e_j = φ_j·(Mφ)_j/(φᵀMφ), summing to 1. */
  energyFractions: Record<RigidBodyDof, number>;
  /** True when the largest fraction is below 0.9 [DES]. */
  coupled: boolean;
  /** Mode shape φ, mass-normalised (φᵀMφ = 1), [u_x, u_y, u_z (m), θ_x, θ_y, θ_z (rad)]. */
  shape: number[];
  /** `mechanism`: λ ≈ 0 (no stiffness in some direction); `unstable`: λ < 0. */
  status: 'ok' | 'mechanism' | 'unstable';
}

/** Result of {@link rigidBodyModes}. */
export interface RigidBodyModesResult {
  /** Six modes, lowest frequency first. */
  modes: RigidBodyMode[];
  /** True when any mode is a mechanism (λ ≈ 0). */
  hasMechanism: boolean;
  /** True when any mode has λ < 0. */
  isUnstable: boolean;
  /** 6×6 mass matrix blockdiag(m·I₃, J_G). */
  massMatrix: number[][];
  /** 6×6 stiffness matrix Σ T_iᵀ·k_i·T_i about the CG [N/m, N/rad, N·m/rad]. */
  stiffnessMatrix: number[][];
}

/** Relative size under which λ counts as zero, and two λ as equal. */
const ZERO_TOLERANCE = 1e-9;

/**
 * 6×6 mass matrix blockdiag(m·I₃, J_G).
 * @param massKg m [kg]
 * @param inertia J_G about the CG [kg·m²]
 */
export function rigidBodyMassMatrix(massKg: number, inertia: InertiaTensor): number[][] {
  const m = requirePositive('massKg', massKg);
  for (const key of ['xx', 'yy', 'zz', 'xy', 'xz', 'yz'] as const) requireFinite(`inertia.${key}`, inertia?.[key]);
  const j = inertia;
  return [
    [m, 0, 0, 0, 0, 0],
    [0, m, 0, 0, 0, 0],
    [0, 0, m, 0, 0, 0],
    [0, 0, 0, j.xx, j.xy, j.xz],
    [0, 0, 0, j.xy, j.yy, j.yz],
    [0, 0, 0, j.xz, j.yz, j.zz],
  ];
}

/**
 * 6×6 stiffness matrix of a rigid body on mounts about the CG:
 * K = Σ [[k_i, −k_i·S_i], [S_i·k_i, −S_i·k_i·S_i]] with S_i = skew(r_i), r_i = p_i − r_G.
 * The mounts' own rotational stiffnesses are neglected.
 * @param mounts positions [m], stiffness [N/m], orientation
 * @param cg CG position [m] (default origin)
 */
export function rigidBodyStiffnessMatrix(mounts: readonly ResilientMount[], cg: Vec3 = { x: 0, y: 0, z: 0 }): number[][] {
  requireNonEmpty('mounts', mounts);
  requireVec3('cg', cg);
  const K: number[][] = Array.from({ length: 6 }, () => new Array<number>(6).fill(0));
  mounts.forEach((mount, i) => {
    const p = requireVec3(`mounts[${i}].position`, mount.position);
    const k = mountStiffnessMatrix(mount.stiffness, mount.orientation, `mounts[${i}].stiffness`);
    const rx = p.x - cg.x;
    const ry = p.y - cg.y;
    const rz = p.z - cg.z;
    const S = [
      [0, -rz, ry],
      [rz, 0, -rx],
      [-ry, rx, 0],
    ];
    // T = [I | −S];  K += Tᵀ k T
    const T = [0, 1, 2].map((a) => [a === 0 ? 1 : 0, a === 1 ? 1 : 0, a === 2 ? 1 : 0, -S[a][0], -S[a][1], -S[a][2]]);
    for (let a = 0; a < 6; a++) {
      for (let b = 0; b < 6; b++) {
        let s = 0;
        for (let p2 = 0; p2 < 3; p2++) {
          const tpa = T[p2][a];
          if (tpa === 0) continue;
          for (let q = 0; q < 3; q++) s += tpa * k[p2][q] * T[q][b];
        }
        K[a][b] += s;
      }
    }
  });
  return K;
}

/**
 * Six rigid-body modes of a machine on resilient mounts: solves K·φ = ω²·M·φ by Cholesky
 * M = L·Lᵀ and the symmetric eigenproblem of L⁻¹·K·L⁻ᵀ (ml-matrix). Modes are sorted by
 * frequency and named after the DOF with the largest kinetic-energy fraction; `coupled` when
 * that fraction is below 0.9. Equal frequencies (symmetric layouts) are split along the
 * coordinates so that each mode is named cleanly. λ ≈ 0 is reported as a mechanism, λ < 0 as
 * an instability (both with frequency 0), never as NaN.
 * @param input m [kg], J_G [kg·m²], CG [m], mounts (positions [m], dynamic stiffness [N/m])
 * @returns modes [Hz], matrices
 * @throws VibrationInputError when J_G is not positive definite or an input is invalid
 */
export function rigidBodyModes(input: RigidBodyModesInput): RigidBodyModesResult {
  const Mrows = rigidBodyMassMatrix(input.massKg, input.inertia);
  const Krows = rigidBodyStiffnessMatrix(input.mounts, input.cg ?? { x: 0, y: 0, z: 0 });
  const M = new Matrix(Mrows);
  const chol = new CholeskyDecomposition(M);
  if (!chol.isPositiveDefinite()) {
    throw new VibrationInputError(
      'inertia',
      'is not positive definite (check the moments and products of inertia)',
      'not-positive-definite',
    );
  }
  const L = chol.lowerTriangularMatrix;
  const Linv = inverse(L);
  const LinvT = Linv.transpose();
  const A = Linv.mmul(new Matrix(Krows)).mmul(LinvT);
  for (let a = 0; a < 6; a++) {
    for (let b = a + 1; b < 6; b++) {
      const s = 0.5 * (A.get(a, b) + A.get(b, a));
      A.set(a, b, s);
      A.set(b, a, s);
    }
  }
  const evd = new EigenvalueDecomposition(A, { assumeSymmetric: true });
  const lambdas = evd.realEigenvalues;
  const psi = evd.eigenvectorMatrix;
  const order = [0, 1, 2, 3, 4, 5].sort((a, b) => lambdas[a] - lambdas[b]);
  const lam = order.map((i) => lambdas[i]);
  const vecs = order.map((i) => psi.getColumn(i));
  const scale = Math.max(...lam.map(Math.abs));

  // Split repeated eigenvalues along the coordinates: within a cluster, diagonalise
  // P = Ψcᵀ·diag(1..6)·Ψc so that each basis vector favours distinct coordinates.
  for (let start = 0; start < 6;) {
    let end = start + 1;
    while (end < 6 && Math.abs(lam[end] - lam[start]) <= ZERO_TOLERANCE * Math.max(scale, 1e-300)) end++;
    const size = end - start;
    if (size > 1) {
      const P = new Matrix(size, size);
      for (let a = 0; a < size; a++) {
        for (let b = 0; b < size; b++) {
          let s = 0;
          for (let j = 0; j < 6; j++) s += vecs[start + a][j] * (j + 1) * vecs[start + b][j];
          P.set(a, b, s);
        }
      }
      const rot = new EigenvalueDecomposition(P, { assumeSymmetric: true }).eigenvectorMatrix;
      const rotated = Array.from({ length: size }, (_, c) => {
        const v = new Array<number>(6).fill(0);
        for (let a = 0; a < size; a++) for (let j = 0; j < 6; j++) v[j] += rot.get(a, c) * vecs[start + a][j];
        return v;
      });
      for (let c = 0; c < size; c++) vecs[start + c] = rotated[c];
    }
    start = end;
  }

  const modes: RigidBodyMode[] = lam.map((lambda, idx) => {
    const phi = LinvT.mmul(Matrix.columnVector(vecs[idx])).getColumn(0);
    const mphi = M.mmul(Matrix.columnVector(phi)).getColumn(0);
    let norm = 0;
    for (let j = 0; j < 6; j++) norm += phi[j] * mphi[j];
    const fractions = phi.map((v, j) => (v * mphi[j]) / norm);
    let dom = 0;
    for (let j = 1; j < 6; j++) if (fractions[j] > fractions[dom]) dom = j;
    // deterministic sign: dominant coordinate positive; mass-normalise
    const sign = phi[dom] < 0 ? -1 : 1;
    const inv = sign / Math.sqrt(norm);
    const status: RigidBodyMode['status'] =
      Math.abs(lambda) <= ZERO_TOLERANCE * scale || scale === 0 ? 'mechanism' : lambda < 0 ? 'unstable' : 'ok';
    const energyFractions = Object.fromEntries(RIGID_BODY_DOFS.map((d, j) => [d, fractions[j]])) as Record<RigidBodyDof, number>;
    return {
      frequencyHz: status === 'ok' ? Math.sqrt(lambda) / (2 * Math.PI) : 0,
      eigenvalue: status === 'mechanism' ? 0 : lambda,
      dominant: RIGID_BODY_DOFS[dom],
      energyFractions,
      coupled: fractions[dom] < PURE_MODE_SHARE,
      shape: phi.map((v) => v * inv),
      status,
    };
  });
  return {
    modes,
    hasMechanism: modes.some((m) => m.status === 'mechanism'),
    isUnstable: modes.some((m) => m.status === 'unstable'),
    massMatrix: Mrows,
    stiffnessMatrix: Krows,
  };
}
