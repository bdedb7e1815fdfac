/**
 * Start-up and coast-down, a finalist check (docs/engineering/start-up-passage.md §1–§4): every
 * rigid-body mode that an unbalance source crosses below the lowest running speed
 * (n = 60·f_j/o < n_min) is passed through on each start and stop. At that speed, with that
 * source's unbalance there, the steady peak motion at the mount points (the largest over the
 * mounts, and over the unbalance sources that cross the mode at the same speed) is checked against
 * the criteria's largest motion, or its default.
 *
 * Runs where the whole-machine verdict runs (the finalists), on the same model at the nominal
 * stiffness: the motion at a crossing does not depend on the stiffness factor (§2). Without the
 * model (inertia unknown) there are no findings and the candidate shows no passage.
 */
import { describeModeMotion, isVibrationInputError, resonancePassage, wholeMachineModes } from '@tacet/vibration';
import { formatHz, formatRpm, motionMeasure } from '../selection-format.js';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidatePassage } from '../selection.types.js';
import type { CandidateStore } from './candidate-store.js';
import { FAIL } from './checks.js';
import type { FinalistCheck } from './ranking.js';
import type { WholeMachineCheck } from './whole-machine-check.js';

/**
 * Largest steady peak motion at the mounts passing a mode on start-up when the criteria give none,
 * mm (docs/engineering/start-up-passage.md §3): 6 mm, the usual clearance of a snubber or a
 * restrained spring's limit stop (a quarter inch), and within the lateral movement a rubber
 * flexible pipe connector usually takes — common practice, from memory.
 */
export const DEFAULT_MAX_RESONANT_MOTION_MM = 6;

/** One crossing passed through, with the source that moves the mounts most there (internal: the words name it). */
export interface PassageCrossing extends CandidatePassage {
  source: string;
}

export interface PassageFindings {
  /** Why nothing was checked: no speed is given, or no unbalance source; null when checked. */
  nothing: 'no-speed' | 'no-unbalance' | null;
  /** Ascending speed. */
  crossings: PassageCrossing[];
  /** The limit applied, mm, and where it comes from. */
  limitMm: number;
  limitFrom: 'criteria' | 'default' | 'restraint gap';
}

export class PassageCheck implements FinalistCheck {
  private readonly findings = new Map<number, PassageFindings>();

  constructor(
    private readonly store: CandidateStore,
    private readonly problem: SelectionProblem,
    private readonly wholeMachine: WholeMachineCheck,
  ) {}

  /** The limit of the request, mm: the criteria's, else the default or the gap to the restraints when that is smaller. */
  get limit(): { limitMm: number; limitFrom: PassageFindings['limitFrom'] } {
    const given = this.problem.criteria.maxResonantMotionMm;
    if (given !== undefined && given !== null) return { limitMm: given, limitFrom: 'criteria' };
    const gap = this.problem.restraint?.snubberGapMm;
    if (gap !== undefined && gap !== null && gap > 0 && gap < DEFAULT_MAX_RESONANT_MOTION_MM)
      return { limitMm: gap, limitFrom: 'restraint gap' };
    return { limitMm: DEFAULT_MAX_RESONANT_MOTION_MM, limitFrom: 'default' };
  }

  /** Judges candidate c once (after the whole-machine check, whose model it uses): sets FAIL.passage when a motion exceeds the limit. */
  check(c: number): void {
    if (this.findings.has(c)) return;
    this.wholeMachine.check(c);
    if (!this.wholeMachine.findingsOf(c)?.result) return;
    let findings: PassageFindings;
    try {
      findings = this.passageOf(c);
    } catch (error) {
      // a model the verdict could sweep but the modes cannot resolve (a degenerate inertia): no passage, as without the model
      if (!isVibrationInputError(error)) throw error;
      return;
    }
    if (findings.crossings.some((x) => !(x.motionMm <= findings.limitMm))) this.store.fail[c] |= FAIL.passage;
    this.findings.set(c, findings);
  }

  /** What the check found for c (undefined when c was not judged or the model could not be built). */
  findingsOf(c: number): PassageFindings | undefined {
    return this.findings.get(c);
  }

