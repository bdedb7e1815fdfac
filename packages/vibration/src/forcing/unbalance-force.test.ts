import { describe, expect, it } from 'vitest';
import { expectRounded } from '../testing/expect-rounded.js';
import { unbalanceForce, unbalanceForceFromBalanceGrade } from './unbalance-force.js';
import { pressureThrust } from './pressure-thrust.js';

// Model: docs/engineering/forcing.md §5–§6; check values: docs/engineering/check-values.md.
describe('unbalance force', () => {
  it('CV-26 [CF; grade REC ISO 21940-11 from memory]: 50 kg rotor, G6.3, 1480 rpm → 48.82 N', () => {
    expectRounded(unbalanceForceFromBalanceGrade(50, 6.3, 1480), '48.82');
  });
  it('F = U·ω² agrees with the grade form when U = m·G/ω', () => {
    const w = (2 * Math.PI * 1480) / 60;
    expect(unbalanceForce((50 * 0.0063) / w, 1480)).toBeCloseTo(unbalanceForceFromBalanceGrade(50, 6.3, 1480), 10);
    expect(() => unbalanceForce(-1, 1480)).toThrow(/unbalanceKgM/);
  });
});

describe('pipe connector pressure thrust', () => {
  it('CV-27 [CF]: 10 bar on D_eff = 170 mm → 22.70 kN', () => {
    expectRounded(pressureThrust(10e5, 0.17) / 1000, '22.70');
    expect(() => pressureThrust(1e5, 0)).toThrow(/effectiveDiameterM/);
  });
});
