import { describe, expect, it } from 'vitest';
import { convexHull, isInsideConvexHull } from './convex-hull.js';
import { IDENTITY3, rotationAboutAxis, requireRotation } from './vector.js';

describe('convex hull', () => {
  const square = [
    { x: 1, y: 1 },
    { x: 1, y: -1 },
    { x: -1, y: 1 },
    { x: -1, y: -1 },
    { x: 0, y: 0 },
    { x: 1, y: 0 },
  ];
  it('keeps only the corners, counter-clockwise', () => {
    const hull = convexHull(square);
    expect(hull.sort()).toEqual([0, 1, 2, 3]);
  });
  it('tells inside from outside and on-edge', () => {
    expect(isInsideConvexHull({ x: 0.9, y: 0.9 }, square)).toBe(true);
    expect(isInsideConvexHull({ x: 1.1, y: 0 }, square)).toBe(false);
    expect(isInsideConvexHull({ x: 1, y: 0.5 }, square)).toBe(false);
    expect(isInsideConvexHull({ x: 0, y: 0 }, square.slice(0, 2))).toBe(false);
  });
});

describe('rotations', () => {
  it('R_z(90°) turns x into y; rotations pass the orthonormality check', () => {
    const r = rotationAboutAxis('z', Math.PI / 2);
    expect(r[1][0]).toBeCloseTo(1, 15);
    expect(r[0][0]).toBeCloseTo(0, 15);
    for (const axis of ['x', 'y', 'z'] as const) expect(() => requireRotation('r', rotationAboutAxis(axis, 0.3))).not.toThrow();
    expect(() => requireRotation('r', IDENTITY3)).not.toThrow();
    expect(() =>
      requireRotation('r', [
        [2, 0, 0],
        [0, 1, 0],
        [0, 0, 1],
      ]),
    ).toThrow(/orthonormal/);
    expect(() =>
      requireRotation('r', [
        [-1, 0, 0],
        [0, 1, 0],
        [0, 0, 1],
      ]),
    ).toThrow(/proper rotation/);
  });
});
