/**
 * Scoring and ranking. The score of each candidate (the formula is in ../scoring.ts) against the
 * references of the request (cheapest price per currency, shortest lead time), the order of two
 * candidates, and the ranking itself: the best passing candidates, judged on the way by the
 * finalist checks, then the best failing ones (docs/engineering/selection.md §11).
 *
 * Finalist checks are the checks too costly for every candidate (the rigid-body modes,
 * mode-check.ts; the whole-machine verdict, whole-machine-check.ts). They run on the best passing
 * candidates only, and may fail some of them; the ranking then looks further down the list (see
 * `rankCandidates`) until `limit` pass or every candidate has been judged, so that no candidate
 * the finalist checks would pass is left out unseen (docs/engineering/selection.md §21).
 */
import { BestCandidates } from '../best-candidates.js';
import { scoreCandidate, type ScoreInputs } from '../scoring.js';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateStore } from './candidate-store.js';

/** A check run only for the best candidates: it sets the candidate's fail bit when it fails and keeps its findings for the wording. */
export interface FinalistCheck {
  /** Judges candidate c (computed once; later calls return at once). */
  check(c: number): void;
}

/** Rounds of finalist checks for the best passing candidates: 2×limit first, then doubling. */
const FINALISTS_GROWTH = 2;

/** The references of the score: the same for every candidate of one request. */
export interface ScoreReferences {
  /** Cheapest total price per currency (NaN where none is known). */
  minPrice: Float64Array;
  /** Shortest lead time, days (NaN when none is known). */
  minLeadTimeDays: number;
  isolationDbTarget: number;
}

/**
 * Cheapest price (per currency) and shortest lead time among the candidates that pass the checks
 * so far and meet the requirement by the bounce estimate (among all candidates where none does):
 * the references of the score.
 */
export function scoreReferences(store: CandidateStore, problem: SelectionProblem): ScoreReferences {
  const C = store.candidateCount;
  const { skip, fail, price, lead, candidateCurrency } = store;
  const minPrice = new Float64Array(store.currencies.length).fill(Number.POSITIVE_INFINITY);
  const minPriceAny = new Float64Array(store.currencies.length).fill(Number.POSITIVE_INFINITY);
  let minLead = Number.POSITIVE_INFINITY;
  let minLeadAny = Number.POSITIVE_INFINITY;
  for (let c = 0; c < C; c++) {
    if (skip[c]) continue;
    const cur = candidateCurrency[c];
    const p = price[c];
    if (p >= 0 && p < minPriceAny[cur]) minPriceAny[cur] = p;
    if (lead[c] < minLeadAny) minLeadAny = lead[c];
    // The bounce estimate fails nothing, but a candidate it puts below the requirement sets no reference.
    if (fail[c] !== 0 || store.minIsolationDb[c] < problem.isolationDbTarget) continue;
    if (p >= 0 && p < minPrice[cur]) minPrice[cur] = p;
    if (lead[c] < minLead) minLead = lead[c];
  }
  for (let k = 0; k < minPrice.length; k++) if (!Number.isFinite(minPrice[k])) minPrice[k] = minPriceAny[k];
  if (!Number.isFinite(minLead)) minLead = minLeadAny;
  for (let k = 0; k < minPrice.length; k++) if (!Number.isFinite(minPrice[k])) minPrice[k] = Number.NaN;
  return {
    minPrice,
    minLeadTimeDays: Number.isFinite(minLead) ? minLead : Number.NaN,
    isolationDbTarget: problem.isolationDbTarget,
  };
}

/** A ScoreInputs object to fill per candidate (one per loop: the loop allocates nothing). */
export function newScoreInputs(refs: ScoreReferences): ScoreInputs {
  return {
    minIsolationDb: 0,
    isolationDbTarget: refs.isolationDbTarget,
    meanUtilization: 0,
    levelErrorM: 0,
    meanDeflectionM: 0,
    price: 0,
    minPrice: 0,
    leadTimeDays: 0,
    minLeadTimeDays: refs.minLeadTimeDays,
  };
}

/** Writes candidate c's figures into `s` (made by newScoreInputs with the same references). */
export function fillScoreInputs(store: CandidateStore, refs: ScoreReferences, c: number, s: ScoreInputs): void {
  s.minIsolationDb = store.minIsolationDb[c];
  s.meanUtilization = store.meanUtilization[c];
  s.levelErrorM = store.levelErrorM[c];
  s.meanDeflectionM = store.meanDeflectionM[c];
  s.price = store.price[c];
  s.minPrice = refs.minPrice[store.candidateCurrency[c]];
  s.leadTimeDays = store.lead[c];
}

/** Scores every offered candidate into `store.score`. */
export function scoreAll(store: CandidateStore, refs: ScoreReferences): void {
  const s = newScoreInputs(refs);
  const { skip, score } = store;
  for (let c = 0; c < store.candidateCount; c++) {
    if (skip[c]) continue;
    fillScoreInputs(store, refs, c, s);
    score[c] = scoreCandidate(s);
  }
}

/** `better(a, b)`: a ranks above b — higher score, then lower resonance amplification, then a stable key. */
export function candidateOrder(store: CandidateStore): (a: number, b: number) => boolean {
  const { score, resonance, tieKey } = store;
  return (a, b) => {
    const sa = score[a];
    const sb = score[b];
    if (sa !== sb) return sa > sb;
    const ra = resonance[a];
    const rb = resonance[b];
    if (ra !== rb) return ra < rb;
    return tieKey[a] < tieKey[b];
  };
}

/**
 * Best `limit` passing candidates, then the best `limit` failing ones. The best passing
 * candidates go through `judgeFinalists` (which may fail some) — the best 2×limit first, then
 * twice as many while fewer than `limit` still pass, until every candidate not failed by the
 * cheap checks has been judged. The cheap checks (loads, deflection, temperature, type, supplier,
 * CG, the restraint ratings) fail a candidate for a reason the finalist checks cannot undo; the
 * bounce estimate fails none (it orders only).
 */
export async function rankCandidates(
  store: CandidateStore,
  better: (a: number, b: number) => boolean,
  limit: number,
  judgeFinalists: (top: readonly number[]) => Promise<void>,
): Promise<number[]> {
  const C = store.candidateCount;
  const { skip, fail } = store;
  let capacity = Math.max(1, FINALISTS_GROWTH * limit);
  let passing: number[];
  for (;;) {
    const best = new BestCandidates(capacity, better);
    let passingTotal = 0;
    for (let c = 0; c < C; c++) {
      if (skip[c] || fail[c] !== 0) continue;
      passingTotal++;
      best.offer(c);
    }
    const top = best.sorted();
    await judgeFinalists(top);
    passing = top.filter((c) => fail[c] === 0);
    if (passing.length >= limit || passingTotal <= capacity) break;
    capacity *= 2;
  }
  const failing = new BestCandidates(limit, better);
  for (let c = 0; c < C; c++) if (!skip[c] && fail[c] !== 0) failing.offer(c);
  return [...passing.slice(0, limit), ...failing.sorted()];
}
