import { describe, expect, it } from 'vitest';
import { rotationAboutAxis } from '../geometry/vector.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { degToRad } from '../units/convert.js';
import { mountStiffnessMatrix } from './mount-stiffness.js';

// Model: docs/engineering/rigid-body-modes.md §3; check values: docs/engineering/check-values.md.
describe('mount stiffness in body axes', () => {
  it('CV-19 [CF]: local (1, 2, 3)e5 N/m turned by R_z(45°) → k_xx = k_yy = 1.5e5, k_xy = −5.0e4, k_zz = 3.0e5', () => {
    const k = mountStiffnessMatrix({ x: 1e5, y: 2e5, z: 3e5 }, rotationAboutAxis('z', degToRad(45)));
    expectRounded(k[0][0], '1.5e5');
    expectRounded(k[1][1], '1.5e5');
    expectRounded(k[0][1], '-5.0e4');
    expectRounded(k[1][0], '-5.0e4');
    expectRounded(k[2][2], '3.0e5');
    expect(Math.abs(k[0][2]) + Math.abs(k[1][2])).toBeLessThan(1e-9);
  });
  it('without orientation the matrix is diagonal; negative stiffness is refused', () => {
    expect(mountStiffnessMatrix({ x: 1, y: 2, z: 3 })).toEqual([
      [1, 0, 0],
      [0, 2, 0],
      [0, 0, 3],
    ]);
    expect(() => mountStiffnessMatrix({ x: -1, y: 2, z: 3 })).toThrow(/stiffness.x/);
  });
});
