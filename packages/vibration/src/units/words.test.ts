import { describe, expect, it } from 'vitest';
import { exportNumber, formatDecimal, formatMeasure, significantDecimals, withoutBinaryNoise } from './index.js';

// Conversion facts: NIST SP 811 (2008), Appendix B — 1 in = 25.4 mm, 1 lb = 0.45359237 kg,
// 1 lbf = 4.4482216152605 N (all exact); °F = °C × 1.8 + 32 (definition of the Fahrenheit scale).
describe('formatMeasure: figures in sentences follow the reader', () => {
  it('metric: deflection in mm, force in N, temperature in °C, stiffness in N/mm, mass in kg', () => {
    expect(formatMeasure('deflection', 0.0066, 'SI')).toBe('6.6 mm');
    expect(formatMeasure('force', 1779.2886461041999, 'SI')).toBe('1779 N');
    expect(formatMeasure('temperature', 100, 'SI')).toBe('100 °C');
    expect(formatMeasure('stiffness', 72_500, 'SI')).toBe('72.5 N/mm');
    expect(formatMeasure('mass', 1250, 'SI')).toBe('1250 kg');
    expect(formatMeasure('position', 0.4, 'SI')).toBe('0.4 m');
  });

  it('US customary: inches, lbf, °F, lbf/in, lb', () => {
    expect(formatMeasure('deflection', 0.0066, 'US')).toBe('0.26 in'); // 6.6 / 25.4 = 0.2598
    expect(formatMeasure('deflection', 0.0254, 'US')).toBe('1 in');
    expect(formatMeasure('force', 400 * 4.4482216152605, 'US')).toBe('400 lbf');
    expect(formatMeasure('force', 1000, 'US')).toBe('225 lbf'); // 224.81
    expect(formatMeasure('temperature', 100, 'US')).toBe('212 °F');
    expect(formatMeasure('temperature', -40, 'US')).toBe('-40 °F'); // the scales meet at −40
    expect(formatMeasure('stiffness', 175_126.835_246_476_4, 'US')).toBe('1000 lbf/in'); // 4.4482216152605 N / 0.0254 m
    expect(formatMeasure('mass', 453.59237, 'US')).toBe('1000 lb');
    expect(formatMeasure('position', 0.0254 * 12, 'US')).toBe('12 in');
  });

  it('frequency and speed read the same in both systems', () => {
    expect(formatMeasure('frequency', 24.6667, 'US')).toBe('24.67 Hz');
    expect(formatMeasure('speed', 24.6667, 'SI')).toBe('1480 rpm');
  });

  it('a precision can be asked for, and zero never reads "-0"', () => {
    expect(formatMeasure('deflection', 0.006_63, 'US', 3)).toBe('0.261 in');
    expect(formatDecimal(-0.0004, 2)).toBe('0');
    expect(formatDecimal(2.5, 0)).toBe('3');
  });

  it("or significant digits, counted in the reader's unit, with at least one decimal", () => {
    // 1 in = 25.4 mm exactly (NIST SP 811, Appendix B): 0.08 mm = 0.00315 in, 7.44 mm = 0.293 in
    expect(formatMeasure('deflection', 0.000_08, 'SI', { significant: 2 })).toBe('0.08 mm');
    expect(formatMeasure('deflection', 0.000_08, 'US', { significant: 2 })).toBe('0.0031 in');
    expect(formatMeasure('deflection', 0.007_44, 'US', { significant: 2 })).toBe('0.29 in');
    expect(formatMeasure('deflection', 0.123_4, 'SI', { significant: 2 })).toBe('123.4 mm');
    expect(formatMeasure('deflection', 0, 'SI', { significant: 2 })).toBe('0 mm');
  });

  it('significantDecimals: the decimals that show that many significant digits', () => {
    expect(significantDecimals(0.0812, 2)).toBe(3);
    expect(significantDecimals(7.44, 2)).toBe(1);
    expect(significantDecimals(7.44, 2, 0)).toBe(1);
    expect(significantDecimals(74.4, 2, 0)).toBe(0);
    expect(significantDecimals(-0.0812, 2)).toBe(3);
    expect(significantDecimals(0, 2)).toBe(1);
    expect(significantDecimals(Number.NaN, 2)).toBe(1);
  });
});

describe('exportNumber: no binary noise in files', () => {
  it('writes the shortest decimal within 15 significant digits', () => {
    expect(String(400 * 4.4482216152605)).toBe('1779.2886461041999'); // the noise this removes
    expect(exportNumber(400 * 4.4482216152605)).toBe('1779.2886461042'); // the exact decimal product
    expect(exportNumber(0.1 + 0.2)).toBe('0.3');
    expect(exportNumber(72_500)).toBe('72500');
    expect(exportNumber(-40)).toBe('-40');
    expect(exportNumber(0)).toBe('0');
    expect(exportNumber(Number.NaN)).toBe('');
  });

  it('keeps every real digit of a value that has no noise', () => {
    for (const v of [1 / 3, Math.PI, 123_456.789_012_345, 0.008, 1e-9])
      expect(Math.abs(Number(exportNumber(v)) - v)).toBeLessThanOrEqual(Math.abs(v) * 1e-15);
    expect(withoutBinaryNoise(1.1 * 3)).toBe(3.3);
  });
});
