import { BadRequestException, Injectable } from '@nestjs/common';
import { SELECTION_LIMITS, type Component, type Criteria, type DesignInput, type MountPoint } from './dto/design-input.dto.js';
import type { RestraintInput } from './dto/restraint.dto.js';
import { SelectionCatalogReader } from './selection-catalog.reader.js';
import type { DetailsLoader } from './engine/catalog-tuple.js';
import { SelectionEvaluation } from './engine/selection-evaluation.js';
import { designFrequencies, prefilterBounds, prepareProblem, withInputErrors, type SelectionProblem } from './selection-problem.js';
import type { Candidate, LabelledFrequency, SelectionResult } from './selection.types.js';

export interface SelectionRequest {
  components: readonly Component[];
  mountPoints: readonly MountPoint[];
  frequencies: readonly { frequencyHz: number; label?: string }[];
  criteria: Criteria;
  restraint?: RestraintInput;
  limit?: number;
}

/** A candidate chosen for a design, computed again on the server. */
export interface ChosenCandidate {
  candidate: Candidate;
  problem: SelectionProblem;
  frequencies: LabelledFrequency[];
}

export type CandidateChoice = { mountId: number } | { seriesId: string };

const round1 = (ms: number): number => Math.round(ms * 10) / 10;

/**
 * Ranks catalog mounts for a machine: mass properties and loads, an SQL prefilter of plausible
 * rows, then every uniform and series candidate evaluated in SelectionEvaluation. Input the
 * calculation refuses (mass ≤ 0, collinear points...) becomes a 400 naming the field;
 * `fieldPrefix` places the field inside the request (e.g. `input` for a design).
 */
@Injectable()
export class SelectionService {
  constructor(private readonly catalog: SelectionCatalogReader) {}

  async select(request: SelectionRequest, fieldPrefix = ''): Promise<SelectionResult> {
    const started = performance.now();
    const limit = request.limit ?? SELECTION_LIMITS.limit.default;
    const problem = withInputErrors(() => prepareProblem({ ...request }), fieldPrefix);
    const rows = await this.catalog.prefiltered(prefilterBounds(problem));
    const evaluation = new SelectionEvaluation(problem, rows);
    const ranked = await evaluation.rank(limit, this.loadDetails);
    const names = await this.catalog.supplierNames(ranked.map((c) => evaluation.supplierOf(c)));
    const candidates = ranked.map((c) => evaluation.describe(c, names));
    return {
      candidates,
      considered: evaluation.considered,
      elapsedMs: round1(performance.now() - started),
      totalMassKg: problem.massKg,
      cg: { ...problem.cg },
      pointLoadsN: Array.from(problem.equalLoadsN),
      disturbingFrequenciesHz: Array.from(problem.frequenciesHz),
    };
  }

  /** The disturbing frequencies of a design's operating conditions (400 naming `input.operating…` when there are none). */
  frequenciesOf(input: DesignInput): LabelledFrequency[] {
    return withInputErrors(() => designFrequencies(input.operating), 'input');
  }

  /** Selection over a saved design input (frequencies derived from its operating conditions). */
  selectForDesign(input: DesignInput, limit?: number): Promise<SelectionResult> {
    const frequencies = this.frequenciesOf(input);
    return this.select({ ...input, frequencies, limit }, 'input');
  }

  /** Checks that a design input can be computed at all (400 naming the field otherwise). */
  assertComputable(input: DesignInput): void {
    const frequencies = this.frequenciesOf(input);
    withInputErrors(() => prepareProblem({ ...input, frequencies }), 'input');
  }

  /**
   * Re-runs the selection for one candidate of a design: the same evaluation as the ranked list
   * (so the figures, reasons and score agree with what the engineer saw), plus the checks run for
   * the best candidates (its rigid-body modes), whatever else it fails. A mount or series outside the prefiltered set (e.g. outside the load window) is
   * evaluated on its own, with its reasons.
   */
  async evaluateChoice(input: DesignInput, choice: CandidateChoice): Promise<ChosenCandidate> {
    const frequencies = this.frequenciesOf(input);
    const problem = withInputErrors(() => prepareProblem({ ...input, frequencies }), 'input');
    let evaluation = new SelectionEvaluation(problem, await this.catalog.prefiltered(prefilterBounds(problem)));
    let c = 'mountId' in choice ? evaluation.findUniform(choice.mountId) : evaluation.findSeries(choice.seriesId);
    if (c < 0) {
      const rows = await this.catalog.rowsOf('mountId' in choice ? choice : parseSeriesId(choice.seriesId));
      if (rows.length === 0) {
        const field = 'mountId' in choice ? 'chosenMountId' : 'chosenSeriesId';
        const what = 'mountId' in choice ? `Mount ${choice.mountId}` : `Series ${choice.seriesId}`;
        throw new BadRequestException({
          message: 'Validation failed',
          errors: [{ field, message: `${what} is not an active part of the catalog` }],
        });
      }
      evaluation = new SelectionEvaluation(problem, rows, { everySeries: true });
      c = 'mountId' in choice ? 0 : evaluation.findSeries(choice.seriesId);
    }
    await evaluation.ensureDetails([c], this.loadDetails);
    evaluation.checkFinalist(c);
    const names = await this.catalog.supplierNames([evaluation.supplierOf(c)]);
    return { candidate: evaluation.describe(c, names), problem, frequencies };
  }

  /** Part number, type, horizontal stiffness and temperature range, read for the few mounts that need them. */
  private readonly loadDetails: DetailsLoader = (ids) => this.catalog.details(ids);
}

/** `${supplierId}:${series}` → its parts (400 when malformed). */
export function parseSeriesId(seriesId: string): { supplierId: number; series: string } {
  const match = /^(\d+):(.+)$/.exec(seriesId);
  if (!match) {
    throw new BadRequestException({
      message: 'Validation failed',
      errors: [{ field: 'chosenSeriesId', message: 'The chosen series must be given as the supplier number, a colon and the series name' }],
    });
  }
  return { supplierId: Number(match[1]), series: match[2] };
}
