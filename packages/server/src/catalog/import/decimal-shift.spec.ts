import { lbfToN, nPerMmToNPerM } from '@tacet/vibration';
import { shiftDecimal } from './decimal-shift.js';

describe('shiftDecimal', () => {
  it.each<[string, number, string]>([
    ['72.5', 3, '72500'],
    ['72500', -3, '72.5'],
    ['0.5', 3, '500'],
    ['1', -3, '0.001'],
    ['-1.25', 1, '-12.5'],
    ['.5', 0, '0.5'],
    ['5.', 0, '5'],
    ['1.5e3', 3, '1500000'],
    ['1e-7', 3, '0.0001'],
    ['1e+21', -3, '1000000000000000000'],
    ['-0.000', 3, '0'],
    ['+42', -1, '4.2'],
  ])('%s × 10^%d = %s', (text, places, expected) => {
    expect(shiftDecimal(text, places)).toBe(expected);
  });

  it('refuses what is not a decimal number', () => {
    expect(() => shiftDecimal('abc', 3)).toThrow('Not a decimal number');
    expect(() => shiftDecimal('.', 3)).toThrow('Not a decimal number');
  });

  it('round-trips every double exactly (N/m → N/mm text → N/m), unlike x / 1000 * 1000', () => {
    let naiveLosses = 0;
    for (let i = 1; i <= 5000; i++) {
      // Stiffnesses as US columns store them (lbf/in × 175.1268… N/m), and a spread of others.
      for (const stored of [lbfToN(i * 1.37) / 0.0254, i * 0.1 + 1e-9 * i, Math.PI * 10 ** ((i % 20) - 8)]) {
        const text = shiftDecimal(String(stored), -3);
        expect(Number(shiftDecimal(text, 3))).toBe(stored);
        if (nPerMmToNPerM(stored / 1000) !== stored) naiveLosses++;
      }
    }
    expect(naiveLosses).toBeGreaterThan(0); // so the exact shift matters
  });
});
