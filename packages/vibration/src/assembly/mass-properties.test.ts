import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { rotationAboutAxis } from '../geometry/vector.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { type AssemblyComponent, boxInertia, cylinderInertia, massProperties } from './mass-properties.js';

const CV14: AssemblyComponent[] = [
  { name: 'pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 } },
  { name: 'motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
  { name: 'frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 } },
];

// Model: docs/engineering/mass-properties.md §2–§4; check values: docs/engineering/check-values.md.
describe('mass properties of an assembly', () => {
  it('CV-14 [CF]: pump + motor + frame as point masses', () => {
    const p = massProperties(CV14);
    expect(p.massKg).toBe(1000);
    expectRounded(p.weightN, '9806.65');
    expectRounded(p.cg.x, '0.0600');
    expectRounded(p.cg.y, '0.0150');
    expectRounded(p.cg.z, '0.3775');
    expectRounded(p.inertia.xx, '26.64375');
    expectRounded(p.inertia.yy, '189.8');
    expectRounded(p.inertia.zz, '164.2');
    expectRounded(p.inertia.xy, '-8.850');
    expectRounded(p.inertia.xz, '-14.10');
    expectRounded(p.inertia.yz, '-1.8375');
  });

  it('CV-31 [CF]: uniform box 1000 kg, 2.0 × 1.0 × 0.8 m → 136.67, 386.67, 416.67 kg·m²', () => {
    const p = massProperties([{ shape: 'box', massKg: 1000, cg: { x: 0, y: 0, z: 0 }, dimensions: { x: 2, y: 1, z: 0.8 } }]);
    expectRounded(p.inertia.xx, '136.67');
    expectRounded(p.inertia.yy, '386.67');
    expectRounded(p.inertia.zz, '416.67');
    expect(p.inertia.xy).toBe(0);
  });

  it('a box split into two halves has the same inertia as the whole (parallel-axis theorem)', () => {
    const whole = boxInertia(1000, { x: 2, y: 1, z: 0.8 });
    const halves = massProperties([
      { shape: 'box', massKg: 500, cg: { x: -0.5, y: 0, z: 0 }, dimensions: { x: 1, y: 1, z: 0.8 } },
      { shape: 'box', massKg: 500, cg: { x: 0.5, y: 0, z: 0 }, dimensions: { x: 1, y: 1, z: 0.8 } },
    ]);
    expect(halves.inertia.xx).toBeCloseTo(whole.xx, 10);
    expect(halves.inertia.yy).toBeCloseTo(whole.yy, 10);
    expect(halves.inertia.zz).toBeCloseTo(whole.zz, 10);
  });

  it('cylinder: m·R²/2 about its axis, m·(3R² + L²)/12 across [CF]; rotating it swaps axes', () => {
    const j = cylinderInertia(120, 0.2, 0.9, 'x');
    expect(j.xx).toBeCloseTo(2.4, 12);
    expect(j.yy).toBeCloseTo((120 * (3 * 0.04 + 0.81)) / 12, 12);
    const turned = massProperties([
      {
        shape: 'cylinder',
        massKg: 120,
        cg: { x: 0, y: 0, z: 0 },
        radius: 0.2,
        length: 0.9,
        axis: 'x',
        orientation: rotationAboutAxis('z', Math.PI / 2),
      },
    ]);
    expect(turned.inertia.yy).toBeCloseTo(2.4, 10);
    expect(turned.inertia.xx).toBeCloseTo(j.yy, 10);
    expect(Math.abs(turned.inertia.xy)).toBeLessThan(1e-12);
  });

  it('own inertia replaces the shape value and adds to the parallel-axis terms', () => {
    const p = massProperties([
      { massKg: 10, cg: { x: 1, y: 0, z: 0 }, ownInertia: { xx: 1, yy: 2, zz: 3, xy: 0, xz: 0, yz: 0 } },
      { massKg: 10, cg: { x: -1, y: 0, z: 0 } },
    ]);
    expect(p.inertia).toEqual({ xx: 1, yy: 22, zz: 23, xy: 0, xz: 0, yz: 0 });
  });

  it('rejects empty lists, zero or negative masses and non-finite positions', () => {
    expect(() => massProperties([])).toThrow(VibrationInputError);
    expect(() => massProperties([{ massKg: 0, cg: { x: 0, y: 0, z: 0 } }])).toThrow(/components\[0\].massKg/);
    expect(() => massProperties([{ massKg: 1, cg: { x: Number.NaN, y: 0, z: 0 } }])).toThrow(/components\[0\].cg.x/);
    expect(() => massProperties([{ shape: 'box', massKg: 1, cg: { x: 0, y: 0, z: 0 }, dimensions: { x: -1, y: 1, z: 1 } }])).toThrow(
      /dimensions/,
    );
  });
});
