/**
 * The words of the selection: for each failed check (a bit of the fail mask, checks.ts) the
 * sentences that say why, with the figures that decide it, and the notes on what the engine
 * assumed. Runs only for the candidates shown. Numbers in the words are rounded for reading
 * (selection-format.ts); the figures of the answer stay unrounded.
 *
 * To word a new check: a function (context → sentences) and its row in REASONS, placed where its
 * sentence should come in the list.
 */
import { describeModeMotion, isolationEfficiencyPct, mountTypeLabel } from '@tacet/vibration';
import { formatHz, formatMm, formatNumber, formatPct, formatPctValue } from '../selection-format.js';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidatePoint, CandidateRestraint, RestraintPoint } from '../selection.types.js';
import type { CandidateStore, PointMount } from './candidate-store.js';
import { FAIL } from './checks.js';
import { MODE_SEPARATION, type ModeConflict, type ModeFindings } from './mode-check.js';

/** What the wording reads about one candidate. */
export interface WordingContext {
  problem: SelectionProblem;
  store: CandidateStore;
  c: number;
  /** The mounts at each point (point order). */
  points: readonly PointMount[];
  /** The points as the answer shows them (load, utilisation, static deflection). */
  perPoint: readonly CandidatePoint[];
  supplierName: string | undefined;
  /** What the rigid-body mode check found (undefined when the candidate was not judged). */
  modes: ModeFindings | undefined;
  /** The machine's inertia is unusable: no modes for any candidate. */
  modesUnavailable: boolean;
  /** The seismic restraint figures (undefined when the input asks for no restraint). */
  restraint: CandidateRestraint | undefined;
}

type Words = (x: WordingContext) => string[];

/** The reasons of a failed candidate, check by check, in this order. */
export const REASONS: readonly (readonly [bit: number, words: Words])[] = [
  [FAIL.cgOutside, cgOutside],
  [FAIL.isolation, isolation],
  [FAIL.utilization, utilization],
  [FAIL.deflection, deflection],
  [FAIL.temperature, temperature],
  [FAIL.modes, modes],
  [FAIL.restraint, restraint],
  [FAIL.type, mountType],
  [FAIL.supplier, supplier],
];

/** Why the candidate fails, in words (empty when it passes). */
export function reasonsFor(x: WordingContext): string[] {
  const fail = x.store.fail[x.c];
  const reasons: string[] = [];
  for (const [bit, words] of REASONS) if (fail & bit) reasons.push(...words(x));
  return reasons;
}

/** What the engine assumed or could not do for the candidate, in words. */
export function notesFor(x: WordingContext): string[] {
  const { store, c, problem } = x;
  const notes: string[] = [];
  const rows = store.rowsOf(c);
  if (x.modes?.modes && rows.some((r) => store.hasDetails[r] && Number.isNaN(store.kh[r]))) {
    notes.push('The catalog gives no horizontal stiffness: the rigid-body modes take it equal to the vertical stiffness.');
  }
  if (x.modes && !x.modes.modes && x.modesUnavailable) {
    notes.push(
      'Rigid-body modes not computed: the inertia of the machine is unknown or degenerate (give the components box dimensions or their inertia).',
    );
  }
  if (problem.criteria.ambientTempC !== undefined) {
    for (const r of rows) {
      if (store.hasDetails[r] && Number.isNaN(store.tempMin[r]) && Number.isNaN(store.tempMax[r])) {
        notes.push(`${store.partNumberOf(r)}: the supplier states no temperature range.`);
      }
    }
  }
  if (x.restraint && !store.isUniform(c) && rows.some((r) => store.hasDetails[r] && Number.isNaN(store.kh[r]))) {
    notes.push(
      'Seismic restraint: where the catalog gives no horizontal stiffness, the shares of the horizontal force take it equal to the vertical stiffness.',
    );
  }
  if (!store.isUniform(c) && store.levelErrorM[c] > 0) {
    notes.push(
      `Sizes picked per point for a level skid; the remaining level error of ${formatMm(store.levelErrorM[c] * 1000)} is trimmed with shims or levelling bolts.`,
    );
  }
  return notes;
}

