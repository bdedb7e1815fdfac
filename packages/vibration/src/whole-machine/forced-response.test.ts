import { describe, expect, it } from 'vitest';
import { boxInertia } from '../assembly/mass-properties.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { hystereticDamping, viscousDamping } from '../sdof/damping.js';
import { transmissibilityHysteretic, transmissibilityViscous } from '../transmissibility/transmissibility.js';
import { peakOverCycle, sourceForceVector, wholeMachineResponse, wholeMachineTransmissibility } from './forced-response.js';
import { prepareWholeMachine } from './system.js';
import { type WholeMachineModel } from './types.js';

// Model: docs/engineering/whole-machine.md §2–§5; check values: docs/engineering/check-values.md.

/** Peak of Re(v·e^{iφ}) over a cycle by brute force (3,600 phases, then the exact maximum nearby). */
function sampledPeak(re: number[], im: number[]): number {
  let best = 0;
  const at = (phi: number) => Math.hypot(...re.map((r, k) => r * Math.cos(phi) - im[k] * Math.sin(phi)));
  let bestPhi = 0;
  for (let i = 0; i < 3600; i++) {
    const phi = (2 * Math.PI * i) / 3600;
    if (at(phi) > best) [best, bestPhi] = [at(phi), phi];
  }
  for (let h = Math.PI / 3600; h > 1e-12; h /= 2) {
    for (const phi of [bestPhi - h, bestPhi + h]) if (at(phi) > best) [best, bestPhi] = [at(phi), phi];
  }
  return best;
}

/** A symmetric box (m = 1000 kg, 2.0 × 1.0 × 0.8 m, the CV-20 body) on four equal mounts at (±0.9, ±0.4, z). */
function symmetricMachine(z: number, damping: WholeMachineModel['mounts'][number]['damping'], kh = 1e5, kv = 2.5e5): WholeMachineModel {
  return {
    body: { massKg: 1000, cg: { x: 0, y: 0, z: 0 }, inertia: boxInertia(1000, { x: 2, y: 1, z: 0.8 }) },
    mounts: [0.9, -0.9].flatMap((x) => [0.4, -0.4].map((y) => ({ position: { x, y, z }, stiffness: { x: kh, y: kh, z: kv }, damping }))),
  };
}

describe('peak over a cycle (docs/engineering/whole-machine.md §4)', () => {
  it('CV-34 [CF]: a rotating force of magnitude F has peak F; a linear one has peak |F|', () => {
    for (const axis of ['x', 'y', 'z'] as const) {
      const rot = sourceForceVector({ kind: 'rotating', axis, amplitudeN: 250 });
      expect(peakOverCycle(rot.re, rot.im)).toBeCloseTo(250, 10);
      expect(Math.hypot(...rot.re)).toBeCloseTo(250, 10); // |F| at t = 0 …
      expect(Math.hypot(...rot.im)).toBeCloseTo(250, 10); // … and a quarter-cycle later: constant magnitude
      const lin = sourceForceVector({ kind: 'directional', axis, amplitudeN: 250 });
      expect(peakOverCycle(lin.re, lin.im)).toBeCloseTo(250, 10);
    }
    // a linear force with a phase: v = F·e^{iφ}·e, peak |F|
    expect(peakOverCycle([3 * Math.cos(1), 0, 0], [3 * Math.sin(1), 0, 0])).toBeCloseTo(3, 12);
    expect(peakOverCycle([0, -4, 0], [0, 0, 0])).toBeCloseTo(4, 12);
  });

  it('CV-34 [CF]: an ellipse (a, i·b) peaks at max(a, b); general vectors match a brute-force search over the cycle', () => {
    expect(peakOverCycle([5, 0, 0], [0, 2, 0])).toBeCloseTo(5, 12);
    expect(peakOverCycle([1, 0, 0], [0, 7, 0])).toBeCloseTo(7, 12);
    const cases: [number[], number[]][] = [
      [
        [1, -2, 0.5],
        [0.3, 0.7, -1.1],
      ],
      [
        [0, 0, 0],
        [0, 0, 0],
      ],
      [
        [1e-3, 2e-3, -5e-4],
        [-4e-3, 1e-4, 2e-3],
      ],
    ];
    for (const [re, im] of cases) expect(peakOverCycle(re, im)).toBeCloseTo(sampledPeak(re, im), 12);
    expect(peakOverCycle(cases[0][0], cases[0][1])).toBeCloseTo(2.431, 3);
    expect(peakOverCycle([9, 1, -2, 0.5], [9, 0.3, 0.7, -1.1], 1)).toBeCloseTo(sampledPeak([1, -2, 0.5], [0.3, 0.7, -1.1]), 12);
  });
});

