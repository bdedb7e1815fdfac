/**
 * The second mass case (docs/engineering/selection.md §18): components may give `altMassKg`
 * (drained, empty...), and the verdict covers both cases. The evaluation loops call these for
 * every candidate when the input has a second case: the load checks with the loads of that case
 * (the mounts stay those picked for the operating case), its bounce estimate, and afterwards its
 * isolation (evaluate-isolation.ts) and modes (mode-check.ts). Any failure sets FAIL.massCase;
 * reasons.ts words it. Allocation-free per candidate.
 */
import { mountLoadsBatch } from '@tacet/vibration';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateStore } from './candidate-store.js';
import { FAIL, lightFactorOf } from './checks.js';

/** Judges the load checks of the second case for candidate c with its rows and loads (N per point). */
function loadChecks(store: CandidateStore, problem: SelectionProblem, rowAt: (i: number) => number, loads: ArrayLike<number>): boolean {
  const { minUtilization, maxUtilization } = problem.criteria;
  const margin = problem.marginFactor;
  const light = lightFactorOf(problem);
  for (let i = 0; i < problem.pointCount; i++) {
    const r = rowAt(i);
    const u = loads[i] / store.rated[r];
    if (u * margin > maxUtilization || u < minUtilization) return true;
    if (store.isSpring[r] === 1 && u * light < minUtilization) return true;
    const d = (loads[i] / store.kv[r]) * margin;
    if (d > store.maxDeflectionM[r] || d > store.springLimitM[r]) return true;
  }
  return false;
}

/** Bounce estimate √(Σ k_eff / m_alt)/2π of candidate c's rows (support in series, §15). */
function bounceHz(store: CandidateStore, problem: SelectionProblem, rowAt: (i: number) => number, massKg: number): number {
  let sum = 0;
  for (let i = 0; i < problem.pointCount; i++) {
    const r = rowAt(i);
    sum += 1 / (1 / (store.nd[r] * store.kv[r]) + problem.supportCompliance[i]);
  }
  return Math.sqrt(sum / massKg) / (2 * Math.PI);
}

/** The second case of a uniform candidate (row r at every point): equal-stiffness loads of that case. */
export function checkUniformAlt(store: CandidateStore, problem: SelectionProblem, r: number): void {
  const alt = problem.alt!;
  const rowAt = () => r;
  if (!alt.cgInside || loadChecks(store, problem, rowAt, alt.equalLoadsN)) store.fail[r] |= FAIL.massCase;
  store.fnAltHz[r] = bounceHz(store, problem, rowAt, alt.massKg);
}

/** Buffers of the series' second case (one candidate at a time). */
export interface SeriesAltBuffers {
  stiffness: Float64Array;
  loads: Float64Array;
}

export function seriesAltBuffers(problem: SelectionProblem): SeriesAltBuffers {
  return { stiffness: new Float64Array(problem.pointCount), loads: new Float64Array(problem.pointCount) };
}

/** Loads of the second case on candidate c's picked sizes (rigid frame), into `buffers.loads`. */
export function altLoadsOf(store: CandidateStore, problem: SelectionProblem, c: number, buffers: SeriesAltBuffers): Float64Array {
  const alt = problem.alt!;
  for (let i = 0; i < problem.pointCount; i++) buffers.stiffness[i] = store.kv[store.rowOf(c, i)];
  mountLoadsBatch(problem.layout, alt.weightN, alt.cg.x, alt.cg.y, buffers.stiffness, buffers.loads);
  return buffers.loads;
}

/** The second case of a series candidate: its picked sizes under the loads of that case. */
export function checkSeriesAlt(store: CandidateStore, problem: SelectionProblem, c: number, buffers: SeriesAltBuffers): void {
  const alt = problem.alt!;
  const rowAt = (i: number) => store.rowOf(c, i);
  const loads = altLoadsOf(store, problem, c, buffers);
  if (!alt.cgInside || loadChecks(store, problem, rowAt, loads)) store.fail[c] |= FAIL.massCase;
  store.fnAltHz[c] = bounceHz(store, problem, rowAt, alt.massKg);
}
