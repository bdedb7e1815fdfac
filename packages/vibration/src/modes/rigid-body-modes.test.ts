import { describe, expect, it } from 'vitest';
import { boxInertia } from '../assembly/mass-properties.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { type ResilientMount, rigidBodyModes, rigidBodyStiffnessMatrix } from './rigid-body-modes.js';

// Model: docs/engineering/rigid-body-modes.md §4–§8; check values: docs/engineering/check-values.md.
// docs/engineering/rigid-body-modes.md §8 worked example: uniform box 1000 kg, 2.0 × 1.0 × 0.8 m, four mounts at (±0.9, ±0.4, z)
const BOX = { massKg: 1000, inertia: boxInertia(1000, { x: 2, y: 1, z: 0.8 }) };
function corners(z: number, kh = 1e5, kv = 2.5e5): ResilientMount[] {
  return [0.9, -0.9].flatMap((x) => [0.4, -0.4].map((y) => ({ position: { x, y, z }, stiffness: { x: kh, y: kh, z: kv } })));
}

describe('six-degree-of-freedom rigid-body modes', () => {
  it('CV-20 [CF]: decoupled (h = 0) → 3.183, 3.183, 4.857, 5.033, 5.446, 7.284 Hz, each pure', () => {
    const r = rigidBodyModes({ ...BOX, mounts: corners(0) });
    const K = r.stiffnessMatrix;
    [4e5, 4e5, 1e6, 1.6e5, 8.1e5, 3.88e5].forEach((v, i) => expect(K[i][i]).toBeCloseTo(v, 6));
    expect(r.modes.map((m) => m.dominant)).toEqual(['surge', 'sway', 'yaw', 'bounce', 'roll', 'pitch']);
    ['3.183', '3.183', '4.857', '5.033', '5.446', '7.284'].forEach((q, i) => expectRounded(r.modes[i].frequencyHz, q));
    for (const m of r.modes) {
      expectRounded(m.energyFractions[m.dominant], '1.000');
      expect(m.coupled).toBe(false);
      expect(m.status).toBe('ok');
    }
    expect(r.hasMechanism).toBe(false);
  });

  it('CV-21 [CF]: mounts at z = −0.4 m → sway/roll 2.585, 6.706 Hz; surge/pitch 3.041, 7.625 Hz', () => {
    const r = rigidBodyModes({ ...BOX, mounts: corners(-0.4) });
    expect(r.stiffnessMatrix[1][3]).toBeCloseTo(1.6e5, 6);
    expect(r.stiffnessMatrix[0][4]).toBeCloseTo(-1.6e5, 6);
    expect(r.stiffnessMatrix[3][3]).toBeCloseTo(2.24e5, 6);
    expect(r.stiffnessMatrix[4][4]).toBeCloseTo(8.74e5, 6);
    expect(r.modes.map((m) => m.dominant)).toEqual(['sway', 'surge', 'yaw', 'bounce', 'roll', 'pitch']);
    ['2.585', '3.041', '4.857', '5.033', '6.706', '7.625'].forEach((q, i) => expectRounded(r.modes[i].frequencyHz, q));
    expectRounded(r.modes[0].energyFractions.sway, '0.910');
    expectRounded(r.modes[0].energyFractions.roll, '0.090');
    expectRounded(r.modes[1].energyFractions.surge, '0.982');
    expectRounded(r.modes[4].energyFractions.roll, '0.910');
    expectRounded(r.modes[5].energyFractions.pitch, '0.982');
    expect(r.modes[0].coupled).toBe(false);
  });

  it('mode shapes are mass-normalised and K-orthogonal: φᵀMφ = 1, φᵀKφ = λ', () => {
    const r = rigidBodyModes({ ...BOX, cg: { x: 0.1, y: -0.05, z: 0.3 }, mounts: corners(0) });
    for (const m of r.modes) {
      let mm = 0;
      let kk = 0;
      for (let a = 0; a < 6; a++) {
        for (let b = 0; b < 6; b++) {
          mm += m.shape[a] * r.massMatrix[a][b] * m.shape[b];
          kk += m.shape[a] * r.stiffnessMatrix[a][b] * m.shape[b];
        }
      }
      expect(mm).toBeCloseTo(1, 10);
      expect(kk / m.eigenvalue).toBeCloseTo(1, 8);
      expect(Object.values(m.energyFractions).reduce((s, e) => s + e)).toBeCloseTo(1, 10);
    }
    expect(r.modes.some((m) => m.coupled)).toBe(true);
  });

  it('no horizontal stiffness → surge, sway and yaw are reported as mechanisms (frequency 0, never NaN)', () => {
    const r = rigidBodyModes({ ...BOX, mounts: corners(0, 0) });
    expect(r.hasMechanism).toBe(true);
    const mech = r.modes.filter((m) => m.status === 'mechanism');
    expect(mech.map((m) => m.dominant).sort()).toEqual(['surge', 'sway', 'yaw']);
    for (const m of r.modes) expect(Number.isFinite(m.frequencyHz)).toBe(true);
    expect(mech.every((m) => m.frequencyHz === 0)).toBe(true);
  });

  it('rejects an inertia that is not positive definite, empty mounts and bad positions', () => {
    const bad = { xx: 1, yy: 1, zz: 1, xy: 2, xz: 0, yz: 0 };
    try {
      rigidBodyModes({ massKg: 10, inertia: bad, mounts: corners(0) });
      throw new Error('no throw');
    } catch (e) {
      expect(e).toBeInstanceOf(VibrationInputError);
      expect((e as VibrationInputError).code).toBe('not-positive-definite');
    }
    expect(() => rigidBodyModes({ ...BOX, mounts: [] })).toThrow(/mounts/);
    expect(() => rigidBodyStiffnessMatrix([{ position: { x: Number.NaN, y: 0, z: 0 }, stiffness: { x: 1, y: 1, z: 1 } }])).toThrow(
      /mounts\[0\].position.x/,
    );
    expect(() => rigidBodyModes({ ...BOX, massKg: -1, mounts: corners(0) })).toThrow(/massKg/);
  });
});
