/**
 * The whole-machine verdict, a finalist check (docs/engineering/selection.md §19–§21): the six-degree-
 * of-freedom forced response of the machine on the candidate's mounts, each source swept over the
 * running range (outside the skip bands) and the whole stiffness band in one sweep (`judge`); the
 * worst whole-machine transmissibility against the isolation requirement decides.
 * Keeps, per candidate judged, the worst point and the crossings of the source orders with the
 * modes (reasons.ts words them); the forces per mount point are computed only for the candidates
 * shown (`describe`).
 *
 * The mounts enter with the catalog's figures or the assumed ones (assumptions.ts): a flexible
 * support in series vertically (§15), and a missing horizontal stiffness at both ends of
 * HORIZONTAL_RATIO_WHEN_MISSING, the worse governing (§14). With a second mass case (§18) the
 * machine is judged again with that mass, CG and inertia; failing there sets FAIL.massCase.
 *
 * When the model cannot be built (the machine's inertia unknown or degenerate) the verdict falls
 * back to the bounce estimate at the disturbing frequencies, and a note says so.
 */
import {
  crossingSpeeds,
  describeModeMotion,
  isolationEfficiencyPct,
  isVibrationInputError,
  prepareWholeMachine,
  seriesStiffness,
  sourceAmplitudeN,
  sourceFrequencyHz,
  speedSweep,
  sweepGrid,
  wholeMachineModes,
  wholeMachineTransmissibility,
  wholeMachineResponse,
  type ResolvedSource,
  type WholeMachineMount,
  type WholeMachineSystem,
} from '@tacet/vibration';
import type { MountType } from '../../catalog/mount-rules.js';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateCrossing, CandidateWholeMachine, WholeMachinePerFrequency } from '../selection.types.js';
import { HORIZONTAL_RATIO_WHEN_MISSING } from './assumptions.js';
import type { CandidateStore, PointMount } from './candidate-store.js';
import { FAIL } from './checks.js';
import type { FinalistCheck } from './ranking.js';
import {
  bandFactors,
  DEFAULT_STIFFNESS_TOLERANCE_PCT,
  FALLBACK_TOLERANCE_PCT,
  governingFactor,
  runningSpeed,
  snapFactor,
} from './stiffness-band.js';

/** The shaft speed used for fixed-frequency sources when the input gives no speed (T does not depend on it). */
const NO_SPEED_RPM = 60;

/** Transmissibility against speed per source over the stiffness band (docs/engineering/selection.md §22). */
export interface SourceCurves {
  stiffnessTolerancePct: number;
  sources: {
    label: string;
    /** The shaft order it follows, or null at a fixed frequency. */
    order: number | null;
    fixedFrequencyHz: number | null;
    speedRpm: number[];
    frequencyHz: number[];
    /** At the nominal stiffness. */
    transmissibility: number[];
    /** At 1 − tol and 1 + tol (null without a band). */
    softEnd: number[] | null;
    stiffEnd: number[] | null;
  }[];
}

/** The machine whose response is judged: the operating case, or the second mass case. */
type Body = Pick<SelectionProblem, 'massKg' | 'cg' | 'inertia'>;

export interface WholeMachineResult {
  worst: CandidateWholeMachine['worst'];
  /** The governing stiffness factor's worst point per source (speed, rpm). */
  worstSpeedBySource: number[];
  crossings: CandidateCrossing[];
  stiffnessTolerancePct: number;
  toleranceFromCriteria: boolean;
  /** The assumed horizontal/vertical ratio that governed, for mounts without a horizontal stiffness (null: all given). */
  assumedHorizontalRatio: number | null;
}

export interface WholeMachineFindings {
  /** Null when the model could not be built (the bounce estimate decided). */
  result: WholeMachineResult | null;
  /** The second mass case (undefined without one; null when the model could not be built). */
  alt?: WholeMachineResult | null;
}

export class WholeMachineCheck implements FinalistCheck {
  private readonly findings = new Map<number, WholeMachineFindings>();

  constructor(
    private readonly store: CandidateStore,
    private readonly problem: SelectionProblem,
  ) {}

  /** The running range of the sweep [rpm] (a placeholder speed when only fixed frequencies force the machine). */
  get range(): { min: number; max: number } {
    return this.problem.forcing.speedRangeRpm ?? { min: NO_SPEED_RPM, max: NO_SPEED_RPM };
  }

