import { describe, expect, it } from 'vitest';
import { expectRounded } from '../testing/expect-rounded.js';
import { coilSpringSurgeFrequencyHz } from './spring-surge.js';

// Model: docs/engineering/sdof.md §8; check values: docs/engineering/check-values.md.
describe('coil spring surge frequency', () => {
  it('CV-29 [REC: Shigley, from memory]: k = 2e5 N/m, m_s = 0.5 kg → 316.2 Hz', () => {
    expectRounded(coilSpringSurgeFrequencyHz(2e5, 0.5), '316.2');
  });
  it('rejects a zero coil mass', () => {
    expect(() => coilSpringSurgeFrequencyHz(2e5, 0)).toThrow(/activeCoilMassKg/);
  });
});
