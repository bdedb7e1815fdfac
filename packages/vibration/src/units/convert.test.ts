import { describe, expect, it } from 'vitest';
import {
  KG_PER_LB,
  M_PER_IN,
  N_PER_LBF,
  N_PER_M_PER_LBF_PER_IN,
  STANDARD_GRAVITY,
  cToF,
  fToC,
  fromDisplay,
  hzToCpm,
  inToM,
  kgToLb,
  lbToKg,
  lbfPerInToNPerM,
  lbfToN,
  mToIn,
  nPerMToLbfPerIn,
  nToLbf,
  rpmToHz,
  toDisplay,
  unitLabel,
} from './index.js';

// Source: NIST SP 811 (2008), Appendix B — exact definitions of lb, in, lbf; g_n exact (CGPM 1901).
describe('conversion constants (NIST SP 811)', () => {
  it('uses the exact defined values', () => {
    expect(KG_PER_LB).toBe(0.45359237);
    expect(M_PER_IN).toBe(0.0254);
    expect(N_PER_LBF).toBe(4.4482216152605);
    expect(STANDARD_GRAVITY).toBe(9.80665);
  });

  it('lbf equals lb × standard gravity', () => {
    expect(KG_PER_LB * STANDARD_GRAVITY).toBeCloseTo(N_PER_LBF, 12);
  });

  it('1 lbf/in = 175.1268 N/m (NIST SP 811 table value 1.751268 E+02)', () => {
    expect(N_PER_M_PER_LBF_PER_IN).toBeCloseTo(175.1268, 4);
  });
});

describe('conversions', () => {
  it('mass', () => {
    expect(lbToKg(1)).toBe(0.45359237);
    expect(kgToLb(0.45359237)).toBeCloseTo(1, 12);
    expect(kgToLb(1000)).toBeCloseTo(2204.6226, 4);
  });

  it('force', () => {
    expect(lbfToN(1)).toBe(4.4482216152605);
    expect(nToLbf(4448.2216152605)).toBeCloseTo(1000, 9);
  });

  it('length', () => {
    expect(inToM(1)).toBe(0.0254);
    expect(mToIn(1)).toBeCloseTo(39.370079, 6);
  });

  it('stiffness', () => {
    expect(lbfPerInToNPerM(1000)).toBeCloseTo(175126.8, 1);
    expect(nPerMToLbfPerIn(lbfPerInToNPerM(123.4))).toBeCloseTo(123.4, 10);
  });

  it('frequency and speed', () => {
    expect(rpmToHz(1480)).toBeCloseTo(24.6667, 4);
    expect(hzToCpm(3.1273)).toBeCloseTo(187.64, 2);
  });

  it('temperature', () => {
    expect(cToF(100)).toBe(212);
    expect(cToF(-40)).toBe(-40);
    expect(fToC(32)).toBe(0);
  });
});

describe('display units', () => {
  it('labels units per system', () => {
    expect(unitLabel('stiffness', 'SI')).toBe('N/mm');
    expect(unitLabel('stiffness', 'US')).toBe('lbf/in');
    expect(unitLabel('deflection', 'SI')).toBe('mm');
    expect(unitLabel('mass', 'US')).toBe('lb');
  });

  it('converts SI values for display and back', () => {
    expect(toDisplay('deflection', 0.0254, 'US')).toBeCloseTo(1, 12);
    expect(toDisplay('deflection', 0.0254, 'SI')).toBeCloseTo(25.4, 12);
    expect(toDisplay('stiffness', 2.0e5, 'SI')).toBe(200);
    expect(fromDisplay('mass', 2204.62262, 'US')).toBeCloseTo(1000, 4);
    for (const q of ['mass', 'force', 'position', 'deflection', 'stiffness', 'speed', 'temperature'] as const) {
      expect(fromDisplay(q, toDisplay(q, 12.5, 'US'), 'US')).toBeCloseTo(12.5, 10);
    }
  });
});
