/**
 * The whole-machine verdict, a finalist check (docs/engineering/selection.md §19–§21): the six-degree-
 * of-freedom forced response of the machine on the candidate's mounts, each source swept over the
 * running range (outside the skip bands) and the whole stiffness band in one sweep (`judge`); the
 * worst whole-machine transmissibility against the isolation requirement decides.
 * Keeps, per candidate judged, the worst point and the crossings of the source orders with the
 * modes (reasons.ts words them); the forces per mount point are computed only for the candidates
 * shown (`describe`).
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
import type { CandidateStore, PointMount } from './candidate-store.js';
import { FAIL } from './checks.js';
import type { FinalistCheck } from './ranking.js';

/**
 * Stiffness tolerance of the catalog figures by mount type, ± % (common practice, no published
 * source: moulded elastomers are held to about ±15 %, pads cut from sheet and wire ropes vary more,
 * steel springs are wound to about ±10 %, air springs are set by their pressure).
 */
export const DEFAULT_STIFFNESS_TOLERANCE_PCT: Readonly<Record<MountType, number>> = {
  elastomer_pad: 20,
  elastomer_mount: 15,
  open_spring: 10,
  housed_spring: 10,
  restrained_spring: 10,
  air_spring: 10,
  wire_rope: 20,
};

/** Tolerance for a type the table does not know, ± % (the widest above). */
const FALLBACK_TOLERANCE_PCT = 20;

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

export interface WholeMachineFindings {
  /** Null when the model could not be built (the bounce estimate decided). */
  result: {
    worst: CandidateWholeMachine['worst'];
    /** The governing stiffness factor's worst point per source (speed, rpm). */
    worstSpeedBySource: number[];
    crossings: CandidateCrossing[];
    stiffnessTolerancePct: number;
    toleranceFromCriteria: boolean;
  } | null;
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

  /** Judges candidate c once: sets FAIL.wholeMachine (or FAIL.isolation by the estimate when the model cannot be built). */
  check(c: number): void {
    if (this.findings.has(c)) return;
    const { problem, store } = this;
    const points = store.pointsOf(c);
    const tolerance = this.toleranceOf(points);
    let findings: WholeMachineFindings = { result: null };
    try {
      findings = { result: this.judge(points, tolerance) };
    } catch (error) {
      if (!isVibrationInputError(error)) throw error;
    }
    if (findings.result) {
      if (!(findings.result.worst.transmissibility <= problem.transmissibilityTarget)) store.fail[c] |= FAIL.wholeMachine;
    } else if (this.estimateFails(c)) {
      store.fail[c] |= FAIL.isolation;
    }
    this.findings.set(c, findings);
  }

  /** What the check found for c (undefined when c was not judged). */
  findingsOf(c: number): WholeMachineFindings | undefined {
    return this.findings.get(c);
  }

  /** The model of the machine on candidate c's mounts (dynamic stiffnesses; a missing horizontal stiffness taken equal to the vertical). */
  modelMounts(points: readonly PointMount[]): WholeMachineMount[] {
    return points.map((m, i) => {
      const p = this.problem.points[i];
      const vertical = m.verticalStiffnessNPerM * m.dynamicStiffnessRatio;
      const horizontal =
        (Number.isNaN(m.horizontalStiffnessNPerM) ? m.verticalStiffnessNPerM : m.horizontalStiffnessNPerM) * m.dynamicStiffnessRatio;
      return {
        label: p.label,
        position: { x: p.x, y: p.y, z: p.z },
        stiffness: { x: horizontal, y: horizontal, z: vertical },
        damping: m.hysteretic ? { model: 'hysteretic', lossFactor: m.damping } : { model: 'viscous', dampingRatio: m.damping },
      };
    });
  }

  /** The machine on candidate c's mounts at a stiffness factor. */
  system(c: number, stiffnessFactor = 1): WholeMachineSystem {
    const { problem } = this;
    return prepareWholeMachine(
      { body: { massKg: problem.massKg, cg: problem.cg, inertia: problem.inertia }, mounts: this.modelMounts(this.store.pointsOf(c)) },
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
    const [soft, nominal, stiff] =
      tolerance.pct > 0 ? bandFactors(tolerance.pct).map((f) => this.system(c, f)) : [null, this.system(c), null];
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
    const system = this.system(c, result.worst.stiffnessFactor);
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
  ): NonNullable<WholeMachineFindings['result']> {
    const { problem } = this;
    const { sources, skipBandsRpm } = problem.forcing;
    const { min, max } = this.range;
    const fixedSpeed = problem.forcing.speedRangeRpm === null;
    const system = prepareWholeMachine({
      body: { massKg: problem.massKg, cg: problem.cg, inertia: problem.inertia },
      mounts: this.modelMounts(points),
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
        const speedRpm = sweep.worst.speedRpm * Math.sqrt(factor);
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

  /** The bounce estimate above the target at a disturbing frequency (the fallback verdict). */
  private estimateFails(c: number): boolean {
    const nf = this.problem.frequenciesHz.length;
    for (let j = 0; j < nf; j++) if (this.store.transmissibility[c * nf + j] > this.problem.transmissibilityTarget) return true;
    return false;
  }
}

/** A factor within rounding of 1 or a band end is that value (so that the answer says 1.15, not 1.1500000000000001). */
function snapFactor(factor: number, lo: number, hi: number): number {
  for (const exact of [1, lo, hi]) if (Math.abs(factor - exact) <= 1e-9 * exact) return exact;
  return Math.min(hi, Math.max(lo, factor));
}

/**
 * The stiffness factor φ ∈ [lo, hi] nearest 1 that brings the nominal-equivalent speed n′ back to
 * a running speed n = n′·√φ (inside [min, max], not strictly inside a skip band).
 */
export function governingFactor(
  nominalRpm: number,
  min: number,
  max: number,
  bands: readonly { min: number; max: number }[],
  lo: number,
  hi: number,
): number {
  const candidates = [
    1,
    lo,
    hi,
    (min / nominalRpm) ** 2,
    (max / nominalRpm) ** 2,
    ...bands.flatMap((b) => [(b.min / nominalRpm) ** 2, (b.max / nominalRpm) ** 2]),
  ];
  const allowed = (phi: number) => {
    if (phi < lo * (1 - 1e-12) || phi > hi * (1 + 1e-12)) return false;
    const n = nominalRpm * Math.sqrt(phi);
    if (n < min * (1 - 1e-12) || n > max * (1 + 1e-12)) return false;
    return !bands.some((b) => n > b.min * (1 + 1e-12) && n < b.max * (1 - 1e-12));
  };
  let best = Number.NaN;
  for (const phi of candidates) if (allowed(phi) && !(Math.abs(phi - 1) >= Math.abs(best - 1))) best = phi;
  return Number.isNaN(best) ? snapFactor((min / nominalRpm) ** 2, lo, hi) : snapFactor(best, lo, hi);
}

/** Stiffness factors of a band of ± pct: the soft end, the nominal and the stiff end (the nominal alone without a band). */
export function bandFactors(pct: number): number[] {
  return pct > 0 ? [1 - pct / 100, 1, 1 + pct / 100] : [1];
}
