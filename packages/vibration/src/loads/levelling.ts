import { requireNonEmpty, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type PlanPoint, requirePlanPoint } from '../geometry/vector.js';
import { type MountLoadWarning, loadWarnings, mountLoads, prepareLayout } from './mount-loads.js';

/**
 * Stiffness per point that levels the frame at a common deflection δ₀: k_req,i = F_i/δ₀.
 * For any statically admissible load set this gives uniform deflection and zero tilt.
 * @param loadsN loads per point F_i [N], > 0 (e.g. from {@link mountLoads} with equal stiffness)
 * @param targetDeflectionM δ₀ [m], > 0
 * @returns k_req per point [N/m]
 */
export function levellingStiffness(loadsN: readonly number[], targetDeflectionM: number): number[] {
  requireNonEmpty('loadsN', loadsN);
  requirePositive('targetDeflectionM', targetDeflectionM);
  return loadsN.map((f, i) => requirePositive(`loadsN[${i}]`, f) / targetDeflectionM);
}

/** One size of a mount series. */
export interface SeriesSize {
  /** Caller's reference (part number, id...). */
  id?: string;
  /** Rated load P_r [N], > 0. */
  ratedLoadN: number;
  /** Vertical static stiffness k [N/m], > 0. */
  stiffnessNPerM: number;
}

/** Input of {@link selectSizesForLevelling}. */
export interface LevellingSelectionInput {
  /** Plan positions of the mounts [m]. */
  points: readonly PlanPoint[];
  /** Supported weight W [N]. */
  weightN: number;
  /** Plan position of the CG [m]. */
  cg: PlanPoint;
  /** The sizes of one series (same family). */
  sizes: readonly SeriesSize[];
  /** Common target deflection δ₀ [m]. */
  targetDeflectionM: number;
  /** Pick–re-solve rounds at most (default 5). */
  maxIterations?: number;
}

/** Result of {@link selectSizesForLevelling}. */
export interface LevellingSelectionResult {
  /** Index into `sizes` chosen at each point. */
  sizeIndex: number[];
  /** Loads with the chosen sizes [N]. */
  loadsN: number[];
  /** Deflections with the chosen sizes [m]. */
  deflectionsM: number[];
  /** F_i/P_r,i [–]. */
  utilization: number[];
  /** Level error Δδ = max δ_i − min δ_i [m]. */
  levelErrorM: number;
  /** Tilts of the frame β_x, β_y [rad]. */
  tiltX: number;
  tiltY: number;
  /** Plane deflection at the origin [m]. */
  deflectionAtOriginM: number;
  /** Pick–re-solve rounds done. */
  iterations: number;
  /** True when the assignment stopped changing within `maxIterations`. */
  converged: boolean;
  warnings: MountLoadWarning[];
}

function pickSize(load: number, sizes: readonly SeriesSize[], target: number): number {
  let best = -1;
  let bestErr = Infinity;
  let bestOver = -1;
  let bestOverErr = Infinity;
  for (let s = 0; s < sizes.length; s++) {
    const err = Math.abs(load / sizes[s].stiffnessNPerM - target);
    if (load <= sizes[s].ratedLoadN) {
      if (err < bestErr) {
        bestErr = err;
        best = s;
      }
    } else if (err < bestOverErr) {
      bestOverErr = err;
      bestOver = s;
    }
  }
  return best >= 0 ? best : bestOver;
}

/**
 * Levelling by size choice (docs/engineering/mount-loads.md §9, procedure [DES]): (1) loads with equal stiffness;
 * (2) at each point pick the size of the series whose deflection F_i/k is closest to δ₀,
 * preferring sizes not overloaded (F_i ≤ P_r); (3) re-solve the rigid-frame loads with the
 * chosen stiffnesses; repeat until the choice stops changing. Reports the remaining level
 * error Δδ and tilts (trim with levelling bolts or shims).
 * @param input layout [m], W [N], CG [m], sizes (P_r [N], k [N/m]), δ₀ [m]
 * @returns size per point, loads [N], deflections [m], utilisation, Δδ [m], tilts [rad], warnings
 */
export function selectSizesForLevelling(input: LevellingSelectionInput): LevellingSelectionResult {
  const { n } = prepareLayout(input.points);
  requirePositive('weightN', input.weightN);
  requirePlanPoint('cg', input.cg);
  requireNonEmpty('sizes', input.sizes);
  input.sizes.forEach((s, i) => {
    requirePositive(`sizes[${i}].ratedLoadN`, s.ratedLoadN);
    requirePositive(`sizes[${i}].stiffnessNPerM`, s.stiffnessNPerM);
  });
  const target = requirePositive('targetDeflectionM', input.targetDeflectionM);
  const maxIterations = input.maxIterations ?? 5;
  if (!Number.isInteger(maxIterations) || maxIterations < 1) {
    throw new VibrationInputError('maxIterations', 'must be a whole number ≥ 1');
  }

  let solved = mountLoads({ points: input.points, stiffnessNPerM: 1, weightN: input.weightN, cg: input.cg });
  let choice: number[] = new Array<number>(n).fill(-1);
  let iterations = 0;
  let converged = false;
  while (iterations < maxIterations) {
    iterations++;
    // a lifting point (negative load) gets the softest-fitting pick for |F|; the warning stays
    const next = solved.loadsN.map((f) => pickSize(Math.max(f, 0) || 1e-12, input.sizes, target));
    const same = next.every((s, i) => s === choice[i]);
    choice = next;
    solved = mountLoads({
      points: input.points,
      stiffnessNPerM: choice.map((s) => input.sizes[s].stiffnessNPerM),
      weightN: input.weightN,
      cg: input.cg,
    });
    if (same) {
      converged = true;
      break;
    }
  }
  const utilization = solved.loadsN.map((f, i) => f / input.sizes[choice[i]].ratedLoadN);
  const warnings = loadWarnings(input.points, input.cg, solved.loadsN);
  utilization.forEach((u, i) => {
    if (u > 1) {
      warnings.push({
        code: 'mount-overloaded',
        message: `Mount ${i + 1} carries ${(u * 100).toFixed(0)} % of the rated load of the chosen size.`,
        pointIndex: i,
      });
    }
  });
  return {
    sizeIndex: choice,
    loadsN: solved.loadsN,
    deflectionsM: solved.deflectionsM,
    utilization,
    levelErrorM: solved.levelErrorM,
    tiltX: solved.tiltX,
    tiltY: solved.tiltY,
    deflectionAtOriginM: solved.deflectionAtOriginM,
    iterations,
    converged,
    warnings,
  };
}
