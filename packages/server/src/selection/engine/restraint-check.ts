/**
 * The seismic restraint check (docs/engineering/seismic-restraint.md §9), when the input asks for
 * restraint. Two parts:
 *
 * - `screen`, a stage run for every candidate before scoring: a uniform candidate (the same mount
 *   at every point) has the same demand per point whatever the mount's stiffness, computed once
 *   per request, so it is compared with the row's ratings at once; a series candidate fails here
 *   only when a size it uses has no horizontal restraint rating;
 * - `check`, a finalist check (ranking.ts `FinalistCheck`): the exact figures of a candidate with
 *   its mounts' stiffnesses (series sizes differ), which may fail it.
 *
 * `figuresOf` gives the figures the answer shows for any candidate (restraint-figures.ts).
 * Ratings are read from the catalog rows (CATALOG_COLUMNS) into arrays of this file's own.
 */
import { restraintFigures, type RestraintMount } from '../restraint-figures.js';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateRestraint } from '../selection.types.js';
import type { CandidateStore } from './candidate-store.js';
import { CATALOG_COLUMN_INDEX as COL, num, type CatalogTuple } from './catalog-tuple.js';
import { FAIL } from './checks.js';
import type { FinalistCheck } from './ranking.js';

export class RestraintCheck implements FinalistCheck {
  /** Horizontal restraint rating per row, N (NaN: none). */
  private readonly restraintCapacityN: Float64Array;
  /** Uplift rating per row, N (NaN: none). */
  private readonly upliftCapacityN: Float64Array;
  private readonly figures = new Map<number, CandidateRestraint>();

  constructor(
    private readonly store: CandidateStore,
    private readonly problem: SelectionProblem,
    rows: readonly CatalogTuple[],
  ) {
    const R = problem.restraint ? store.rowCount : 0;
    this.restraintCapacityN = new Float64Array(R).fill(Number.NaN);
    this.upliftCapacityN = new Float64Array(R).fill(Number.NaN);
    if (!problem.restraint) return;
    for (let r = 0; r < R; r++) {
      this.restraintCapacityN[r] = positive(num(rows[r][COL.restraintCapacityN]));
      this.upliftCapacityN[r] = positive(num(rows[r][COL.upliftCapacityN]));
    }
  }

  /** Fails, before scoring, every candidate that cannot pass (see the file comment). */
  screen(): void {
    const { problem, store } = this;
    if (!problem.restraint) return;
    // Equal mounts: the demand does not depend on their stiffness (docs/engineering/seismic-restraint.md §6–§7).
    const equal = Array.from({ length: problem.pointCount }, () => ({
      partNumber: '',
      verticalStiffnessNPerM: 1,
      horizontalStiffnessNPerM: 1,
      restraintCapacityN: null,
      upliftCapacityN: null,
    }));
    const demand = restraintFigures(problem, problem.restraint, equal);
    let maxShear = 0;
    let maxTension = 0;
    for (const p of demand.perPoint) {
      if (p.shearN > maxShear) maxShear = p.shearN;
      if (p.tensionN > maxTension) maxTension = p.tensionN;
    }
    const { fail, skip } = store;
    const R = store.rowCount;
    for (let c = 0; c < R; c++) {
      if (skip[c]) continue;
      const shearOk = this.restraintCapacityN[c] >= maxShear; // NaN (no rating) compares false
      const upliftOk = maxTension <= 0 || this.upliftCapacityN[c] >= maxTension;
      if (!shearOk || !upliftOk) fail[c] |= FAIL.restraint;
    }
    for (let c = R; c < store.candidateCount; c++) {
      if (skip[c]) continue;
      for (let i = 0; i < problem.pointCount; i++) {
        if (Number.isNaN(this.restraintCapacityN[store.rowOf(c, i)])) {
          fail[c] |= FAIL.restraint;
          break;
        }
      }
    }
  }

  /** The exact figures of candidate c (details loaded); sets FAIL.restraint when a point is not within its ratings. */
  check(c: number): void {
    const figures = this.figuresOf(c);
    if (figures && !figures.passes) this.store.fail[c] |= FAIL.restraint;
  }

  /** The restraint figures of candidate c (undefined when the input asks for no restraint); computed once. */
  figuresOf(c: number): CandidateRestraint | undefined {
    const { problem, store } = this;
    if (!problem.restraint) return undefined;
    let figures = this.figures.get(c);
    if (!figures) {
      const mounts: RestraintMount[] = store.pointsOf(c).map((m) => ({
        partNumber: m.partNumber,
        verticalStiffnessNPerM: m.verticalStiffnessNPerM,
        horizontalStiffnessNPerM: m.horizontalStiffnessNPerM,
        restraintCapacityN: rating(this.restraintCapacityN[m.row]),
        upliftCapacityN: rating(this.upliftCapacityN[m.row]),
      }));
      figures = restraintFigures(problem, problem.restraint, mounts);
      this.figures.set(c, figures);
    }
    return figures;
  }
}

/** A rating as stored: NaN unless positive and finite. */
function positive(value: number): number {
  return value > 0 && Number.isFinite(value) ? value : Number.NaN;
}

const rating = (value: number): number | null => (Number.isNaN(value) ? null : value);