  private passageOf(c: number): PassageFindings {
    const { sources, speedRangeRpm } = this.problem.forcing;
    const limit = this.limit;
    if (speedRangeRpm === null) return { nothing: 'no-speed', crossings: [], ...limit };
    const unbalance = sources.filter((s) => s.unbalance !== undefined && s.frequencyHz === undefined);
    if (unbalance.length === 0) return { nothing: 'no-unbalance', crossings: [], ...limit };
    const system = this.wholeMachine.system(c);
    const modes = wholeMachineModes(system).modes;
    const points = resonancePassage(system, {
      sources: unbalance,
      minRpm: speedRangeRpm.min,
      maxRpm: speedRangeRpm.max,
      modeFrequenciesHz: modes.map((m) => m.frequencyHz),
    });
    // one entry per mode and speed: sources of the same order cross a mode at the same speed; the largest motion stands
    const byCrossing = new Map<string, PassageCrossing>();
    for (const p of points) {
      const key = `${p.modeIndex}:${p.speedRpm}`;
      const motionMm = p.motionM * 1000;
      const known = byCrossing.get(key);
      if (known && !(motionMm > known.motionMm)) continue;
      byCrossing.set(key, {
        mode: describeModeMotion(modes[p.modeIndex].energyFractions).name,
        modeFrequencyHz: p.modeFrequencyHz,
        speedRpm: p.speedRpm,
        motionMm,
        source: unbalance[p.sourceIndex].label,
      });
    }
    return { nothing: null, crossings: [...byCrossing.values()].sort((a, b) => a.speedRpm - b.speedRpm), ...limit };
  }
}

/** The passage as the answer shows it (no internal fields). */
export function passageFigures(findings: PassageFindings): CandidatePassage[] {
  return findings.crossings.map(({ mode, modeFrequencyHz, speedRpm, motionMm }) => ({ mode, modeFrequencyHz, speedRpm, motionMm }));
}

// ---- words (reasons.ts places them) -----------------------------------------------------------------

/** Why the candidate fails the passage check: one sentence per crossing above the limit. */
export function passageReasons(findings: PassageFindings | undefined): string[] {
  if (!findings) return [];
  return findings.crossings
    .filter((x) => !(x.motionMm <= findings.limitMm))
    .map(
      (x) =>
        `Start-up and coast-down: passing the ${x.mode} mode at ${formatHz(x.modeFrequencyHz)} (${formatRpm(x.speedRpm)}), ${x.source} ` +
        `moves the mounts ${motionWords(x.motionMm)}, more than the ${motionMeasure(findings.limitMm)} allowed${limitWords(findings)}. ` +
        'Stiffer or better-damped mounts, a finer balance grade or limit stops are needed.',
    );
}

/** What the passage check found, when it does not fail the candidate. */
export function passageNotes(findings: PassageFindings | undefined): string[] {
  if (!findings) return [];
  if (findings.nothing === 'no-speed') {
    return ['Start-up and coast-down: nothing to check (no shaft speed is given, so no unbalance runs up through the modes).'];
  }
  if (findings.nothing === 'no-unbalance') {
    return [
      'Start-up and coast-down: nothing to check (no unbalance source is given; the passage through the modes follows unbalance only).',
    ];
  }
  if (findings.crossings.length === 0) {
    return ['Start-up and coast-down: no rigid-body mode lies below the running range for the unbalance sources; none is passed through.'];
  }
  if (findings.crossings.some((x) => !(x.motionMm <= findings.limitMm))) return [];
  const largest = findings.crossings.reduce((a, b) => (b.motionMm > a.motionMm ? b : a));
  return [
    `Start-up and coast-down: ${findings.crossings.length === 1 ? 'one mode is' : `${findings.crossings.length} modes are`} passed below ` +
      `the running range; the largest motion at the mounts is ${motionMeasure(largest.motionMm)} (the ${largest.mode} mode at ` +
      `${formatRpm(largest.speedRpm)}, ${largest.source}), within the ${motionMeasure(findings.limitMm)} allowed${limitWords(findings)}. ` +
      'It is the steady motion there; a quick run-up passes with less.',
  ];
}

function limitWords(findings: PassageFindings): string {
  if (findings.limitFrom === 'restraint gap') return ' (the gap to the restraints)';
  if (findings.limitFrom === 'default') return ' (the usual snubber clearance, taken when no limit is set)';
  return '';
}

function motionWords(mm: number): string {
  return Number.isFinite(mm) ? `${motionMeasure(mm)} (steady peak)` : 'without bound (the mounts have no damping)';
}
