import { SCORE_WEIGHTS, scoreCandidate, type ScoreInputs } from './scoring.js';
import type { ScoreTerms } from './selection.types.js';

const ideal: ScoreInputs = {
  minIsolationDb: 25,
  isolationDbTarget: 20,
  meanUtilization: 0.8,
  levelErrorM: 0,
  meanDeflectionM: 0.025,
  price: 100,
  minPrice: 100,
  leadTimeDays: 10,
  minLeadTimeDays: 10,
};

describe('scoreCandidate (docs/engineering/selection.md §11)', () => {
  it('has weights that add up to 1, so a candidate best on every term scores 1', () => {
    expect(Object.values(SCORE_WEIGHTS).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 15);
    expect(scoreCandidate(ideal)).toBeCloseTo(1, 15);
  });

  it('returns each weighted term, adding up to the score', () => {
    const terms: ScoreTerms = { isolation: 0, utilization: 0, level: 0, price: 0, leadTime: 0 };
    const inputs = { ...ideal, minIsolationDb: 10, meanUtilization: 0.65, levelErrorM: 0.005, price: 200, leadTimeDays: 40 };
    const score = scoreCandidate(inputs, terms);
    expect(terms.isolation).toBeCloseTo(0.4 * (10 / 20), 15);
    expect(terms.utilization).toBeCloseTo(0.2 * (1 - 0.15 / 0.3), 15);
    expect(terms.level).toBeCloseTo(0.15 * (1 - 0.005 / 0.025), 15);
    expect(terms.price).toBeCloseTo(0.15 * (100 / 200), 15);
    expect(terms.leadTime).toBeCloseTo(0.1 * (10 / 40), 15);
    expect(score).toBeCloseTo(terms.isolation + terms.utilization + terms.level + terms.price + terms.leadTime, 15);
  });

  it('gives amplification, far-off utilisation, unknown price and unknown lead time nothing', () => {
    const terms: ScoreTerms = { isolation: 0, utilization: 0, level: 0, price: 0, leadTime: 0 };
    scoreCandidate(
      { ...ideal, minIsolationDb: -3, meanUtilization: 1.3, levelErrorM: 0.05, price: Number.NaN, leadTimeDays: Number.NaN },
      terms,
    );
    expect(terms).toEqual({ isolation: 0, utilization: 0, level: 0, price: 0, leadTime: 0 });
  });

  it('scores a lead time of 0 days in full', () => {
    const terms: ScoreTerms = { isolation: 0, utilization: 0, level: 0, price: 0, leadTime: 0 };
    scoreCandidate({ ...ideal, leadTimeDays: 0, minLeadTimeDays: 0 }, terms);
    expect(terms.leadTime).toBe(0.1);
  });
});