describe('reduction to the one-mass system (docs/engineering/whole-machine.md §5, docs/engineering/transmissibility.md §2–§3)', () => {
  const fv = Math.sqrt(1e6 / 1000) / (2 * Math.PI); // √(Σkz/m)/2π = 5.033 Hz
  const freqs = [0, 0.5, 2, 4.9, fv, 5.2, 7.117, 10, 25, 60, 200];
  for (const z of [0, -0.4]) {
    it(`CV-35 [CF]: viscous ζ = 0.08, mounts at z = ${z} m: vertical force through the CG → T = √(1 + (2ζr)²)/√((1 − r²)² + (2ζr)²) to 1e-9`, () => {
      const sys = prepareWholeMachine(symmetricMachine(z, viscousDamping(0.08)));
      expect(sys.bounceOmegaRadPerS).toBeCloseTo(2 * Math.PI * fv, 12);
      for (const f of freqs) {
        const t = wholeMachineTransmissibility(sys, { at: { x: 0, y: 0, z: 0 }, kind: 'directional', axis: 'z' }, f);
        const expected = transmissibilityViscous(f / fv, 0.08);
        expect(Math.abs(t / expected - 1)).toBeLessThan(1e-9);
        if (f === 10) expect(t).toBeCloseTo(0.3539, 4);
      }
    });
    it(`CV-35 [CF]: hysteretic η = 0.15, mounts at z = ${z} m: vertical force along z through the CG → T = √(1 + η²)/√((1 − r²)² + η²) to 1e-9`, () => {
      const sys = prepareWholeMachine(symmetricMachine(z, hystereticDamping(0.15)));
      for (const f of freqs) {
        // a force along z acting anywhere on the vertical through the CG has no moment
        const r = wholeMachineResponse(sys, { at: { x: 0, y: 0, z: 0.7 }, kind: 'directional', axis: 'z', amplitudeN: 1000 }, f);
        const expected = transmissibilityHysteretic(f / fv, 0.15);
        expect(Math.abs(r.transmissibility / expected - 1)).toBeLessThan(1e-9);
        if (f === 10) expect(r.transmissibility).toBeCloseTo(0.3426, 4);
        // each mount carries a quarter, vertically
        for (let i = 0; i < 4; i++) {
          expect(Math.abs(r.mountPeakForceN[i] / (250 * expected) - 1)).toBeLessThan(1e-9);
          expect(Math.abs(r.mountForceRe[3 * i]) + Math.abs(r.mountForceIm[3 * i + 1])).toBeLessThan(1e-9 * r.mountPeakForceN[i]);
        }
      }
    });
  }

  it('the amplitude scales forces and motion, not T; a zero force gives T = 0', () => {
    const sys = prepareWholeMachine(symmetricMachine(-0.4, hystereticDamping(0.1)));
    const at = { x: 0.3, y: -0.2, z: 0.5 };
    const a = wholeMachineResponse(sys, { at, kind: 'rotating', axis: 'x', amplitudeN: 1 }, 9);
    const b = wholeMachineResponse(sys, { at, kind: 'rotating', axis: 'x', amplitudeN: 400 }, 9);
    expect(b.transmissibility).toBeCloseTo(a.transmissibility, 12);
    for (let i = 0; i < 4; i++) {
      expect(b.mountPeakForceN[i]).toBeCloseTo(400 * a.mountPeakForceN[i], 8);
      expect(b.mountPeakMotionM[i] / a.mountPeakMotionM[i]).toBeCloseTo(400, 8);
    }
    expect(wholeMachineTransmissibility(sys, { at, kind: 'rotating', axis: 'x' }, 9)).toBeCloseTo(a.transmissibility, 12);
    expect(wholeMachineResponse(sys, { at, kind: 'rotating', axis: 'x', amplitudeN: 0 }, 9).transmissibility).toBe(0);
  });

  it("static (0 Hz): the mounts' vertical forces add up to the applied vertical force (equilibrium)", () => {
    const sys = prepareWholeMachine(symmetricMachine(-0.4, undefined));
    // vertical force off the CG: the mounts' vertical forces add up to F (equilibrium)
    const r = wholeMachineResponse(sys, { at: { x: 0.5, y: 0.1, z: 0.2 }, kind: 'directional', axis: 'z', amplitudeN: 100 }, 0);
    let sumZ = 0;
    for (let i = 0; i < 4; i++) sumZ += r.mountForceRe[3 * i + 2];
    expect(sumZ).toBeCloseTo(100, 9);
  });

  it('an undamped resonance gives +Infinity, never NaN', () => {
    const sys = prepareWholeMachine(symmetricMachine(0, undefined));
    const fv0 = Math.sqrt(1e6 / 1000) / (2 * Math.PI);
    const r = wholeMachineResponse(sys, { at: { x: 0, y: 0, z: 0 }, kind: 'directional', axis: 'z', amplitudeN: 1 }, fv0);
    expect(r.transmissibility === Infinity || r.transmissibility > 1e10).toBe(true);
    expect(Number.isNaN(r.transmissibility)).toBe(false);
  });
});

