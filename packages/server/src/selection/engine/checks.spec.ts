import { DETAIL_FAILS, FAIL } from './checks.js';
import { REASONS } from './reasons.js';

/** The fail mask's bookkeeping: every check has its own bit, fits its array, and has words. */
describe('FAIL bits', () => {
  const bits = Object.values(FAIL);

  it('are distinct single bits that fit the Uint16 fail mask', () => {
    for (const bit of bits) expect(bit & (bit - 1)).toBe(0);
    expect(new Set(bits).size).toBe(bits.length);
    expect(Math.max(...bits)).toBeLessThan(2 ** 16);
  });

  it('row checks (supplier, and the detail checks: temperature, type) fit the Uint8 row mask', () => {
    expect(DETAIL_FAILS).toBe(FAIL.temperature | FAIL.type);
    expect(FAIL.supplier | DETAIL_FAILS).toBeLessThan(2 ** 8);
  });

  it('each have exactly one row of words in reasons.ts', () => {
    expect(REASONS.map(([bit]) => bit).sort((a, b) => a - b)).toEqual([...bits].sort((a, b) => a - b));
  });
});
