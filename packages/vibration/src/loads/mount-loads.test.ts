import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { STANDARD_GRAVITY } from '../units/constants.js';
import { cornerMountLoads } from './corner-mount-loads.js';
import { mountLoads } from './mount-loads.js';

const W = 1000 * STANDARD_GRAVITY; // CV-14 assembly
const CG = { x: 0.06, y: 0.015 };
const CORNERS = [
  { x: 0.8, y: 0.45 },
  { x: 0.8, y: -0.45 },
  { x: -0.8, y: 0.45 },
  { x: -0.8, y: -0.45 },
];

// Model: docs/engineering/mount-loads.md §2–§7; check values: docs/engineering/check-values.md.
describe('loads on mounts under a rigid frame', () => {
  it('CV-15 [CF]: 4 equal mounts k = 2e5, a = 0.8, b = 0.45 — and not the lever-rule product', () => {
    const r = mountLoads({ points: CORNERS, stiffnessNPerM: 2e5, weightN: W, cg: CG });
    ['2717.3', '2553.8', '2349.5', '2186.1'].forEach((q, i) => expectRounded(r.loadsN[i], q));
    ['13.59', '12.77', '11.75', '10.93'].forEach((q, i) => expectRounded(r.deflectionsM[i] * 1000, q));
    expectRounded(r.deflectionAtOriginM * 1000, '12.26');
    expectRounded(r.tiltX, '1.149e-3');
    expectRounded(r.tiltY, '9.080e-4');
    expect(r.loadsN.reduce((a, b) => a + b)).toBeCloseTo(W, 9);
    const leverRule = [2723.4, 2547.7, 2343.4, 2192.2];
    r.loadsN.forEach((f, i) => expect(Math.abs(f - leverRule[i])).toBeGreaterThan(5));
    expect(r.warnings).toEqual([]);

    const closed = cornerMountLoads({ halfSpacingX: 0.8, halfSpacingY: 0.45, weightN: W, cgOffset: CG, stiffnessNPerM: 2e5 });
    closed.loadsN.forEach((f, i) => expect(f).toBeCloseTo(r.loadsN[i], 9));
    expect(closed.deflectionAtOriginM).toBeCloseTo(r.deflectionAtOriginM, 12);
    expect(closed.tiltX).toBeCloseTo(r.tiltX, 12);
    expect(closed.tiltY).toBeCloseTo(r.tiltY, 12);
    expect(closed.noLiftOff).toBe(true);
  });

  it('CV-16 [CF]: k = (3.0, 2.5, 2.5, 2.0)e5 → w = 9.898 mm, β = (−3.179e-4, −1.473e-3)', () => {
    const r = mountLoads({ points: CORNERS, stiffnessNPerM: [3e5, 2.5e5, 2.5e5, 2e5], weightN: W, cg: CG });
    expectRounded(r.deflectionAtOriginM * 1000, '9.898');
    expectRounded(r.tiltX, '-3.179e-4');
    expectRounded(r.tiltY, '-1.473e-3');
    ['2694.3', '2576.7', '2372.4', '2163.1'].forEach((q, i) => expectRounded(r.loadsN[i], q));
    ['8.981', '10.31', '9.490', '10.82'].forEach((q, i) => expectRounded(r.deflectionsM[i] * 1000, q));
    const mx = r.loadsN.reduce((s, f, i) => s + f * CORNERS[i].x, 0) / W;
    const my = r.loadsN.reduce((s, f, i) => s + f * CORNERS[i].y, 0) / W;
    expectRounded(mx, '0.0600');
    expectRounded(my, '0.0150');
  });

  it('CV-18 [CF]: 6 equal mounts, and 3 mounts (loads independent of k)', () => {
    const six = [0.8, 0, -0.8].flatMap((x) => [
      { x, y: 0.45 },
      { x, y: -0.45 },
    ]);
    const r6 = mountLoads({ points: six, stiffnessNPerM: 1e5, weightN: W, cg: CG });
    ['1872.8', '1763.8', '1688.9', '1580.0', '1505.0', '1396.1'].forEach((q, i) => expectRounded(r6.loadsN[i], q));

    const three = [
      { x: 0.8, y: 0 },
      { x: -0.8, y: 0.45 },
      { x: -0.8, y: -0.45 },
    ];
    for (const k of [1e5, [1e5, 7e5, 3e5]]) {
      const r3 = mountLoads({ points: three, stiffnessNPerM: k, weightN: W, cg: CG });
      expectRounded(r3.loadsN[0], '5271.1');
      expectRounded(r3.loadsN[1], '2431.2');
      expectRounded(r3.loadsN[2], '2104.3');
    }
  });

  it('warns when the CG is outside the mount polygon and when a point would lift', () => {
    const r = mountLoads({ points: CORNERS, stiffnessNPerM: 2e5, weightN: W, cg: { x: 1.0, y: 0 } });
    expect(r.warnings.map((w) => w.code)).toEqual(['cg-outside-mount-polygon', 'mount-lift-off', 'mount-lift-off']);
    expect(r.warnings[1].pointIndex).toBe(2);
    expect(r.loadsN[2]).toBeLessThan(0);
    // inside the polygon but beyond the no-lift-off diamond |e_x|/a + |e_y|/b < 1
    const r2 = mountLoads({ points: CORNERS, stiffnessNPerM: 2e5, weightN: W, cg: { x: 0.6, y: 0.3 } });
    expect(r2.warnings.map((w) => w.code)).toEqual(['mount-lift-off']);
    expect(cornerMountLoads({ halfSpacingX: 0.8, halfSpacingY: 0.45, weightN: W, cgOffset: { x: 0.6, y: 0.3 } }).noLiftOff).toBe(false);
  });

  it('rejects fewer than 3 mounts, collinear or coincident mounts, and bad stiffness lists', () => {
    const err = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return e as VibrationInputError;
      }
      throw new Error('expected a throw');
    };
    const few = err(() => mountLoads({ points: CORNERS.slice(0, 2), stiffnessNPerM: 1, weightN: W, cg: CG }));
    expect(few).toBeInstanceOf(VibrationInputError);
    expect(few.code).toBe('too-few-mounts');
    const line = [0, 0.5, 1, 1.5].map((x) => ({ x, y: 2 * x + 1 }));
    expect(err(() => mountLoads({ points: line, stiffnessNPerM: 1, weightN: W, cg: CG })).code).toBe('collinear-mounts');
    const same = [0, 0, 0].map(() => ({ x: 1, y: 1 }));
    expect(err(() => mountLoads({ points: same, stiffnessNPerM: 1, weightN: W, cg: CG })).code).toBe('collinear-mounts');
    expect(() => mountLoads({ points: CORNERS, stiffnessNPerM: [1, 2, 3], weightN: W, cg: CG })).toThrow(/stiffnessNPerM/);
    expect(() => mountLoads({ points: CORNERS, stiffnessNPerM: [1, 2, 0, 3], weightN: W, cg: CG })).toThrow(/stiffnessNPerM\[2\]/);
    expect(() => mountLoads({ points: CORNERS, stiffnessNPerM: 1, weightN: 0, cg: CG })).toThrow(/weightN/);
    expect(() => mountLoads({ points: CORNERS, stiffnessNPerM: 1, weightN: W, cg: { x: Number.NaN, y: 0 } })).toThrow(/cg.x/);
  });
});
