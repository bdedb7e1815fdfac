import { describe, expect, it } from 'vitest';
import { massProperties } from '../assembly/mass-properties.js';
import { rigidBodyMassMatrix, rigidBodyModes, rigidBodyStiffnessMatrix } from '../modes/rigid-body-modes.js';
import { hystereticDamping, viscousDamping } from '../sdof/damping.js';
import { prepareWholeMachine, wholeMachineModes } from './system.js';
import { type WholeMachineModel } from './types.js';

// Model: docs/engineering/whole-machine.md §2–§3, §10; docs/engineering/rigid-body-modes.md §2, §4.

const body = massProperties([
  { name: 'base', shape: 'box', massKg: 600, cg: { x: 0, y: 0, z: 0.1 }, dimensions: { x: 2.2, y: 1.0, z: 0.2 } },
  { name: 'pump', shape: 'box', massKg: 350, cg: { x: 0.6, y: 0.05, z: 0.55 }, dimensions: { x: 0.8, y: 0.6, z: 0.7 } },
  { name: 'motor', shape: 'cylinder', massKg: 420, cg: { x: -0.5, y: -0.1, z: 0.5 }, radius: 0.3, length: 0.9, axis: 'x' },
]);
const model: WholeMachineModel = {
  body,
  mounts: [
    { position: { x: -1, y: -0.45, z: 0 }, stiffness: { x: 2e5, y: 2.5e5, z: 5e5 }, damping: hystereticDamping(0.1) },
    { position: { x: -1, y: 0.45, z: 0 }, stiffness: { x: 2.1e5, y: 2.4e5, z: 5.2e5 }, damping: hystereticDamping(0.2) },
    { position: { x: 1, y: -0.45, z: 0.05 }, stiffness: { x: 1.8e5, y: 2e5, z: 4.4e5 }, damping: viscousDamping(0.05) },
    { position: { x: 1, y: 0.45, z: 0.05 }, stiffness: { x: 1.9e5, y: 2.2e5, z: 4.6e5 } },
  ],
};

describe('prepareWholeMachine (docs/engineering/whole-machine.md §2–§3)', () => {
  it('builds the same M and K as the modal model (rigidBodyMassMatrix, rigidBodyStiffnessMatrix), and H, V from the rows', () => {
    const sys = prepareWholeMachine(model);
    const M = rigidBodyMassMatrix(body.massKg, body.inertia);
    const K = rigidBodyStiffnessMatrix(model.mounts, body.cg);
    const scale = Math.max(...K.flat().map(Math.abs));
    for (let a = 0; a < 6; a++) {
      for (let b = 0; b < 6; b++) {
        expect(sys.mass[6 * a + b]).toBe(M[a][b]);
        expect(Math.abs(sys.stiffness[6 * a + b] - K[a][b])).toBeLessThan(1e-12 * scale);
      }
    }
    // H = Σ η_i·K_i and V = Σ (2ζ_i/ω_v)·K_i, from one-mount stiffness matrices
    const Ki = model.mounts.map((m) => rigidBodyStiffnessMatrix([m], body.cg));
    const wv = Math.sqrt((5e5 + 5.2e5 + 4.4e5 + 4.6e5) / body.massKg);
    expect(sys.bounceOmegaRadPerS).toBeCloseTo(wv, 12);
    for (let a = 0; a < 6; a++) {
      for (let b = 0; b < 6; b++) {
        expect(Math.abs(sys.hysteretic[6 * a + b] - (0.1 * Ki[0][a][b] + 0.2 * Ki[1][a][b]))).toBeLessThan(1e-12 * scale);
        expect(Math.abs(sys.viscous[6 * a + b] - ((2 * 0.05) / wv) * Ki[2][a][b])).toBeLessThan(1e-12 * scale);
      }
    }
  });

  it('the stiffness factor scales K, H and V by φ and every mode frequency by √φ', () => {
    const base = prepareWholeMachine(model);
    const stiff = prepareWholeMachine(model, { stiffnessFactor: 1.15 });
    for (let e = 0; e < 36; e++) {
      expect(stiff.stiffness[e]).toBeCloseTo(1.15 * base.stiffness[e], 6);
      expect(stiff.hysteretic[e]).toBeCloseTo(1.15 * base.hysteretic[e], 6);
      // V = 2ζK/ω_v with ω_v ∝ √φ: V scales by √φ
      expect(stiff.viscous[e]).toBeCloseTo(Math.sqrt(1.15) * base.viscous[e], 9);
    }
    const f0 = rigidBodyModes({ massKg: body.massKg, inertia: body.inertia, cg: body.cg, mounts: model.mounts }).modes;
    const f1 = wholeMachineModes(stiff).modes;
    f0.forEach((m, j) => expect(f1[j].frequencyHz / m.frequencyHz).toBeCloseTo(Math.sqrt(1.15), 12));
    expect(wholeMachineModes(stiff).modes).toBe(f1); // computed once, then cached
  });
});
