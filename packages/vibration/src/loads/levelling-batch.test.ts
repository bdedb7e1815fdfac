import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY } from '../units/constants.js';
import { selectSizesForLevelling } from './levelling.js';
import { createLevellingWorkspace, selectSizesForLevellingInto } from './levelling-batch.js';
import { mountLoads } from './mount-loads.js';
import { prepareMountLayout } from './mount-loads-batch.js';

const W = 1000 * STANDARD_GRAVITY;
const CG = { x: 0.06, y: 0.015 };
const CORNERS = [
  { x: 0.8, y: 0.45 },
  { x: 0.8, y: -0.45 },
  { x: -0.8, y: 0.45 },
  { x: -0.8, y: -0.45 },
];

// Model: docs/engineering/mount-loads.md §9; check values: docs/engineering/check-values.md.
describe('selectSizesForLevellingInto', () => {
  it('gives exactly what selectSizesForLevelling gives, for many invented series in one shared buffer', () => {
    const points = [...CORNERS, { x: 0, y: 0.45 }, { x: 0.1, y: -0.45 }];
    const layout = prepareMountLayout(points);
    const equal = new Float64Array(mountLoads({ points, stiffnessNPerM: 1, weightN: W, cg: CG }).loadsN);
    const ws = createLevellingWorkspace(layout);
    let seed = 7;
    const rnd = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
    // 40 series of 1–6 sizes each, back to back in one pair of arrays (with a 2-entry gap in front)
    const rated: number[] = [0, 0];
    const k: number[] = [0, 0];
    const ranges: [number, number][] = [];
    for (let s = 0; s < 40; s++) {
      const from = rated.length;
      const sizes = 1 + Math.floor(rnd() * 6);
      const deflection = 0.004 + rnd() * 0.03;
      for (let z = 0, load = 800 + rnd() * 1200; z < sizes; z++, load *= 1.25 + rnd() * 0.3) {
        rated.push(load);
        k.push(load / (deflection * (0.92 + rnd() * 0.16)));
      }
      ranges.push([from, rated.length]);
    }
    const ratedArr = new Float64Array(rated);
    const kArr = new Float64Array(k);
    for (const [from, to] of ranges) {
      const target = 0.002 + rnd() * 0.03;
      selectSizesForLevellingInto(layout, W, CG.x, CG.y, equal, ratedArr, kArr, from, to, target, ws);
      const reference = selectSizesForLevelling({
        points,
        weightN: W,
        cg: CG,
        sizes: rated.slice(from, to).map((p, i) => ({ ratedLoadN: p, stiffnessNPerM: k[from + i] })),
        targetDeflectionM: target,
      });
      expect(Array.from(ws.sizeIndex, (s) => s - from)).toEqual(reference.sizeIndex);
      reference.loadsN.forEach((f, i) => expect(ws.loadsN[i]).toBeCloseTo(f, 8));
      reference.deflectionsM.forEach((d, i) => expect(ws.deflectionsM[i]).toBeCloseTo(d, 12));
      expect(ws.levelErrorM).toBeCloseTo(reference.levelErrorM, 12);
      expect(ws.iterations).toBe(reference.iterations);
      expect(ws.converged).toBe(reference.converged);
    }
  });

  it('CV-17 [CF]: sizes with k = F_i/δ₀ for the CV-15 loads level the frame at δ₀ = 10 mm', () => {
    const layout = prepareMountLayout(CORNERS);
    const equal = new Float64Array(mountLoads({ points: CORNERS, stiffnessNPerM: 2e5, weightN: W, cg: CG }).loadsN);
    // CV-17: k_req = 2.717 / 2.554 / 2.350 / 2.186 ×10⁵ N/m (exact values F_i/δ₀)
    const k = new Float64Array(Array.from(equal, (f) => f / 0.01));
    const rated = new Float64Array(4).fill(3000);
    const ws = createLevellingWorkspace(layout);
    selectSizesForLevellingInto(layout, W, CG.x, CG.y, equal, rated, k, 0, 4, 0.01, ws);
    expect(Array.from(ws.sizeIndex)).toEqual([0, 1, 2, 3]);
    ws.deflectionsM.forEach((d) => expect(d * 1000).toBeCloseTo(10, 9));
    expect(ws.levelErrorM).toBeLessThan(1e-12);
    expect(ws.converged).toBe(true);
  });

  it('rejects an empty or out-of-range size range, a foreign workspace and bad sizes', () => {
    const layout = prepareMountLayout(CORNERS);
    const equal = new Float64Array(4).fill(W / 4);
    const ws = createLevellingWorkspace(layout);
    const one = new Float64Array([2000]);
    expect(() => selectSizesForLevellingInto(layout, W, 0, 0, equal, one, one, 0, 0, 0.01, ws)).toThrow(/from/);
    expect(() => selectSizesForLevellingInto(layout, W, 0, 0, equal, one, one, 0, 2, 0.01, ws)).toThrow(/from/);
    expect(() => selectSizesForLevellingInto(layout, W, 0, 0, equal, one, one, 0, 1, 0, ws)).toThrow(/targetDeflectionM/);
    expect(() => selectSizesForLevellingInto(layout, W, 0, 0, equal, one, new Float64Array([0]), 0, 1, 0.01, ws)).toThrow(
      /stiffnessNPerM\[0\]/,
    );
    const other = createLevellingWorkspace(prepareMountLayout(CORNERS.slice(0, 3)));
    expect(() => selectSizesForLevellingInto(layout, W, 0, 0, equal, one, one, 0, 1, 0.01, other)).toThrow(/workspace/);
  });
});
