/**
 * The selection engine's entry: evaluates every candidate of one request and ranks them. It
 * owns the order of the stages; each stage lives in its own file:
 *
 *   1. candidate-store.ts      rows → typed arrays (struct of arrays, sized once per request),
 *                              series groups, candidate index c (rows first, then series)
 *   2. evaluate-uniform.ts     one row at every point: load checks and figures
 *      evaluate-series.ts      a size per point from one series, for a level skid
 *   3. evaluate-isolation.ts   bounce estimate of every candidate at once (orders, fails none)
 *      restraint-check.ts      seismic restraint, when asked for: the ratings screen of every
 *                              candidate (and, as a finalist check, the exact figures)
 *   4. ranking.ts              score references and scores; `rank` picks the best passing
 *                              candidates, judged by the finalist checks on the way
 *   5. mode-check.ts           finalist check: the six coupled rigid-body modes
 *      restraint-check.ts      finalist check: the restraint figures with each size's stiffness
 *      whole-machine-check.ts  finalist check: the whole-machine verdict over the running range and the stiffness band
 *   6. describe-candidate.ts   a candidate as the API shows it, with reasons.ts for the words
 *
 * checks.ts lists the checks (fail bits); catalog-tuple.ts the columns the engine reads. The
 * per-candidate loops of stages 1–4 allocate nothing; stages 5–6 run for a few candidates only.
 */
import type { SelectionProblem } from '../selection-problem.js';
import type { Candidate } from '../selection.types.js';
import { CandidateStore } from './candidate-store.js';
import type { CatalogTuple, DetailsLoader } from './catalog-tuple.js';
import { describeCandidate } from './describe-candidate.js';
import { evaluateIsolation } from './evaluate-isolation.js';
import { evaluateSeries } from './evaluate-series.js';
import { evaluateUniform } from './evaluate-uniform.js';
import { ModeCheck } from './mode-check.js';
import { RestraintCheck } from './restraint-check.js';
import { WholeMachineCheck, type SourceCurves } from './whole-machine-check.js';
import { candidateOrder, rankCandidates, scoreAll, scoreReferences, type FinalistCheck, type ScoreReferences } from './ranking.js';

export class SelectionEvaluation {
  /**
   * Candidates evaluated and offered: every row, plus the series whose per-point sizes level the
   * skid better than one size would (the others duplicate a uniform candidate and are dropped).
   */
  readonly considered: number;

  private readonly store: CandidateStore;
  private readonly refs: ScoreReferences;
  private readonly modeCheck: ModeCheck;
  private readonly restraintCheck: RestraintCheck;
  private readonly wholeMachineCheck: WholeMachineCheck;
  /** The checks run for the best candidates only, in this order (ranking.ts `FinalistCheck`). */
  private readonly finalistChecks: readonly FinalistCheck[];
  private readonly better: (a: number, b: number) => boolean;

  /** `everySeries`: keep the series that would be dropped (a choice made outside the list). */
  constructor(
    private readonly problem: SelectionProblem,
    rows: readonly CatalogTuple[],
    options: { everySeries?: boolean } = {},
  ) {
    const store = new CandidateStore(problem, rows);
    this.store = store;
    evaluateUniform(store, problem);
    const skipped = evaluateSeries(store, problem, options.everySeries === true);
    this.considered = store.candidateCount - skipped;
    evaluateIsolation(store, problem);
    this.restraintCheck = new RestraintCheck(store, problem, rows);
    this.restraintCheck.screen();
    this.refs = scoreReferences(store, problem);
    scoreAll(store, this.refs);
    this.better = candidateOrder(store);
    this.modeCheck = new ModeCheck(store, problem);
    this.wholeMachineCheck = new WholeMachineCheck(store, problem);
    this.finalistChecks = [this.restraintCheck, this.modeCheck, this.wholeMachineCheck];
  }

  /**
   * Best `limit` passing candidates (after the finalist checks, run for the best 2×limit passing
   * ones and more if needed), then the best `limit` failing ones. Details of the mounts
   * concerned are loaded on the way.
   */
  async rank(limit: number, loadDetails: DetailsLoader): Promise<number[]> {
    const ranked = await rankCandidates(this.store, this.better, limit, async (top) => {
      await this.store.ensureDetails(top, loadDetails);
      // In rank order, until `limit` pass: the ones below them would not be returned as passing anyway.
      let passing = 0;
      for (const c of top) {
        if (passing >= limit) break;
        if (this.store.fail[c] === 0) this.checkFinalist(c);
        if (this.store.fail[c] === 0) passing++;
      }
    });
    await this.store.ensureDetails(ranked, loadDetails);
    return ranked;
  }

  /** Runs every finalist check on one candidate (a chosen one is judged whatever else it fails); details must be loaded. */
  checkFinalist(c: number): void {
    for (const check of this.finalistChecks) check.check(c);
  }

  /** The modes and crossings of candidate c (judging it if it was not). */
  judged(c: number): { modes: ReturnType<ModeCheck['findingsOf']>; wholeMachine: ReturnType<WholeMachineCheck['findingsOf']> } {
    this.checkFinalist(c);
    return { modes: this.modeCheck.findingsOf(c), wholeMachine: this.wholeMachineCheck.findingsOf(c) };
  }

  /** Makes sure the details of the mounts these candidates use are loaded (and their checks applied). */
  ensureDetails(candidates: readonly number[], loadDetails: DetailsLoader): Promise<void> {
    return this.store.ensureDetails(candidates, loadDetails);
  }

  /** The uniform candidate of a mount, or −1 when the mount was not among the rows. */
  findUniform(mountId: number): number {
    return this.store.findUniform(mountId);
  }

  /** The series candidate `${supplierId}:${series}`, or −1 when it was not evaluated. */
  findSeries(seriesId: string): number {
    return this.store.findSeries(seriesId);
  }

  /** Transmissibility against speed per source of candidate c over its stiffness band (the chart). */
  curves(c: number): SourceCurves {
    return this.wholeMachineCheck.curves(c);
  }

  /** The resolved sources and speeds of the request. */
  get forcing(): SelectionProblem['forcing'] {
    return this.problem.forcing;
  }

  /** Supplier of a candidate. */
  supplierOf(c: number): number {
    return this.store.supplierOf(c);
  }

  /** The candidate as the API shows it. */
  describe(c: number, supplierNames: ReadonlyMap<number, string>): Candidate {
    // Every candidate shown carries its restraint figures, modes and whole-machine verdict, and its verdict agrees with them.
    this.checkFinalist(c);
    return describeCandidate(
      {
        store: this.store,
        problem: this.problem,
        refs: this.refs,
        modeCheck: this.modeCheck,
        restraintCheck: this.restraintCheck,
        wholeMachineCheck: this.wholeMachineCheck,
      },
      c,
      supplierNames,
    );
  }
}
