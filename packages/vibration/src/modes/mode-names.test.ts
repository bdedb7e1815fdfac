import { describe, expect, it } from 'vitest';
import { boxInertia } from '../assembly/mass-properties.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { describeModeMotion, modeParticipants } from './mode-names.js';
import { type RigidBodyDof, rigidBodyModes } from './rigid-body-modes.js';

// Naming a mode by its kinetic-energy shares: docs/engineering/rigid-body-modes.md §6.
const shares = (given: Partial<Record<RigidBodyDof, number>>): Record<RigidBodyDof, number> => ({
  surge: 0,
  sway: 0,
  bounce: 0,
  roll: 0,
  pitch: 0,
  yaw: 0,
  ...given,
});

describe('naming a rigid-body mode by the coordinates that carry it', () => {
  it('a mode with ≥ 90 % of its energy in one coordinate is named after it alone', () => {
    expect(describeModeMotion(shares({ bounce: 1 }))).toEqual({
      participants: [{ dof: 'bounce', share: 1 }],
      mixed: false,
      name: 'bounce',
    });
    // CV-21: the 2.585 Hz mode has y 0.910, θx 0.090 → still a sway mode
    expect(describeModeMotion(shares({ sway: 0.91, roll: 0.09 })).name).toBe('sway');
  });

  it('two modes that a dominant-only name calls "yaw" are named as the roll–yaw mixes they are', () => {
    const first = describeModeMotion(shares({ yaw: 0.55, roll: 0.4, sway: 0.05 }));
    const second = describeModeMotion(shares({ roll: 0.48, yaw: 0.5, sway: 0.02 }));
    expect(first).toMatchObject({ mixed: true, name: 'yaw + roll (mixed)' });
    expect(first.participants.map((p) => p.dof)).toEqual(['yaw', 'roll']);
    expect(second.name).toBe('yaw + roll (mixed)');
    expect(describeModeMotion(shares({ roll: 0.6, yaw: 0.35, sway: 0.05 })).name).toBe('roll + yaw (mixed)');
  });

  it('takes as many coordinates as it needs to reach 90 %, largest share first', () => {
    const motion = describeModeMotion(shares({ sway: 0.45, roll: 0.3, yaw: 0.2, pitch: 0.05 }));
    expect(motion.name).toBe('sway + roll + yaw (mixed)');
    expect(motion.participants.map((p) => p.share)).toEqual([0.45, 0.3, 0.2]);
  });

  it('counts a slightly negative share (products of inertia) as none', () => {
    const motion = describeModeMotion(shares({ pitch: 0.7, surge: 0.31, yaw: -0.01 }));
    expect(motion.name).toBe('pitch + surge (mixed)');
    expect(modeParticipants(shares({ roll: 1.02, yaw: -0.02 }))).toEqual([{ dof: 'roll', share: 1.02 }]);
  });

  it('refuses a missing or non-finite share and a threshold outside (0, 1]', () => {
    expect(() => modeParticipants({ ...shares({ bounce: 1 }), yaw: Number.NaN })).toThrow(VibrationInputError);
    expect(() => modeParticipants({ bounce: 1 } as Record<RigidBodyDof, number>)).toThrow(VibrationInputError);
    expect(() => modeParticipants(shares({ bounce: 1 }), 0)).toThrow(VibrationInputError);
    expect(() => modeParticipants(shares({ bounce: 1 }), 1.5)).toThrow(VibrationInputError);
  });

  it('names the coupled sway–roll pair of a symmetric machine on mounts below its CG from the closed-form shares [CF]', () => {
    // docs/engineering/rigid-body-modes.md §7: one coupled translation–rotation pair, written out
    // here from the closed form (not from the library). Box 1000 kg, 2.0 × 1.0 × 0.8 m, four
    // mounts at (±0.9, ±0.4, −0.8), k_h = k_v = 2.5×10⁵ N/m: a strongly coupled pair.
    const m = 1000;
    const inertia = boxInertia(m, { x: 2, y: 1, z: 0.8 });
    const k = 2.5e5;
    const h = 0.8;
    const b = 0.4;
    const Ktt = 4 * k; // Σk_y
    const Ktr = 4 * k * h; // K_y,θx = +Σk_y·h
    const Krr = 4 * (k * b * b + k * h * h); // Σ(k_z·y² + k_y·z²)
    const I = inertia.xx;
    const A = Ktt / m;
    const B = Krr / I;
    const C = (Ktr * Ktr) / (m * I);
    const root = Math.sqrt((A - B) ** 2 + 4 * C);
    const expected = [0.5 * (A + B - root), 0.5 * (A + B + root)].map((w2) => {
      const thetaPerU = -(Ktt - w2 * m) / Ktr;
      const translation = m / (m + I * thetaPerU * thetaPerU);
      return { frequencyHz: Math.sqrt(w2) / (2 * Math.PI), sway: translation, roll: 1 - translation };
    });

    const corners = [0.9, -0.9].flatMap((x) => [b, -b].map((y) => ({ position: { x, y, z: -h }, stiffness: { x: k, y: k, z: k } })));
    const modes = rigidBodyModes({ massKg: m, inertia, mounts: corners }).modes;
    for (const pair of expected) {
      const mode = modes.find((candidate) => Math.abs(candidate.frequencyHz - pair.frequencyHz) < 1e-9 * pair.frequencyHz);
      expect(mode).toBeDefined();
      expect(mode!.energyFractions.sway).toBeCloseTo(pair.sway, 9);
      expect(mode!.energyFractions.roll).toBeCloseTo(pair.roll, 9);
      const motion = describeModeMotion(mode!.energyFractions);
      const order = pair.sway >= pair.roll ? 'sway + roll' : 'roll + sway';
      expect(Math.max(pair.sway, pair.roll)).toBeLessThan(0.9); // the pair is coupled: a dominant-only name would hide it
      expect(motion.name).toBe(`${order} (mixed)`);
      expect(mode!.coupled).toBe(true);
    }
  });
});
