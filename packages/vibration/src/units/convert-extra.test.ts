import { describe, expect, it } from 'vitest';
import {
  MM_PER_IN,
  W_PER_HP,
  degToRad,
  hpToKw,
  inToMm,
  kgfPerMmToNPerM,
  kgfToN,
  kwToHp,
  lbfPerInToNPerMm,
  mmToIn,
  nPerMToKgfPerMm,
  nPerMmToLbfPerIn,
  nToKgf,
  radToDeg,
} from './index.js';

// Source: NIST SP 811 (2008), Appendix B; kgf = kg × g_n (exact), hp = 550 ft·lbf/s.
describe('additional conversions (NIST SP 811)', () => {
  it('kgf ↔ N uses standard gravity exactly', () => {
    expect(kgfToN(1)).toBe(9.80665);
    expect(nToKgf(9806.65)).toBeCloseTo(1000, 10);
  });

  it('mm ↔ in (1 in = 25.4 mm exactly)', () => {
    expect(MM_PER_IN).toBe(25.4);
    expect(inToMm(1)).toBe(25.4);
    expect(mmToIn(25)).toBeCloseTo(0.984252, 6);
  });

  it('N/mm ↔ lbf/in (1 lbf/in = 0.1751268 N/mm)', () => {
    expect(lbfPerInToNPerMm(1)).toBeCloseTo(0.1751268, 7);
    expect(nPerMmToLbfPerIn(200)).toBeCloseTo(1142.03, 2);
    expect(lbfPerInToNPerMm(nPerMmToLbfPerIn(37.5))).toBeCloseTo(37.5, 10);
  });

  it('kgf/mm ↔ N/m', () => {
    expect(kgfPerMmToNPerM(1)).toBeCloseTo(9806.65, 9);
    expect(nPerMToKgfPerMm(kgfPerMmToNPerM(12.3))).toBeCloseTo(12.3, 10);
  });

  it('hp ↔ kW (NIST SP 811: 1 hp = 7.456999 E+02 W)', () => {
    expect(W_PER_HP).toBeCloseTo(745.6999, 4);
    expect(hpToKw(1)).toBeCloseTo(0.7457, 4);
    expect(kwToHp(hpToKw(15))).toBeCloseTo(15, 10);
  });

  it('degrees ↔ radians', () => {
    expect(degToRad(180)).toBe(Math.PI);
    expect(radToDeg(Math.PI / 4)).toBeCloseTo(45, 12);
  });
});
