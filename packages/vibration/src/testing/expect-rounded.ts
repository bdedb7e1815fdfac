/**
 * Test helper (excluded from the build): asserts that `actual` rounds to a value quoted in
 * docs/engineering/check-values.md or a textbook, to the precision the quote carries. `'7.792e-6'` accepts
 * |actual − 7.792e-6| ≤ 0.5e-9 (half a unit in the last quoted digit), plus `slackUnits` extra
 * units of the last digit where the source rounded its intermediate values.
 */
import { expect } from 'vitest';

export function halfUnit(quoted: string): number {
  const m = /^[-+]?(\d*)(?:\.(\d+))?(?:e([-+]?\d+))?$/i.exec(quoted.trim());
  if (!m) throw new Error(`not a number: ${quoted}`);
  const decimals = m[2] ? m[2].length : 0;
  const exp = m[3] ? Number(m[3]) : 0;
  return 0.5 * 10 ** (exp - decimals);
}

export function expectRounded(actual: number, quoted: string, slackUnits = 0): void {
  const expected = Number(quoted);
  const tol = halfUnit(quoted) * (1 + 2 * slackUnits) * (1 + 1e-9);
  expect(Number.isFinite(actual), `finite, got ${actual}`).toBe(true);
  if (Math.abs(actual - expected) > tol) {
    throw new Error(`expected ${actual} to round to ${quoted} (±${tol.toExponential(2)})`);
  }
}