  /**
   * Judges candidate c once: sets FAIL.wholeMachine (or FAIL.isolation by the estimate when the
   * model cannot be built), and FAIL.massCase when the second mass case fails the same way.
   */
  check(c: number): void {
    if (this.findings.has(c)) return;
    const { problem, store } = this;
    const points = store.pointsOf(c);
    const tolerance = this.toleranceOf(points);
    const target = problem.transmissibilityTarget;
    const findings: WholeMachineFindings = { result: this.judgeOrNull(points, tolerance, problem) };
    if (findings.result) {
      if (!(findings.result.worst.transmissibility <= target)) store.fail[c] |= FAIL.wholeMachine;
    } else if (this.estimateFails(c, store.transmissibility)) {
      store.fail[c] |= FAIL.isolation;
    }
    if (problem.alt) {
      findings.alt = this.judgeOrNull(points, tolerance, problem.alt);
      const fails = findings.alt ? !(findings.alt.worst.transmissibility <= target) : this.estimateFails(c, store.transmissibilityAlt);
      if (fails) store.fail[c] |= FAIL.massCase;
    }
    this.findings.set(c, findings);
  }

  /**
   * The verdict's figures for one mass case: with every horizontal stiffness given, one judgement;
   * with one missing, a judgement at each end of the assumed ratio, the worse kept. Null when the
   * model cannot be built.
   */
  private judgeOrNull(points: readonly PointMount[], tolerance: { pct: number; fromCriteria: boolean }, body: Body) {
    const missing = points.some((m) => Number.isNaN(m.horizontalStiffnessNPerM));
    const ratios = missing ? [HORIZONTAL_RATIO_WHEN_MISSING.high, HORIZONTAL_RATIO_WHEN_MISSING.low] : [HORIZONTAL_RATIO_WHEN_MISSING.high];
    try {
      let worst: WholeMachineResult | null = null;
      for (const ratio of ratios) {
        const result = this.judge(points, tolerance, body, ratio);
        result.assumedHorizontalRatio = missing ? ratio : null;
        if (!worst || !(result.worst.transmissibility <= worst.worst.transmissibility)) worst = result;
      }
      return worst;
    } catch (error) {
      if (!isVibrationInputError(error)) throw error;
      return null;
    }
  }

  /** What the check found for c (undefined when c was not judged). */
  findingsOf(c: number): WholeMachineFindings | undefined {
    return this.findings.get(c);
  }

  /**
   * The model of the machine on candidate c's mounts: dynamic stiffnesses, the support in series
   * vertically (selection.md §15), a missing horizontal stiffness taken as `missingRatio` × the
   * vertical (§14).
   */
  modelMounts(points: readonly PointMount[], missingRatio: number = HORIZONTAL_RATIO_WHEN_MISSING.high): WholeMachineMount[] {
    return points.map((m, i) => {
      const p = this.problem.points[i];
      const vertical = seriesStiffness(m.verticalStiffnessNPerM * m.dynamicStiffnessRatio, 1 / this.problem.supportCompliance[i]);
      const horizontal =
        (Number.isNaN(m.horizontalStiffnessNPerM) ? missingRatio * m.verticalStiffnessNPerM : m.horizontalStiffnessNPerM) *
        m.dynamicStiffnessRatio;
      return {
        label: p.label,
        position: { x: p.x, y: p.y, z: p.z },
        stiffness: { x: horizontal, y: horizontal, z: vertical },
        damping: m.hysteretic ? { model: 'hysteretic', lossFactor: m.damping } : { model: 'viscous', dampingRatio: m.damping },
      };
    });
  }

  /** The machine (operating case) on candidate c's mounts at a stiffness factor and an assumed horizontal ratio. */
  system(c: number, stiffnessFactor = 1, missingRatio: number = HORIZONTAL_RATIO_WHEN_MISSING.high): WholeMachineSystem {
    const { problem } = this;
    return prepareWholeMachine(
      {
        body: { massKg: problem.massKg, cg: problem.cg, inertia: problem.inertia },
        mounts: this.modelMounts(this.store.pointsOf(c), missingRatio),
      },
      { stiffnessFactor },
    );
  }

