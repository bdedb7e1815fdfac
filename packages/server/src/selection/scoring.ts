import type { ScoreTerms } from './selection.types.js';

/**
 * Ranking score of a candidate (docs/engineering/selection.md §11; the weights are our own
 * choice, with no published source):
 *
 *   S = 0.40·min(1, I_dB,min / I_dB,target)          isolation at the worst disturbing frequency
 *     + 0.20·(1 − min(1, |ū − 0.8| / 0.3))            mean load utilisation near 0.8
 *     + 0.15·(1 − min(1, Δδ / δ̄))                     level error against the mean deflection
 *     + 0.15·(price_min / price)                       cheapest total price among the candidates
 *     + 0.10·(lead_min / lead)                         shortest lead time among the candidates
 *
 * Each term is returned weighted (they add up to S, at most 1). The isolation term is clamped
 * to [0, 1] (amplification scores 0). Prices are compared within one currency (no exchange
 * rates); an unknown price or lead time scores 0 on its term; a lead time of 0 days scores full.
 * Ties are broken on the lower resonance amplification.
 */
export const SCORE_WEIGHTS: ScoreTerms = { isolation: 0.4, utilization: 0.2, level: 0.15, price: 0.15, leadTime: 0.1 };

/** The preferred mean utilisation and the distance at which its term reaches 0 (common practice: 0.7–0.9 preferred). */
export const PREFERRED_UTILIZATION = 0.8;
export const UTILIZATION_SPAN = 0.3;

export interface ScoreInputs {
  /** Isolation in dB at the worst disturbing frequency. */
  minIsolationDb: number;
  isolationDbTarget: number;
  meanUtilization: number;
  levelErrorM: number;
  meanDeflectionM: number;
  /** NaN when unknown. */
  price: number;
  /** Lowest known price in the same currency (NaN when none). */
  minPrice: number;
  /** NaN when unknown. */
  leadTimeDays: number;
  minLeadTimeDays: number;
}

const clamp01 = (v: number): number => (v < 0 ? 0 : v > 1 ? 1 : v);

/** Writes the weighted terms into `out` (reused by the caller) and returns their sum. */
export function scoreCandidate(s: ScoreInputs, out?: ScoreTerms): number {
  const isolation = SCORE_WEIGHTS.isolation * clamp01(s.minIsolationDb / s.isolationDbTarget);
  const utilization = SCORE_WEIGHTS.utilization * (1 - Math.min(1, Math.abs(s.meanUtilization - PREFERRED_UTILIZATION) / UTILIZATION_SPAN));
  const level = SCORE_WEIGHTS.level * (s.meanDeflectionM > 0 ? 1 - Math.min(1, s.levelErrorM / s.meanDeflectionM) : 0);
  const price = SCORE_WEIGHTS.price * (s.price > 0 && s.minPrice > 0 ? clamp01(s.minPrice / s.price) : s.price === 0 ? 1 : 0);
  const leadTime =
    SCORE_WEIGHTS.leadTime *
    (s.leadTimeDays === 0 ? 1 : s.leadTimeDays > 0 && s.minLeadTimeDays >= 0 ? clamp01(s.minLeadTimeDays / s.leadTimeDays) : 0);
  if (out) {
    out.isolation = isolation;
    out.utilization = utilization;
    out.level = level;
    out.price = price;
    out.leadTime = leadTime;
  }
  return isolation + utilization + level + price + leadTime;
}
