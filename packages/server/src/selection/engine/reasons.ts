/**
 * The words of the selection: for each failed check (a bit of the fail mask, checks.ts) the
 * sentences that say why, with the figures that decide it, and the notes on what the engine
 * assumed. Runs only for the candidates shown. Numbers in the words are rounded for reading
 * (selection-format.ts); the figures of the answer stay unrounded. A figure with a unit is a
 * `measure(…)` mark, written in each reader's units when the words go out (common/units/reader-words.ts).
 *
 * To word a new check: a function (context → sentences) and its row in REASONS, placed where its
 * sentence should come in the list.
 */
import { describeModeMotion, isolationEfficiencyPct, mountTypeLabel } from '@tacet/vibration';
import { measure } from '../../common/units/reader-words.js';
import { formatHz, formatNumber, formatPct, formatPctValue } from '../selection-format.js';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateAltMassCase, CandidatePoint, CandidateRestraint, RestraintPoint } from '../selection.types.js';
import type { CandidateStore, PointMount } from './candidate-store.js';
import { FAIL } from './checks.js';
import { catalogAssumptionsFor } from './assumptions.js';
import { MODE_SEPARATION, type ModeConflict, type ModeFindings } from './mode-check.js';
import { passageNotes, passageReasons, type PassageFindings } from './passage-check.js';
import type { WholeMachineFindings } from './whole-machine-check.js';
import { bandWords, wholeMachine, wholeMachineNotes, worstPointWords } from './reasons-whole-machine.js';
import { SPRING_MIN_HORIZONTAL_RATIO, SPRING_RESERVE } from './spring-checks.js';

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
  /** The whole-machine verdict's findings (null when the model could not be built or the candidate was not judged). */
  wholeMachine: NonNullable<WholeMachineFindings['result']> | null;
  /** The figures of the second mass case (undefined without one). */
  altMassCase?: CandidateAltMassCase;
  /** What the start-up passage check found (undefined when the candidate was not judged or the model could not be built). */
  passage?: PassageFindings;
}

type Words = (x: WordingContext) => string[];

/** The reasons of a failed candidate, check by check, in this order. */
export const REASONS: readonly (readonly [bit: number, words: Words])[] = [
  [FAIL.cgOutside, cgOutside],
  [FAIL.wholeMachine, wholeMachine],
  [FAIL.passage, (x) => passageReasons(x.passage)],
  [FAIL.isolation, isolation],
  [FAIL.utilization, utilization],
  [FAIL.deflection, deflection],
  [FAIL.reserveTravel, reserveTravel],
  [FAIL.lightLoad, lightLoad],
  [FAIL.springStability, springStability],
  [FAIL.temperature, temperature],
  [FAIL.modes, modes],
  [FAIL.restraint, restraint],
  [FAIL.massCase, massCase],
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
  notes.push(...wholeMachineNotes(x));
  notes.push(...passageNotes(x.passage));
  if (x.modes?.conflict?.kind === 'near') notes.push(`${modeConflict(x.modes.conflict)} The whole-machine verdict judges it.`);
  if (x.modes?.altConflict?.kind === 'near') {
    notes.push(`In the second mass case: ${modeConflict(x.modes.altConflict)} The whole-machine verdict judges it.`);
  }
  notes.push(...supportNotes(x));
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
  if (x.restraint && !store.isUniform(c) && rows.some((r) => Number.isNaN(store.kh[r]))) {
    notes.push(
      'Seismic restraint: where the catalog gives no horizontal stiffness, the shares of the horizontal force take it equal to the vertical stiffness.',
    );
  }
  if (!store.isUniform(c) && store.levelErrorM[c] > 0) {
    notes.push(
      `Sizes picked per point for a level skid; the remaining level error of ${measure('deflection', store.levelErrorM[c])} is trimmed with shims or levelling bolts.`,
    );
  }
  return notes;
}

/**
 * Every value that did not come from the catalog or the input, with the value used (assumptions.ts,
 * docs/engineering/selection.md §14): the catalog's gaps, a machine without inertia.
 */