  /**
   * Transmissibility against speed of every source of candidate c (for the chart,
   * `POST /api/selection/curves`): one grid per source (sweepGrid, ≤ 0.5 % steps, with the range
   * ends, the skip-band edges and the crossings of every stiffness factor), T at the nominal
   * stiffness and at both ends of the band on it.
   */
  curves(c: number): SourceCurves {
    const { problem } = this;
    const tolerance = this.toleranceOf(this.store.pointsOf(c));
    this.check(c);
    const ratio = this.findings.get(c)?.result?.assumedHorizontalRatio ?? HORIZONTAL_RATIO_WHEN_MISSING.high;
    const [soft, nominal, stiff] =
      tolerance.pct > 0 ? bandFactors(tolerance.pct).map((f) => this.system(c, f, ratio)) : [null, this.system(c, 1, ratio), null];
    const modeHz = [soft, nominal, stiff]
      .filter((x): x is WholeMachineSystem => x !== null)
      .map((x) => wholeMachineModes(x).modes.map((m) => m.frequencyHz));
    const { min, max } = this.range;
    const skipBandsRpm = problem.forcing.skipBandsRpm;
    const evaluate = (system: WholeMachineSystem | null, source: ResolvedSource, speeds: Float64Array) =>
      system === null ? null : Array.from(speeds, (n) => wholeMachineTransmissibility(system, source, sourceFrequencyHz(source, n)));
    return {
      stiffnessTolerancePct: tolerance.pct,
      sources: problem.forcing.sources.map((source) => {
        const extra = source.frequencyHz !== undefined ? [] : modeHz.flat().map((f) => (60 * f) / (source.order ?? 1));
        const speeds = sweepGrid(min, max, skipBandsRpm, extra);
        return {
          label: source.label,
          order: source.frequencyHz === undefined ? (source.order ?? 1) : null,
          fixedFrequencyHz: source.frequencyHz ?? null,
          speedRpm: Array.from(speeds),
          frequencyHz: Array.from(speeds, (n) => sourceFrequencyHz(source, n)),
          transmissibility: evaluate(nominal, source, speeds)!,
          softEnd: evaluate(soft, source, speeds),
          stiffEnd: evaluate(stiff, source, speeds),
        };
      }),
    };
  }

  /**
   * The response of candidate c per source at the range ends, its worst speed and each crossing
   * (at the governing stiffness factor): transmissibility and the peak force per mount point for
   * the source's actual amplitude (per newton for the default source).
   */
  perFrequency(c: number): WholeMachinePerFrequency[] {
    const result = this.findings.get(c)?.result;
    if (!result) return [];
    const { problem } = this;
    const system = this.system(c, result.worst.stiffnessFactor, result.assumedHorizontalRatio ?? HORIZONTAL_RATIO_WHEN_MISSING.high);
    const { min, max } = this.range;
    const fixedSpeed = problem.forcing.speedRangeRpm === null;
    const out: WholeMachinePerFrequency[] = [];
    problem.forcing.sources.forEach((source, s) => {
      const speeds = new Set<number>();
      if (source.frequencyHz !== undefined) speeds.add(min);
      else {
        speeds.add(min);
        speeds.add(max);
        for (const x of result.crossings) if (x.sourceIndex === s) speeds.add(x.speedRpm);
        speeds.add(result.worstSpeedBySource[s]);
      }
      for (const n of [...speeds].sort((a, b) => a - b)) {
        const frequencyHz = sourceFrequencyHz(source, n);
        const amplitudeN = sourceAmplitudeN(source, n, max);
        const response = wholeMachineResponse(system, { at: source.at, kind: source.kind, axis: source.axis, amplitudeN }, frequencyHz);
        out.push({
          source: source.label,
          frequencyHz,
          speedRpm: fixedSpeed && source.frequencyHz !== undefined ? null : n,
          transmissibility: response.transmissibility,
          amplitudeN,
          perPoint: problem.points.map((p, i) => ({ label: p.label, forceN: response.mountPeakForceN[i] })),
        });
      }
    });
    return out;
  }