describe('input checks', () => {
  it('refuses bad input with the field path', () => {
    const ok = symmetricMachine(0, hystereticDamping(0.1));
    const fail = (m: unknown, field: string) => {
      try {
        prepareWholeMachine(m as WholeMachineModel);
      } catch (e) {
        expect(e).toBeInstanceOf(VibrationInputError);
        expect((e as VibrationInputError).field).toBe(field);
        return;
      }
      throw new Error('accepted');
    };
    fail({ ...ok, body: { ...ok.body, massKg: 0 } }, 'body.massKg');
    fail({ ...ok, body: { ...ok.body, cg: { x: 0, y: NaN, z: 0 } } }, 'body.cg.y');
    fail({ ...ok, body: { ...ok.body, inertia: { ...ok.body.inertia, xx: -1 } } }, 'body.inertia');
    fail({ ...ok, mounts: [] }, 'mounts');
    fail({ ...ok, mounts: [{ ...ok.mounts[0], stiffness: { x: 1, y: -1, z: 1 } }] }, 'mounts[0].stiffness.y');
    fail({ ...ok, mounts: [{ ...ok.mounts[0], damping: { model: 'hysteretic', lossFactor: -0.1 } }] }, 'mounts[0].damping.lossFactor');
    fail({ ...ok, mounts: [{ position: { x: 0, y: 0, z: 0 }, stiffness: { x: 1, y: 1, z: 0 }, damping: viscousDamping(0.1) }] }, 'mounts');
    expect(() => prepareWholeMachine(ok, { stiffnessFactor: 0 })).toThrow(VibrationInputError);
    const sys = prepareWholeMachine(ok);
    expect(() => wholeMachineTransmissibility(sys, { at: { x: 0, y: 0, z: 0 }, kind: 'directional', axis: 'w' as 'x' }, 5)).toThrow(/axis/);
    expect(() => wholeMachineTransmissibility(sys, { at: { x: 0, y: 0, z: 0 }, kind: 'directional', axis: 'x' }, -1)).toThrow(
      /frequencyHz/,
    );
  });
});
