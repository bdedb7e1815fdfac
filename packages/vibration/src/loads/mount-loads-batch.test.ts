import { describe, expect, it } from 'vitest';
import { mountLoads } from './mount-loads.js';
import { mountLoadsBatch, prepareMountLayout } from './mount-loads-batch.js';

describe('mountLoadsBatch', () => {
  const points = [
    { x: 0.9, y: 0.5 },
    { x: 0.9, y: -0.4 },
    { x: -0.7, y: 0.45 },
    { x: -0.8, y: -0.45 },
    { x: 0.1, y: 0.6 },
  ];
  it('gives the same loads as mountLoads for every candidate', () => {
    const layout = prepareMountLayout(points);
    const candidates = 20;
    const k = new Float64Array(candidates * 5);
    for (let i = 0; i < k.length; i++) k[i] = 1e5 + ((i * 7919) % 101) * 3e3;
    const out = new Float64Array(k.length);
    const sum = new Float64Array(candidates);
    mountLoadsBatch(layout, 12000, 0.05, -0.02, k, out, sum);
    for (let c = 0; c < candidates; c++) {
      const single = mountLoads({
        points,
        stiffnessNPerM: Array.from(k.subarray(c * 5, c * 5 + 5)),
        weightN: 12000,
        cg: { x: 0.05, y: -0.02 },
      });
      single.loadsN.forEach((f, i) => expect(out[c * 5 + i]).toBeCloseTo(f, 8));
      expect(sum[c]).toBeCloseTo(
        k.subarray(c * 5, c * 5 + 5).reduce((a, b) => a + b),
        6,
      );
    }
  });
  it('rejects ragged stiffness arrays and non-positive stiffness', () => {
    const layout = prepareMountLayout(points);
    expect(() => mountLoadsBatch(layout, 1, 0, 0, new Float64Array(7), new Float64Array(7))).toThrow(/multiple of 5/);
    expect(() => mountLoadsBatch(layout, 1, 0, 0, new Float64Array(5), new Float64Array(5))).toThrow(/stiffnessNPerM\[0\]/);
    expect(() => mountLoadsBatch(layout, 1, 0, 0, new Float64Array(5).fill(1), new Float64Array(4))).toThrow(/outLoadsN/);
    expect(() => mountLoadsBatch(layout, 1, 0, 0, new Float64Array(10).fill(1), new Float64Array(10), new Float64Array(1))).toThrow(
      /outTotalStiffnessNPerM/,
    );
  });
});
