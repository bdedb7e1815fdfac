import { describe, expect, it } from 'vitest';
import { expectRounded } from '../testing/expect-rounded.js';
import { rockingStabilityCheck } from './rocking-stability.js';

// Model: docs/engineering/rigid-body-modes.md §9; check values: docs/engineering/check-values.md.
describe('rocking stability with a high CG', () => {
  it('CV-28 [CF, approximate]: h = 0.4 m, δ = 9.807 mm → h·δ = 3.923e-3 m² < b² = 0.16 → stable', () => {
    const r = rockingStabilityCheck({ cgHeightM: 0.4, staticDeflectionM: 9806.65 / 1.0e6, halfSpacingX: 0.9, halfSpacingY: 0.4 });
    expectRounded(r.heightTimesDeflection, '3.923e-3');
    expect(r.stable).toBe(true);
    expect(r.marginRoll).toBeCloseTo(0.16 / r.heightTimesDeflection, 12);
  });
  it('a narrow base under a tall machine on soft mounts is unstable', () => {
    const r = rockingStabilityCheck({ cgHeightM: 2, staticDeflectionM: 0.05, halfSpacingX: 0.6, halfSpacingY: 0.25 });
    expect(r.stable).toBe(false);
    expect(r.marginRoll).toBeLessThan(1);
  });
});