// ---- one function per check ---------------------------------------------------------------------

function cgOutside({ problem }: WordingContext): string[] {
  return [
    `The centre of gravity (x ${formatNumber(problem.cg.x, 3)} m, y ${formatNumber(problem.cg.y, 3)} m) lies outside ` +
      'the polygon of the mount points: the machine would tip. Move the mount points or the equipment.',
  ];
}

/** Names the lowest failing frequency: amplification below √2·fn, else the efficiency against the target. */
function isolation({ problem, store, c }: WordingContext): string[] {
  const nf = problem.frequenciesHz.length;
  let worst = -1;
  for (let j = 0; j < nf; j++) {
    if (store.transmissibility[c * nf + j] > problem.transmissibilityTarget) {
      if (worst < 0 || problem.frequenciesHz[j] < problem.frequenciesHz[worst]) worst = j;
    }
  }
  const fd = problem.frequenciesHz[worst];
  const t = store.transmissibility[c * nf + worst];
  const fn = store.fnHz[c];
  const at = `${formatHz(fd)}${labelSuffix(problem.frequencyLabels[worst])}`;
  return [
    fd < Math.SQRT2 * fn
      ? `At ${at} the mounts amplify the vibration instead of isolating it (transmissibility ${formatNumber(t, 2)}): ` +
        `${formatHz(fd)} is below √2 × the natural frequency ${formatHz(fn)}. Softer mounts are needed.`
      : `Isolation at ${at} is ${formatPctValue(isolationEfficiencyPct(t))}, below the ${formatNumber(problem.criteria.minIsolationPct, 1)} % ` +
        `target (natural frequency ${formatHz(fn)}). Softer mounts are needed.`,
  ];
}

function utilization({ problem, perPoint }: WordingContext): string[] {
  const { criteria } = problem;
  const reasons: string[] = [];
  for (const p of perPoint.filter((q) => q.loadN < 0)) {
    reasons.push(`Point ${p.label} would lift off (it would need to pull ${formatNumber(-p.loadN, 0)} N).`);
  }
  const over = (p: CandidatePoint) => p.utilization * problem.marginFactor > criteria.maxUtilization;
  const outside = perPoint.filter((p) => p.loadN >= 0 && (over(p) || p.utilization < criteria.minUtilization));
  if (outside.length > 0) {
    const shown = (p: CandidatePoint) => formatPct(over(p) ? p.utilization * problem.marginFactor : p.utilization);
    reasons.push(
      `Load outside the allowed ${formatPct(criteria.minUtilization)}–${formatPct(criteria.maxUtilization)} of the rated ` +
        `load${marginNote(problem)} at ${outside.map((p) => `point ${p.label} (${shown(p)})`).join(', ')}.`,
    );
  }
  return reasons;
}

function deflection({ problem, points, perPoint }: WordingContext): string[] {
  const reasons: string[] = [];
  perPoint.forEach((p, i) => {
    const maxMm = points[i].maxDeflectionM * 1000;
    if (p.staticDeflectionMm * problem.marginFactor > maxMm) {
      reasons.push(
        `Static deflection at point ${p.label} (${formatMm(p.staticDeflectionMm * problem.marginFactor)}${marginNote(problem)}) exceeds ` +
          `the ${formatMm(maxMm)} the mount ${p.partNumber} allows.`,
      );
    }
  });
  return reasons;
}

function temperature({ problem, store, c }: WordingContext): string[] {
  return store
    .rowsOf(c)
    .filter((r) => store.rowFail[r] & FAIL.temperature)
    .map(
      (r) =>
        `The ambient temperature ${formatNumber(problem.criteria.ambientTempC ?? 0, 1)} °C is outside the range of ${store.partNumberOf(r)} ` +
        `(${rangeText(store.tempMin[r], store.tempMax[r])}).`,
    );
}

function modes({ modes: found }: WordingContext): string[] {
  return found?.conflict ? [modeConflict(found.conflict)] : [];
}

