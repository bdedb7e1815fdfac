/**
 * The rigid-body mode check, a finalist check (run for the best candidates only): the six coupled
 * rigid-body modes of the machine on the candidate's mounts (`rigidBodyModes`, with the mounts'
 * dynamic stiffnesses); a direction without stiffness fails the candidate, a mode within
 * ±MODE_SEPARATION of a disturbing frequency is noted (the whole-machine verdict judges it:
 * docs/engineering/selection.md §9, §19). A mount without a horizontal stiffness is looked at both
 * ends of HORIZONTAL_RATIO_WHEN_MISSING (assumptions.ts, §14); a flexible support is in series with
 * the mount vertically (§15); the second mass case gets its own modes (§18). Keeps, per candidate
 * judged, the modes and the conflict found (reasons.ts words them).
 */
import { isVibrationInputError, rigidBodyModes, seriesStiffness, type ResilientMount } from '@tacet/vibration';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateMode } from '../selection.types.js';
import type { CandidateStore } from './candidate-store.js';
import { HORIZONTAL_RATIO_WHEN_MISSING } from './assumptions.js';
import { FAIL } from './checks.js';
import type { FinalistCheck } from './ranking.js';

/** A rigid-body mode this close to a disturbing frequency is named in a note (common practice: ±20 %). */
export const MODE_SEPARATION = 0.2;

/** What the modes show: a direction without stiffness (fails), or a mode near a disturbing frequency (a note). */
export type ModeConflict =
  | { kind: 'mechanism' }
  | {
      kind: 'near';
      mode: CandidateMode;
      frequencyHz: number;
      label: string | undefined;
      /** Set when the conflict appears with the low assumed horizontal stiffness (not the modes shown). */
      assumedHorizontalRatio?: number;
    };

export interface ModeFindings {
  /** Null when the modes could not be computed (see `ModeCheck.unavailable`). */
  modes: CandidateMode[] | null;
  conflict: ModeConflict | null;
  /** A mode near a disturbing frequency in the second mass case (selection.md §18; a note). */
  altConflict?: ModeConflict | null;
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

  /** The modes of candidate c, computed once; sets FAIL.modes on a mechanism. */
  check(c: number): void {
    if (this.findings.has(c)) return;
    const { problem } = this;
    let findings: ModeFindings = { modes: null, conflict: null };
    if (!this.inertiaUnusable) {
      const points = this.store.pointsOf(c);
      const mountsAt = (missingRatio: number): ResilientMount[] =>
        points.map((m, i) => {
          const p = problem.points[i];
          const kd = m.verticalStiffnessNPerM * m.dynamicStiffnessRatio;
          const vertical = seriesStiffness(kd, 1 / problem.supportCompliance[i]);
          const kh = Number.isNaN(m.horizontalStiffnessNPerM) ? missingRatio * m.verticalStiffnessNPerM : m.horizontalStiffnessNPerM;
          const horizontal = kh * m.dynamicStiffnessRatio;
          return { position: { x: p.x, y: p.y, z: p.z }, stiffness: { x: horizontal, y: horizontal, z: vertical } };
        });
      type Body = Pick<SelectionProblem, 'massKg' | 'inertia' | 'cg'>;
      const solve = (mounts: ResilientMount[], body: Body = problem) =>
        rigidBodyModes({ massKg: body.massKg, inertia: body.inertia, cg: body.cg, mounts });
      const missingKh = points.some((m) => Number.isNaN(m.horizontalStiffnessNPerM));
      try {
        const result = solve(mountsAt(HORIZONTAL_RATIO_WHEN_MISSING.high));
        const modes = result.modes.map((m) => ({
          frequencyHz: m.frequencyHz,
          dominant: m.dominant,
          coupled: m.coupled,
          energyFractions: { ...m.energyFractions },
        }));
        let conflict = this.conflict(result.modes);
        if (!conflict && missingKh) {
          const low = this.conflict(solve(mountsAt(HORIZONTAL_RATIO_WHEN_MISSING.low)).modes);
          if (low?.kind === 'near') conflict = { ...low, assumedHorizontalRatio: HORIZONTAL_RATIO_WHEN_MISSING.low };
          else if (low) conflict = low;
        }
        findings = { modes, conflict };
        if (problem.alt) {
          let altConflict = this.conflict(solve(mountsAt(HORIZONTAL_RATIO_WHEN_MISSING.high), problem.alt).modes);
          if (!altConflict && missingKh) altConflict = this.conflict(solve(mountsAt(HORIZONTAL_RATIO_WHEN_MISSING.low), problem.alt).modes);
          findings.altConflict = altConflict;
        }
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
