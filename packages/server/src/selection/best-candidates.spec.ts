import { BestCandidates } from './best-candidates.js';

describe('BestCandidates', () => {
  it('keeps exactly the k best of a stream, best first (same as sorting everything)', () => {
    let seed = 3;
    const rnd = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
    const score = Array.from({ length: 5000 }, () => Math.round(rnd() * 500)); // many ties
    const better = (a: number, b: number) => score[a] > score[b] || (score[a] === score[b] && a < b);
    for (const k of [1, 7, 100, 6000]) {
      const best = new BestCandidates(k, better);
      score.forEach((_, i) => best.offer(i));
      const expected = score
        .map((_, i) => i)
        .sort((a, b) => (better(a, b) ? -1 : 1))
        .slice(0, k);
      expect(best.sorted()).toEqual(expected);
      expect(best.count).toBe(Math.min(k, score.length));
    }
  });

  it('keeps nothing with a capacity of 0', () => {
    const best = new BestCandidates(0, () => true);
    best.offer(1);
    expect(best.sorted()).toEqual([]);
  });
});
