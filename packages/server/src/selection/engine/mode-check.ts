/**
 * The rigid-body mode check, a finalist check (run for the best candidates only): the six coupled
 * rigid-body modes of the machine on the candidate's mounts (`rigidBodyModes`, with the mounts'
 * dynamic stiffnesses); a direction without stiffness fails the candidate, a mode within
 * ±MODE_SEPARATION of a disturbing frequency is noted (the whole-machine verdict judges it:
 * docs/engineering/selection.md §9, §19). Keeps, per candidate
 * judged, the modes and the conflict found (reasons.ts words them).
 */
import { isVibrationInputError, rigidBodyModes, type ResilientMount } from '@tacet/vibration';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateMode } from '../selection.types.js';
import type { CandidateStore } from './candidate-store.js';
import { FAIL } from './checks.js';
import type { FinalistCheck } from './ranking.js';

/** A rigid-body mode this close to a disturbing frequency fails the candidate (common practice: ±20 %). */
export const MODE_SEPARATION = 0.2;

/** Why the modes fail a candidate: a direction without stiffness, or a mode near a disturbing frequency. */
export type ModeConflict = { kind: 'mechanism' } | { kind: 'near'; mode: CandidateMode; frequencyHz: number; label: string | undefined };

export interface ModeFindings {
  /** Null when the modes could not be computed (see `ModeCheck.unavailable`). */
  modes: CandidateMode[] | null;
  conflict: ModeConflict | null;
}

export class ModeCheck implements FinalistCheck {
  private readonly findings = new Map<number, ModeFindings>();
  /** Set once the machine's inertia proves unusable: no further candidate of the request gets modes. */
  private inertiaUnusable = false;

  constructor(
    private readonly store: CandidateStore,
    private readonly problem: SelectionProblem,
  ) {}

  /** The machine's inertia is unknown or degenerate: the modes are not computed. */
  get unavailable(): boolean {
    return this.inertiaUnusable;
  }

  /** The modes of candidate c, computed once; sets FAIL.modes on a conflict. */
  check(c: number): void {
    if (this.findings.has(c)) return;
    const { problem } = this;
    let findings: ModeFindings = { modes: null, conflict: null };
    if (!this.inertiaUnusable) {
      const mounts: ResilientMount[] = this.store.pointsOf(c).map((m, i) => {
        const p = problem.points[i];
        const vertical = m.verticalStiffnessNPerM * m.dynamicStiffnessRatio;
        const horizontal =
          (Number.isNaN(m.horizontalStiffnessNPerM) ? m.verticalStiffnessNPerM : m.horizontalStiffnessNPerM) * m.dynamicStiffnessRatio;
        return { position: { x: p.x, y: p.y, z: p.z }, stiffness: { x: horizontal, y: horizontal, z: vertical } };
      });
      try {
        const result = rigidBodyModes({ massKg: problem.massKg, inertia: problem.inertia, cg: problem.cg, mounts });
        const modes = result.modes.map((m) => ({
          frequencyHz: m.frequencyHz,
          dominant: m.dominant,
          coupled: m.coupled,
          energyFractions: { ...m.energyFractions },
        }));
        findings = { modes, conflict: this.conflict(result.modes) };
      } catch (error) {
        if (!isVibrationInputError(error)) throw error;
        this.inertiaUnusable = true;
      }
    }
    // A mode near a disturbing frequency is a note: the whole-machine verdict judges it (selection.md §9, §19).
    if (findings.conflict?.kind === 'mechanism') this.store.fail[c] |= FAIL.modes;
    this.findings.set(c, findings);
  }

  /** What the check found for c (undefined when c was not judged). */
  findingsOf(c: number): ModeFindings | undefined {
    return this.findings.get(c);
  }

  /** A mechanism, or the lowest disturbing frequency with a mode within ±MODE_SEPARATION of it. */
  private conflict(modes: ReturnType<typeof rigidBodyModes>['modes']): ModeConflict | null {
    const { frequenciesHz, frequencyLabels } = this.problem;
    if (modes.some((m) => m.status !== 'ok')) return { kind: 'mechanism' };
    let hit: { mode: number; j: number } | null = null;
    for (let j = 0; j < frequenciesHz.length; j++) {
      for (let k = 0; k < modes.length; k++) {
        const fd = frequenciesHz[j];
        if (Math.abs(modes[k].frequencyHz - fd) <= MODE_SEPARATION * fd) {
          if (!hit || fd < frequenciesHz[hit.j]) hit = { mode: k, j };
        }
      }
    }
    if (!hit) return null;
    const { frequencyHz, dominant, coupled, energyFractions } = modes[hit.mode];
    return {
      kind: 'near',
      mode: { frequencyHz, dominant, coupled, energyFractions: { ...energyFractions } },
      frequencyHz: frequenciesHz[hit.j],
      label: frequencyLabels[hit.j],
    };
  }
}