export function assumptionsFor(x: WordingContext): string[] {
  const out = catalogAssumptionsFor(x.store, x.c);
  const pointMasses = x.problem.components.filter((k) => (!k.shape || k.shape === 'point') && !k.ownInertia).map((k) => k.name);
  if (pointMasses.length > 0) {
    out.push(
      `Taken as point masses (no box or inertia given): ${pointMasses.join(', ')}. Their own inertia is left out, so the ` +
        'rocking modes come out higher than they are.',
    );
  }
  if (x.modesUnavailable || (x.modes && !x.modes.modes)) {
    out.push(
      'The machine has no usable inertia (point masses, or all on one line): its rigid-body modes were not checked; ' +
        'only the vertical bounce is judged. Give the components box dimensions or their inertia.',
    );
  }
  if (x.store.rowsOf(x.c).some((r) => x.store.isSpring[r])) {
    out.push('Coil surge not checked: the catalog gives no coil data (wire and coil diameters, active coils) for its springs.');
  }
  return out;
}

/** Support less than SUPPORT_STIFFNESS_FACTOR × as stiff as the mount on it: a warning (rule of thumb, §15). */
export const SUPPORT_STIFFNESS_FACTOR = 10;

function supportNotes({ problem, points }: WordingContext): string[] {
  if (!problem.hasSupport) return [];
  const weak = problem.points.filter((p, i) => {
    const kd = points[i].verticalStiffnessNPerM * points[i].dynamicStiffnessRatio;
    return p.supportStiffnessNPerMm !== undefined && p.supportStiffnessNPerMm * 1000 < SUPPORT_STIFFNESS_FACTOR * kd;
  });
  const notes = [
    'The support under the mounts is flexible: its stiffness is taken in series with each mount in the natural frequency, ' +
      'the level and the modes; the floor itself may still have resonances of its own that this does not show.',
  ];
  if (weak.length > 0) {
    notes.push(
      `Warning: the support at ${weak.map((p) => `point ${p.label}`).join(', ')} is less than ${SUPPORT_STIFFNESS_FACTOR}× as stiff as the mount on it ` +
        `(a rule of thumb, no published source): the isolation depends on the support as much as on the mounts; have the structure checked.`,
    );
  }
  return notes;
}

// ---- one function per check ---------------------------------------------------------------------

function cgOutside({ problem }: WordingContext): string[] {
  return [
    `The centre of gravity (x ${measure('position', problem.cg.x)}, y ${measure('position', problem.cg.y)}) lies outside ` +
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
    reasons.push(`Point ${p.label} would lift off (it would need to pull ${measure('force', -p.loadN)}).`);
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
        `Static deflection at point ${p.label} (${measure('deflection', (p.staticDeflectionMm * problem.marginFactor) / 1000)}${marginNote(problem)}) exceeds ` +
          `the ${measure('deflection', maxMm / 1000)} the mount ${p.partNumber} allows.`,
      );
    }
  });
  return reasons;
}

function reserveTravel({ problem, points, perPoint }: WordingContext): string[] {
  const reasons: string[] = [];
  perPoint.forEach((p, i) => {
    const m = points[i];
    const staticMm = p.staticDeflectionMm * problem.marginFactor;
    const maxMm = m.maxDeflectionM * 1000;
    // beyond the travel itself the deflection reason says it already
    if (staticMm * (1 + SPRING_RESERVE) > maxMm && staticMm <= maxMm) {
      reasons.push(
        `Spring ${p.partNumber} at point ${p.label}: ${measure('deflection', Math.max(0, maxMm - staticMm) / 1000)} of travel left beyond the static ` +
          `deflection of ${measure('deflection', staticMm / 1000)}${marginNote(problem)}; at least ${SPRING_RESERVE * 100} % of it (${measure('deflection', (staticMm * SPRING_RESERVE) / 1000)}) ` +
          'is kept in reserve (common practice) so the spring does not go solid.',
      );
    }
  });
  return reasons;
}

function lightLoad({ problem, store, points, perPoint }: WordingContext): string[] {
  const light = 1 - problem.weightMarginPct / 100;
  const low = perPoint.filter((p, i) => store.isSpring[points[i].row] && p.utilization * light < problem.criteria.minUtilization);
  if (low.length === 0) return [];
  return [
    `In the light case (weight less the ${formatNumber(problem.weightMarginPct, 1)} % margin) the springs are below the minimum ` +
      `${formatPct(problem.criteria.minUtilization)} of the rated load at ${low.map((p) => `point ${p.label} (${formatPct(p.utilization * light)})`).join(', ')}: ` +
      'an under-loaded spring is stiffer than it should be for its load, and the isolation is worse.',
  ];
}

