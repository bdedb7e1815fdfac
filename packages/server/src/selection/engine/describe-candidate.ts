/**
 * One candidate as the API shows it (`Candidate`): its points, isolation per frequency, score
 * terms, modes, whole-machine figures, second mass case, verdict, reasons and notes, from the store and the findings of the checks. Runs
 * only for the candidates returned; unrounded figures.
 */
import { isolationDb, isolationEfficiencyPct } from '@tacet/vibration';
import { scoreCandidate } from '../scoring.js';
import type { SelectionProblem } from '../selection-problem.js';
import type { Candidate, CandidateAltMassCase, CandidatePoint, CandidateWholeMachine, ScoreTerms } from '../selection.types.js';
import { FAIL } from './checks.js';
import { altLoadsOf, seriesAltBuffers } from './mass-case.js';
import type { CandidateStore } from './candidate-store.js';
import type { ModeCheck } from './mode-check.js';
import { passageFigures, type PassageCheck } from './passage-check.js';
import type { RestraintCheck } from './restraint-check.js';
import type { WholeMachineCheck } from './whole-machine-check.js';
import { fillScoreInputs, newScoreInputs, type ScoreReferences } from './ranking.js';
import { assumptionsFor, notesFor, reasonsFor, type WordingContext } from './reasons.js';

export interface DescribeSources {
  store: CandidateStore;
  problem: SelectionProblem;
  refs: ScoreReferences;
  modeCheck: ModeCheck;
  restraintCheck: RestraintCheck;
  wholeMachineCheck: WholeMachineCheck;
  passageCheck: PassageCheck;
}

export function describeCandidate(
  { store, problem, refs, modeCheck, restraintCheck, wholeMachineCheck, passageCheck }: DescribeSources,
  c: number,
  supplierNames: ReadonlyMap<number, string>,
): Candidate {
  const nf = problem.frequenciesHz.length;
  const uniform = store.isUniform(c);
  const supplierId = store.supplierOf(c);
  const points = store.pointsOf(c);
  const perPoint: CandidatePoint[] = problem.points.map((p, i) => {
    const m = points[i];
    return {
      label: p.label,
      mountId: m.mountId,
      partNumber: m.partNumber,
      loadN: m.loadN,
      utilization: m.loadN / m.ratedLoadN,
      utilizationWithMargin: (m.loadN / m.ratedLoadN) * problem.marginFactor, // as the check computes it (evaluate-uniform.ts)
      staticDeflectionMm: (m.loadN / m.verticalStiffnessNPerM) * 1000,
      ...(problem.supportCompliance[i] > 0 ? { supportDeflectionMm: m.loadN * problem.supportCompliance[i] * 1000 } : {}),
    };
  });
  const isolation = Array.from({ length: nf }, (_, j) => {
    const t = store.transmissibility[c * nf + j];
    return {
      frequencyHz: problem.frequenciesHz[j],
      transmissibility: t,
      efficiencyPct: isolationEfficiencyPct(t),
      dB: isolationDb(t),
    };
  });
  const terms: ScoreTerms = { isolation: 0, utilization: 0, level: 0, price: 0, leadTime: 0 };
  const s = newScoreInputs(refs);
  fillScoreInputs(store, refs, c, s);
  const score = scoreCandidate(s, terms);
  const modes = modeCheck.findingsOf(c);
  const restraint = restraintCheck.figuresOf(c);
  const found = wholeMachineCheck.findingsOf(c);
  const whole = found?.result ?? null;
  const altMassCase = altCaseOf(store, problem, c, found?.alt?.worst);
  const wholeMachine: CandidateWholeMachine | undefined = whole
    ? { worst: { ...whole.worst }, stiffnessTolerancePct: whole.stiffnessTolerancePct, perFrequency: wholeMachineCheck.perFrequency(c) }
    : undefined;
  const crossings = whole?.crossings.map(({ mode, modeFrequencyHz, source, order, speedRpm }) => ({
    mode,
    modeFrequencyHz,
    source,
    order,
    speedRpm,
  }));
  const passage = passageCheck.findingsOf(c);
  const wording: WordingContext = {
    problem,
    store,
    c,
    points,
    perPoint,
    supplierName: supplierNames.get(supplierId),
    modes,
    modesUnavailable: modeCheck.unavailable,
    restraint,
    wholeMachine: whole,
    altMassCase,
    passage,
  };
  const price = store.price[c];
  const lead = store.lead[c];
  return {
    kind: uniform ? 'uniform' : 'series',
    ...(uniform ? { mountId: store.id[c] } : { seriesId: store.seriesIdOf(c) }),
    label: uniform ? store.partNumberOf(c) : seriesLabel(store, points),
    supplier: { id: supplierId, name: supplierNames.get(supplierId) ?? `Supplier ${supplierId}` },
    perPoint,
    weightMarginPct: problem.weightMarginPct,
    verticalNaturalFrequencyHz: store.fnHz[c],
    isolation,
    resonanceAmplification: store.resonance[c],
    levelErrorMm: store.levelErrorM[c] * 1000,
    totalPrice: Number.isFinite(price) ? price : null,
    currency: store.currencies[store.candidateCurrency[c]] ?? 'USD',
    maxLeadTimeDays: Number.isFinite(lead) ? lead : null,
    ...(modes?.modes ? { modes: modes.modes } : {}),
    ...(restraint ? { restraint } : {}),
    ...(wholeMachine ? { wholeMachine, crossings } : {}),
    ...(altMassCase ? { altMassCase } : {}),
    ...(passage ? { passage: passageFigures(passage), passageLimitMm: passage.limitMm } : {}),
    passes: store.fail[c] === 0,
    reasons: reasonsFor(wording),
    notes: notesFor(wording),
    assumptions: assumptionsFor(wording),
    score,
    scoreTerms: terms,
  };
}

