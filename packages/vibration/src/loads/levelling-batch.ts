import { requireFinite, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type MountLayout, mountLoadsBatch } from './mount-loads-batch.js';

/**
 * Scratch space and results of {@link selectSizesForLevellingInto}, sized once for a layout
 * and reused for every series (nothing is allocated per call).
 */
export interface LevellingWorkspace {
  /** Number of mount points of the layout. */
  readonly pointCount: number;
  /** Index into the caller's size arrays (absolute, i.e. between `from` and `to`) chosen at each point. */
  readonly sizeIndex: Int32Array;
  /** Loads with the chosen sizes [N]. */
  readonly loadsN: Float64Array;
  /** Deflections with the chosen sizes [m]. */
  readonly deflectionsM: Float64Array;
  /** Level error Δδ = max δ_i − min δ_i [m] of the last call. */
  levelErrorM: number;
  /** Pick–re-solve rounds done by the last call. */
  iterations: number;
  /** True when the assignment stopped changing within `maxIterations`. */
  converged: boolean;
  /** @internal stiffness per point of the current assignment [N/m] */
  readonly stiffness: Float64Array;
  /** @internal next assignment */
  readonly next: Int32Array;
}

/**
 * Allocates the workspace of {@link selectSizesForLevellingInto} for a layout.
 * @param layout from `prepareMountLayout`
 */
export function createLevellingWorkspace(layout: MountLayout): LevellingWorkspace {
  const n = layout.pointCount;
  return {
    pointCount: n,
    sizeIndex: new Int32Array(n),
    loadsN: new Float64Array(n),
    deflectionsM: new Float64Array(n),
    levelErrorM: 0,
    iterations: 0,
    converged: false,
    stiffness: new Float64Array(n),
    next: new Int32Array(n),
  };
}

/**
 * Zero-allocation form of `selectSizesForLevelling` for ranking many series (the selection hot
 * path); same procedure (docs/engineering/mount-loads.md §9, [DES]) and same result: starting from the
 * equal-stiffness loads, pick at each point the size whose deflection F_i/k is closest to δ₀,
 * preferring sizes not overloaded (F_i ≤ P_r); re-solve the rigid-frame loads with the chosen
 * stiffnesses; repeat until the choice stops changing or `maxIterations` rounds are done.
 *
 * The series' sizes are `ratedLoadN[from..to)` / `stiffnessNPerM[from..to)`; the results
 * (size index per point, loads, deflections, level error) are written to `workspace`.
 * @param layout from `prepareMountLayout`
 * @param weightN W [N], > 0
 * @param cgX plan CG x [m]
 * @param cgY plan CG y [m]
 * @param equalStiffnessLoadsN loads with equal stiffness at every point [N] (the first guess)
 * @param ratedLoadN rated loads P_r [N], > 0
 * @param stiffnessNPerM vertical static stiffnesses [N/m], > 0
 * @param from first size of the series (inclusive)
 * @param to end of the series (exclusive), > from
 * @param targetDeflectionM δ₀ [m], > 0
 * @param workspace from {@link createLevellingWorkspace} for the same layout
 * @param maxIterations pick–re-solve rounds at most (default 5)
 */
export function selectSizesForLevellingInto(
  layout: MountLayout,
  weightN: number,
  cgX: number,
  cgY: number,
  equalStiffnessLoadsN: Float64Array,
  ratedLoadN: Float64Array,
  stiffnessNPerM: Float64Array,
  from: number,
  to: number,
  targetDeflectionM: number,
  workspace: LevellingWorkspace,
  maxIterations = 5,
): void {
  const n = layout.pointCount;
  requirePositive('weightN', weightN);
  requireFinite('cgX', cgX);
  requireFinite('cgY', cgY);
  requirePositive('targetDeflectionM', targetDeflectionM);
  if (workspace.pointCount !== n) {
    throw new VibrationInputError('workspace', `was made for ${workspace.pointCount} points, not ${n}`, 'length-mismatch');
  }
  if (equalStiffnessLoadsN.length < n) {
    throw new VibrationInputError('equalStiffnessLoadsN', `must hold ${n} values`, 'length-mismatch');
  }
  if (!(
    from >= 0 &&
    to > from &&
    to <= ratedLoadN.length &&
    to <= stiffnessNPerM.length &&
    Number.isInteger(from) &&
    Number.isInteger(to)
  )) {
    throw new VibrationInputError('from', `sizes [${from}, ${to}) are not a non-empty range of the size arrays`, 'out-of-range');
  }
  if (!Number.isInteger(maxIterations) || maxIterations < 1) {
    throw new VibrationInputError('maxIterations', 'must be a whole number ≥ 1');
  }
  for (let s = from; s < to; s++) {
    const p = ratedLoadN[s];
    const k = stiffnessNPerM[s];
    if (!(p > 0) || p === Infinity) throw new VibrationInputError(`ratedLoadN[${s}]`, 'must be a finite number > 0', 'not-positive');
    if (!(k > 0) || k === Infinity) throw new VibrationInputError(`stiffnessNPerM[${s}]`, 'must be a finite number > 0', 'not-positive');
  }

  const choice = workspace.sizeIndex;
  const next = workspace.next;
  const loads = workspace.loadsN;
  const kPoint = workspace.stiffness;
  for (let i = 0; i < n; i++) {
    choice[i] = -1;
    loads[i] = equalStiffnessLoadsN[i];
  }
  let iterations = 0;
  let converged = false;
  while (iterations < maxIterations) {
    iterations++;
    let same = true;
    for (let i = 0; i < n; i++) {
      // a lifting point (negative load) gets the softest-fitting pick for |F|, as in selectSizesForLevelling
      const load = Math.max(loads[i], 0) || 1e-12;
      let best = -1;
      let bestErr = Infinity;
      let bestOver = -1;
      let bestOverErr = Infinity;
      for (let s = from; s < to; s++) {
        const err = Math.abs(load / stiffnessNPerM[s] - targetDeflectionM);
        if (load <= ratedLoadN[s]) {
          if (err < bestErr) {
            bestErr = err;
            best = s;
          }
        } else if (err < bestOverErr) {
          bestOverErr = err;
          bestOver = s;
        }
      }
      next[i] = best >= 0 ? best : bestOver;
      if (next[i] !== choice[i]) same = false;
    }
    for (let i = 0; i < n; i++) {
      choice[i] = next[i];
      kPoint[i] = stiffnessNPerM[next[i]];
    }
    mountLoadsBatch(layout, weightN, cgX, cgY, kPoint, loads);
    if (same) {
      converged = true;
      break;
    }
  }
  let dMin = Infinity;
  let dMax = -Infinity;
  for (let i = 0; i < n; i++) {
    const d = loads[i] / kPoint[i];
    workspace.deflectionsM[i] = d;
    if (d < dMin) dMin = d;
    if (d > dMax) dMax = d;
  }
  workspace.levelErrorM = dMax - dMin;
  workspace.iterations = iterations;
  workspace.converged = converged;
}