function springStability({ store, c }: WordingContext): string[] {
  return store
    .rowsOf(c)
    .filter((r) => store.rowFail[r] & FAIL.springStability)
    .map((r) =>
      Number.isNaN(store.kh[r])
        ? `Lateral stability of ${store.partNumberOf(r)} cannot be shown: the catalog gives no horizontal stiffness ` +
          `(a coil spring needs at least ${formatNumber(SPRING_MIN_HORIZONTAL_RATIO, 1)}× its vertical stiffness sideways).`
        : `${store.partNumberOf(r)} is laterally unstable: its horizontal stiffness is ${formatNumber(store.kh[r] / store.kv[r], 2)}× ` +
          `the vertical, below the ${formatNumber(SPRING_MIN_HORIZONTAL_RATIO, 1)}× a coil spring needs (project-specification rule).`,
    );
}

/** What fails in the second mass case (selection.md §18). */
function massCase({ problem, store, points, altMassCase: alt, wholeMachine: w }: WordingContext): string[] {
  if (!alt || !problem.alt) return [];
  const head = `In the second mass case (${measure('mass', alt.massKg)}, CG x ${measure('position', alt.cg.x)}, y ${measure('position', alt.cg.y)})`;
  const reasons: string[] = [];
  if (!problem.alt.cgInside)
    reasons.push(`${head} the centre of gravity lies outside the polygon of the mount points: the machine would tip.`);
  const { minUtilization, maxUtilization } = problem.criteria;
  const light = 1 - problem.weightMarginPct / 100;
  const bad = alt.perPoint.filter((p, i) => {
    const m = points[i];
    const u = p.utilization;
    const d = (p.staticDeflectionMm / 1000) * problem.marginFactor;
    return (
      u * problem.marginFactor > maxUtilization ||
      u < minUtilization ||
      (store.isSpring[m.row] === 1 && u * light < minUtilization) ||
      d > m.maxDeflectionM ||
      d > store.springLimitM[m.row]
    );
  });
  if (bad.length > 0) {
    reasons.push(
      `${head} the loads leave the allowed ${formatPct(minUtilization)}–${formatPct(maxUtilization)} of the rated load, the light case of ` +
        `the springs or their travel at ${bad.map((p) => `point ${p.label} (${formatPct(p.utilization)}, ${measure('deflection', p.staticDeflectionMm / 1000)})`).join(', ')}.`,
    );
  }
  const whole = alt.wholeMachineWorst;
  if (whole && whole.transmissibility > problem.transmissibilityTarget) {
    const band = bandWords(whole.stiffnessFactor, w?.stiffnessTolerancePct ?? 0);
    reasons.push(worstPointWords(`${head}, whole machine`, whole, band, problem.criteria.minIsolationPct));
  } else if (!whole) {
    // the model could not be built: the bounce estimate decides (selection.md §9)
    const worst = alt.isolation.reduce((x, row) => (row.transmissibility > x.transmissibility ? row : x), alt.isolation[0]);
    if (worst && worst.transmissibility > problem.transmissibilityTarget) {
      reasons.push(
        `${head} the natural frequency rises to ${formatHz(alt.verticalNaturalFrequencyHz)}: isolation at ${formatHz(worst.frequencyHz)} is ` +
          `${formatPctValue(worst.efficiencyPct)}, below the ${formatNumber(problem.criteria.minIsolationPct, 1)} % target.`,
      );
    }
  }
  return reasons;
}

function temperature({ problem, store, c }: WordingContext): string[] {
  return store
    .rowsOf(c)
    .filter((r) => store.rowFail[r] & FAIL.temperature)
    .map(
      (r) =>
        `The ambient temperature ${measure('temperature', problem.criteria.ambientTempC ?? 0)} is outside the range of ${store.partNumberOf(r)} ` +
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
  const { mode, frequencyHz, label, assumedHorizontalRatio } = conflict;
  const assumed =
    assumedHorizontalRatio === undefined
      ? ''
      : ` (with the horizontal stiffness the catalog does not give taken as ${formatNumber(assumedHorizontalRatio, 1)}× the vertical)`;
  return (
    `The ${describeModeMotion(mode.energyFractions).name} mode at ${formatHz(mode.frequencyHz)}${assumed} lies within ` +
    `±${Math.round(MODE_SEPARATION * 100)} % of the disturbing frequency ${formatHz(frequencyHz)}${labelSuffix(label)}: ` +
    'the machine would rock or sway strongly there.'
  );
}

function restraint({ restraint: figures }: WordingContext): string[] {
  if (!figures) return [];
  const reasons: string[] = [];
  const n = (value: number) => measure('force', value);
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
  const lo = Number.isNaN(min) ? 'no lower limit' : measure('temperature', min);
  const hi = Number.isNaN(max) ? 'no upper limit' : measure('temperature', max);
  return `${lo} to ${hi}`;
}
