import { BadRequestException, Injectable, UnprocessableEntityException } from '@nestjs/common';
import {
  SELECTION_LIMITS,
  type Component,
  type Criteria,
  type DesignInput,
  type MountPoint,
  type OperatingConditions,
} from './dto/design-input.dto.js';
import type { RestraintInput } from './dto/restraint.dto.js';
import { SelectionCatalogReader } from './selection-catalog.reader.js';
import type { DetailsLoader } from './engine/catalog-tuple.js';
import { SelectionEvaluation } from './engine/selection-evaluation.js';
import type { SourceCurves } from './engine/whole-machine-check.js';
import { designFrequencies, prefilterBounds, prepareProblem, withInputErrors, type SelectionProblem } from './selection-problem.js';
import type { Candidate, LabelledFrequency, SelectionCurves, SelectionResult } from './selection.types.js';

export interface SelectionRequest {
  components: readonly Component[];
  mountPoints: readonly MountPoint[];
  frequencies: readonly { frequencyHz: number; label?: string }[];
  /** The operating conditions the frequencies came from (sources, speed range, skip bands); absent: the frequencies alone. */
  operating?: OperatingConditions;
  criteria: Criteria;
  restraint?: RestraintInput;
  limit?: number;
}

/** A candidate chosen for a design, computed again on the server. */
export interface ChosenCandidate {
  candidate: Candidate;
  problem: SelectionProblem;
  frequencies: LabelledFrequency[];
  /** Transmissibility against speed per source (null when the whole-machine model cannot be built). */
  curves: SourceCurves | null;
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

  /**
   * The stateless selection: `operating` (as in a design, field paths `operating.…`) or the bare
   * disturbing frequencies (a vertical force through the CG at each).
   */
  selectStateless(body: Omit<SelectionRequest, 'frequencies'> & { disturbingFrequenciesHz?: readonly number[] }): Promise<SelectionResult> {
    const { disturbingFrequenciesHz, ...rest } = body;
    const frequencies = body.operating
      ? withInputErrors(() => designFrequencies(body.operating as OperatingConditions))
      : (disturbingFrequenciesHz ?? []).map((frequencyHz) => ({ frequencyHz }));
    return this.select({ ...rest, frequencies });
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
    const { evaluation, c } = await this.evaluationOf(problem, choice);
    const names = await this.catalog.supplierNames([evaluation.supplierOf(c)]);
    const candidate = evaluation.describe(c, names);
    return { candidate, problem, frequencies, curves: candidate.wholeMachine ? evaluation.curves(c) : null };
  }

  /**
   * Transmissibility against speed of each source for one candidate of a stateless request, at
   * the nominal stiffness and both ends of its band, with the speeds, skip bands, requirement,
   * modes and crossings the chart draws (docs/engineering/selection.md §22).
   */
  async curves(
    body: Omit<SelectionRequest, 'frequencies'> & { disturbingFrequenciesHz?: readonly number[] },
    choice: CandidateChoice,
  ): Promise<SelectionCurves> {
    const frequencies = body.operating
      ? withInputErrors(() => designFrequencies(body.operating as OperatingConditions))
      : (body.disturbingFrequenciesHz ?? []).map((frequencyHz) => ({ frequencyHz }));
    const problem = withInputErrors(() => prepareProblem({ ...body, frequencies }));
    const { evaluation, c } = await this.evaluationOf(problem, choice, { mountId: 'mountId', seriesId: 'seriesId' });
    const names = await this.catalog.supplierNames([evaluation.supplierOf(c)]);
    const candidate = evaluation.describe(c, names);
    if (!candidate.wholeMachine) {
      // the model cannot be built (selection.md §19): there is no whole-machine curve to draw
      throw new UnprocessableEntityException(
        'The speed curves need the whole-machine model, and the machine has no usable inertia (point masses, or all on one line): ' +
          'give the components box dimensions or their inertia.',
      );
    }
    const curves = evaluation.curves(c);
    return {
      candidate: {
        kind: candidate.kind,
        mountId: candidate.mountId,
        seriesId: candidate.seriesId,
        label: candidate.label,
        passes: candidate.passes,
      },
      speedRangeRpm: problem.forcing.speedRangeRpm,
      skipBandsRpm: problem.forcing.skipBandsRpm,
      requirement: { minIsolationPct: problem.criteria.minIsolationPct, transmissibility: problem.transmissibilityTarget },
      stiffnessTolerancePct: curves.stiffnessTolerancePct,
      modes: (candidate.modes ?? []).map((m) => ({ frequencyHz: m.frequencyHz, dominant: m.dominant, coupled: m.coupled })),
      crossings: candidate.crossings ?? [],
      worst: candidate.wholeMachine?.worst ?? null,
      sources: curves.sources,
    };
  }

  /** The evaluation holding the chosen candidate, judged by every finalist check (400 naming the field when it is not in the catalog). */
  private async evaluationOf(
    problem: SelectionProblem,
    choice: CandidateChoice,
    fields = { mountId: 'chosenMountId', seriesId: 'chosenSeriesId' },
  ): Promise<{ evaluation: SelectionEvaluation; c: number }> {
    let evaluation = new SelectionEvaluation(problem, await this.catalog.prefiltered(prefilterBounds(problem)));
    let c = 'mountId' in choice ? evaluation.findUniform(choice.mountId) : evaluation.findSeries(choice.seriesId);
    if (c < 0) {
      const rows = await this.catalog.rowsOf('mountId' in choice ? choice : parseSeriesId(choice.seriesId, fields.seriesId));
      if (rows.length === 0) {
        const field = 'mountId' in choice ? fields.mountId : fields.seriesId;
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
    return { evaluation, c };
  }

  /** Part number, type, horizontal stiffness and temperature range, read for the few mounts that need them. */
  private readonly loadDetails: DetailsLoader = (ids) => this.catalog.details(ids);
}

/** `${supplierId}:${series}` → its parts (400 when malformed). */
export function parseSeriesId(seriesId: string, field = 'chosenSeriesId'): { supplierId: number; series: string } {
  const match = /^(\d+):(.+)$/.exec(seriesId);
  if (!match) {
    throw new BadRequestException({
      message: 'Validation failed',
      errors: [{ field, message: 'The chosen series must be given as the supplier number, a colon and the series name' }],
    });
  }
  return { supplierId: Number(match[1]), series: match[2] };
}