/** "Series S1: QM-S1-02400 ×2, QM-S1-03000 ×2" (part numbers in point order, counted). */
function seriesLabel(store: CandidateStore, points: readonly { row: number; partNumber: string }[]): string {
  const counts = new Map<string, number>();
  for (const { partNumber } of points) counts.set(partNumber, (counts.get(partNumber) ?? 0) + 1);
  return `Series ${store.series[points[0].row]}: ${[...counts].map(([part, count]) => `${part} ×${count}`).join(', ')}`;
}

/** The figures of the second mass case (undefined without one). */
function altCaseOf(
  store: CandidateStore,
  problem: SelectionProblem,
  c: number,
  wholeMachineWorst: CandidateWholeMachine['worst'] | undefined,
): CandidateAltMassCase | undefined {
  const alt = problem.alt;
  if (!alt) return undefined;
  const nf = problem.frequenciesHz.length;
  const loads = store.isUniform(c) ? alt.equalLoadsN : altLoadsOf(store, problem, c, seriesAltBuffers(problem));
  return {
    massKg: alt.massKg,
    cg: { ...alt.cg },
    verticalNaturalFrequencyHz: store.fnAltHz[c],
    perPoint: problem.points.map((p, i) => {
      const r = store.rowOf(c, i);
      return {
        label: p.label,
        loadN: loads[i],
        utilization: loads[i] / store.rated[r],
        staticDeflectionMm: (loads[i] / store.kv[r]) * 1000,
      };
    }),
    isolation: Array.from({ length: nf }, (_, j) => {
      const t = store.transmissibilityAlt[c * nf + j];
      return { frequencyHz: problem.frequenciesHz[j], transmissibility: t, efficiencyPct: isolationEfficiencyPct(t) };
    }),
    ...(wholeMachineWorst ? { wholeMachineWorst: { ...wholeMachineWorst } } : {}),
    passes: (store.fail[c] & FAIL.massCase) === 0,
  };
}