function modeConflict(conflict: ModeConflict): string {
  if (conflict.kind === 'mechanism') {
    return 'The mounts leave the machine free to move in one direction (a rigid-body mode has no stiffness).';
  }
  const { mode, frequencyHz, label } = conflict;
  return (
    `The ${describeModeMotion(mode.energyFractions).name} mode at ${formatHz(mode.frequencyHz)} lies within ` +
    `±${Math.round(MODE_SEPARATION * 100)} % of the disturbing frequency ${formatHz(frequencyHz)}${labelSuffix(label)}: ` +
    'the machine would rock or sway strongly there.'
  );
}

function restraint({ restraint: figures }: WordingContext): string[] {
  if (!figures) return [];
  const reasons: string[] = [];
  const n = (value: number) => `${formatNumber(value, 0)} N`;
  const grouped = (points: readonly RestraintPoint[]) => {
    const byPart = new Map<string, RestraintPoint[]>();
    for (const p of points) byPart.set(p.partNumber, [...(byPart.get(p.partNumber) ?? []), p]);
    return [...byPart];
  };
  const where = (points: readonly RestraintPoint[]) =>
    points.length === 1 ? `point ${points[0].label}` : `points ${points.map((p) => p.label).join(', ')}`;
  for (const [part, points] of grouped(figures.perPoint.filter((p) => p.restraintCapacityN === null))) {
    reasons.push(
      `Seismic restraint: ${part} has no horizontal restraint rating (${where(points)}); ` +
        `the design force puts up to ${n(Math.max(...points.map((p) => p.shearN)))} on a mount.`,
    );
  }
  for (const p of figures.perPoint) {
    if (p.restraintCapacityN !== null && p.shearN > p.restraintCapacityN) {
      reasons.push(
        `Seismic restraint at point ${p.label}: the horizontal force ${n(p.shearN)} exceeds the restraint rating ` +
          `${n(p.restraintCapacityN)} of ${p.partNumber}.`,
      );
    }
  }
  for (const [part, points] of grouped(figures.perPoint.filter((p) => p.tensionN > 0 && p.upliftCapacityN === null))) {
    reasons.push(
      `Seismic restraint: ${part} has no uplift rating, and the design force lifts ${where(points)} ` +
        `with up to ${n(Math.max(...points.map((p) => p.tensionN)))}.`,
    );
  }
  for (const p of figures.perPoint) {
    if (p.upliftCapacityN !== null && p.tensionN > p.upliftCapacityN) {
      reasons.push(
        `Seismic restraint at point ${p.label}: the uplift ${n(p.tensionN)} exceeds the uplift rating ${n(p.upliftCapacityN)} of ${p.partNumber}.`,
      );
    }
  }
  return reasons;
}

function mountType({ store, c }: WordingContext): string[] {
  const types = [
    ...new Set(
      store
        .rowsOf(c)
        .filter((r) => store.rowFail[r] & FAIL.type)
        .map((r) => store.mountType[r]),
    ),
  ];
  return [`The mount type ${types.map((t) => mountTypeLabel(t).toLowerCase()).join(', ')} is not among the allowed types.`];
}

function supplier({ supplierName }: WordingContext): string[] {
  return [`${supplierName ?? 'This supplier'} is not among the allowed suppliers.`];
}

// ---- helpers -------------------------------------------------------------------------------------

function marginNote(problem: SelectionProblem): string {
  return problem.marginFactor > 1 ? ` with the ${formatNumber((problem.marginFactor - 1) * 100, 1)} % weight margin` : '';
}

function labelSuffix(label: string | undefined): string {
  return label ? ` (${label})` : '';
}

function rangeText(min: number, max: number): string {
  const lo = Number.isNaN(min) ? 'no lower limit' : `${formatNumber(min, 1)} °C`;
  const hi = Number.isNaN(max) ? 'no upper limit' : `${formatNumber(max, 1)} °C`;
  return `${lo} to ${hi}`;
}
