import { describe, expect, it } from 'vitest';
import { expectRounded } from '../testing/expect-rounded.js';
import { STANDARD_GRAVITY } from '../units/constants.js';
import { levellingStiffness, selectSizesForLevelling } from './levelling.js';
import { mountLoads } from './mount-loads.js';

const W = 1000 * STANDARD_GRAVITY;
const CG = { x: 0.06, y: 0.015 };
const CORNERS = [
  { x: 0.8, y: 0.45 },
  { x: 0.8, y: -0.45 },
  { x: -0.8, y: 0.45 },
  { x: -0.8, y: -0.45 },
];

// Model: docs/engineering/mount-loads.md §8–§9; check values: docs/engineering/check-values.md.
describe('levelling', () => {
  it('CV-17 [CF]: δ₀ = 10 mm on the CV-15 loads → k_req = 2.717/2.554/2.350/2.186e5; re-solve gives 10.00 mm, β = 0', () => {
    const loads = mountLoads({ points: CORNERS, stiffnessNPerM: 2e5, weightN: W, cg: CG }).loadsN;
    const kReq = levellingStiffness(loads, 0.01);
    ['2.717', '2.554', '2.350', '2.186'].forEach((q, i) => expectRounded(kReq[i] / 1e5, q));
    const r = mountLoads({ points: CORNERS, stiffnessNPerM: kReq, weightN: W, cg: CG });
    r.deflectionsM.forEach((d) => expectRounded(d * 1000, '10.00'));
    expect(Math.abs(r.tiltX)).toBeLessThan(1e-12);
    expect(Math.abs(r.tiltY)).toBeLessThan(1e-12);
    expect(r.levelErrorM).toBeLessThan(1e-12);
  });

  it('picks per point the series size closest to the target deflection, re-solves and reports Δδ and tilts', () => {
    // invented series: stiffness rises with rated load
    const sizes = [
      { id: 'S-200', ratedLoadN: 2000, stiffnessNPerM: 1.9e5 },
      { id: 'S-250', ratedLoadN: 2500, stiffnessNPerM: 2.35e5 },
      { id: 'S-300', ratedLoadN: 3000, stiffnessNPerM: 2.8e5 },
    ];
    const r = selectSizesForLevelling({ points: CORNERS, weightN: W, cg: CG, sizes, targetDeflectionM: 0.01 });
    expect(r.converged).toBe(true);
    expect(r.sizeIndex).toEqual([2, 2, 1, 1]);
    expect(r.loadsN.reduce((a, b) => a + b)).toBeCloseTo(W, 8);
    expect(r.levelErrorM).toBeCloseTo(Math.max(...r.deflectionsM) - Math.min(...r.deflectionsM), 15);
    // better level than one size everywhere
    const single = mountLoads({ points: CORNERS, stiffnessNPerM: 2.35e5, weightN: W, cg: CG });
    expect(r.levelErrorM).toBeLessThan(single.levelErrorM);
    r.utilization.forEach((u, i) => expect(u).toBeCloseTo(r.loadsN[i] / sizes[r.sizeIndex[i]].ratedLoadN, 14));
    expect(r.warnings).toEqual([]);
  });

  it('flags an overloaded point when no size of the series carries its load', () => {
    const r = selectSizesForLevelling({
      points: CORNERS,
      weightN: W,
      cg: CG,
      sizes: [{ ratedLoadN: 2400, stiffnessNPerM: 2.4e5 }],
      targetDeflectionM: 0.01,
    });
    expect(r.warnings.filter((w) => w.code === 'mount-overloaded').map((w) => w.pointIndex)).toEqual([0, 1]);
  });

  it('rejects bad inputs', () => {
    expect(() => levellingStiffness([1, -1], 0.01)).toThrow(/loadsN\[1\]/);
    expect(() => levellingStiffness([1], 0)).toThrow(/targetDeflectionM/);
    expect(() => selectSizesForLevelling({ points: CORNERS, weightN: W, cg: CG, sizes: [], targetDeflectionM: 0.01 })).toThrow(/sizes/);
  });
});