  /**
   * The worst over the running range and the whole stiffness band with one sweep per source
   * (docs/engineering/selection.md §20): with every stiffness scaled by φ, T(φ, f) = T(1, f/√φ)
   * exactly, so the band's worst is the nominal system's worst over the speeds n/√φ — the range
   * stretched to [n_min/√(1+tol), n_max/√(1−tol)], less the speeds that every factor maps into a
   * skip band — and the governing factor is the one nearest 1 that brings that speed back into
   * the running range.
   */
  private judge(
    points: readonly PointMount[],
    tolerance: { pct: number; fromCriteria: boolean },
    body: Body,
    missingRatio: number,
  ): WholeMachineResult {
    const { problem } = this;
    const { sources, skipBandsRpm } = problem.forcing;
    const { min, max } = this.range;
    const fixedSpeed = problem.forcing.speedRangeRpm === null;
    const system = prepareWholeMachine({
      body: { massKg: body.massKg, cg: body.cg, inertia: body.inertia },
      mounts: this.modelMounts(points, missingRatio),
    });
    const modes = wholeMachineModes(system).modes;
    const modeFrequenciesHz = modes.map((m) => m.frequencyHz);
    const lo = 1 - tolerance.pct / 100;
    const hi = 1 + tolerance.pct / 100;
    let worst: CandidateWholeMachine['worst'] | null = null;
    const worstSpeedBySource: number[] = [];
    const crossings: CandidateCrossing[] = [];
    sources.forEach((source, s) => {
      let point: CandidateWholeMachine['worst'];
      if (source.frequencyHz !== undefined) {
        // T does not depend on the speed: sweep the frequency over the band as a pseudo speed (order 1: n = 60·f)
        const f = source.frequencyHz;
        const pseudo = { at: source.at, kind: source.kind, axis: source.axis, order: 1, amplitudeN: 1 };
        const sweep = speedSweep(system, {
          source: pseudo,
          minRpm: (60 * f) / Math.sqrt(hi),
          maxRpm: (60 * f) / Math.sqrt(lo),
          modeFrequenciesHz,
        });
        const factor = snapFactor((f / sweep.worst.frequencyHz) ** 2, lo, hi);
        point = {
          transmissibility: sweep.worst.transmissibility,
          efficiencyPct: isolationEfficiencyPct(sweep.worst.transmissibility),
          frequencyHz: f,
          speedRpm: fixedSpeed ? null : min,
          source: source.label,
          stiffnessFactor: factor,
        };
        worstSpeedBySource.push(min);
      } else {
        const stretched = skipBandsRpm
          .map((b) => ({ min: b.min / Math.sqrt(lo), max: b.max / Math.sqrt(hi) }))
          .filter((b) => b.max > b.min);
        const sweep = speedSweep(system, {
          source,
          minRpm: min / Math.sqrt(hi),
          maxRpm: max / Math.sqrt(lo),
          skipBandsRpm: stretched,
          modeFrequenciesHz,
        });
        const factor = governingFactor(sweep.worst.speedRpm, min, max, skipBandsRpm, lo, hi);
        const speedRpm = runningSpeed(sweep.worst.speedRpm, factor, min, max, skipBandsRpm);
        point = {
          transmissibility: sweep.worst.transmissibility,
          efficiencyPct: isolationEfficiencyPct(sweep.worst.transmissibility),
          frequencyHz: sourceFrequencyHz(source, speedRpm),
          speedRpm,
          source: source.label,
          stiffnessFactor: factor,
        };
        worstSpeedBySource.push(speedRpm);
        for (const x of crossingSpeeds({ modeFrequenciesHz, order: source.order ?? 1, minRpm: min, maxRpm: max, skipBandsRpm })) {
          crossings.push({
            mode: describeModeMotion(modes[x.modeIndex].energyFractions).name,
            modeFrequencyHz: x.modeFrequencyHz,
            source: source.label,
            sourceIndex: s,
            order: x.order,
            speedRpm: x.speedRpm,
          });
        }
      }
      if (!worst || point.transmissibility > worst.transmissibility || Number.isNaN(point.transmissibility)) worst = point;
    });
    crossings.sort((a, b) => a.speedRpm - b.speedRpm);
    return {
      worst: worst!,
      worstSpeedBySource,
      crossings,
      stiffnessTolerancePct: tolerance.pct,
      toleranceFromCriteria: tolerance.fromCriteria,
      assumedHorizontalRatio: null,
    };
  }

  /** The criteria's tolerance, or the widest default of the types at the points (the fallback when a type is unknown). */
  private toleranceOf(points: readonly PointMount[]): { pct: number; fromCriteria: boolean } {
    const given = this.problem.criteria.stiffnessTolerancePct;
    if (given !== undefined && given !== null) return { pct: given, fromCriteria: true };
    let pct = 0;
    for (const m of points) {
      const own = m.mountType === undefined ? undefined : DEFAULT_STIFFNESS_TOLERANCE_PCT[m.mountType as MountType];
      pct = Math.max(pct, own ?? FALLBACK_TOLERANCE_PCT);
    }
    return { pct, fromCriteria: false };
  }

  /** The bounce estimate (of either mass case) above the target at a disturbing frequency: the fallback verdict. */
  private estimateFails(c: number, transmissibility: Float64Array): boolean {
    const nf = this.problem.frequenciesHz.length;
    for (let j = 0; j < nf; j++) if (transmissibility[c * nf + j] > this.problem.transmissibilityTarget) return true;
    return false;
  }
}
