/**
 * Facts of the trade. Marked "common practice" where they are practice rather than physics; the
 * numbers themselves follow from the undamped closed form r = √(1 + 1/(1 − E)).
 */
import { describe, expect, it } from 'vitest';
import {
  hystereticDamping,
  isolationDb,
  isolationEfficiencyPct,
  requiredFrequencyRatio,
  roundsTo,
  transmissibility,
  viscousDamping,
} from './vibration.js';

describe('trade facts', () => {
  it('isolation begins above √2·fn: T > 1 below, T < 1 above, for any damping [CF; common practice wording]', () => {
    for (const d of [undefined, viscousDamping(0.02), viscousDamping(0.3), hystereticDamping(0.1), hystereticDamping(0.6)]) {
      expect(transmissibility(Math.SQRT2 * 0.98, d)).toBeGreaterThan(1);
      expect(transmissibility(Math.SQRT2 * 1.02, d)).toBeLessThan(1);
    }
  });

  it('80–95 % isolation targets need r ≈ 2.45–4.58 with the undamped model (common practice targets)', () => {
    expect(roundsTo(requiredFrequencyRatio(80), '2.45')).toBe(true);
    expect(roundsTo(requiredFrequencyRatio(90), '3.32')).toBe(true);
    expect(roundsTo(requiredFrequencyRatio(95), '4.58')).toBe(true);
  });

  it('the common default r ≥ 3 gives 87.5 % and 18.1 dB undamped (common practice)', () => {
    const t = transmissibility(3);
    expect(isolationEfficiencyPct(t)).toBeCloseTo(87.5, 10);
    expect(roundsTo(isolationDb(t), '18.1')).toBe(true);
  });

  it('elastomer (hysteretic) damping costs little isolation above √2, heavy viscous damping costs a lot [CF]', () => {
    const undamped = transmissibility(5);
    expect(transmissibility(5, hystereticDamping(0.2)) / undamped).toBeLessThan(1.03);
    expect(transmissibility(5, viscousDamping(0.3)) / undamped).toBeGreaterThan(2);
  });
});
