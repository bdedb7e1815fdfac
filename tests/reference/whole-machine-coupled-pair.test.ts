/**
 * The coupled horizontal-translation / rocking pair of a symmetric machine on mounts below its CG:
 * a published closed form (Harris' Shock and Vibration Handbook, the chapter on resiliently
 * supported rigid bodies [REC, from memory]) for the two coupled natural frequencies, and the
 * forced response of that two-degree-of-freedom pair solved by hand here (Cramer's rule on the
 * 2×2 complex system written from the springs' energy), against the package's six-degree-of-freedom
 * kernel. Model: docs/engineering/whole-machine.md §3–§5, docs/engineering/rigid-body-modes.md §7;
 * check values: docs/engineering/check-values.md.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { peakByPhaseSearch } from './whole-machine-support.js';
import {
  type Damping,
  type WholeMachineModel,
  boxInertia,
  hystereticDamping,
  prepareWholeMachine,
  viscousDamping,
  wholeMachineModes,
  wholeMachineResponse,
} from './vibration.js';

// A tall machine: 1200 kg box 2.4 × 1.2 × 1.6 m (x, y, z), CG at the origin; four equal mounts at
// (±a_x, ±a_y, −a_z), stiffer sideways than vertically.
const m = 1200;
const dims = { x: 2.4, y: 1.2, z: 1.6 };
const ax = 1.0;
const ay = 0.5;
const az = 0.8;
const kx = 4e5; // per mount, = ky [N/m]
const kz = 3e5; // per mount [N/m]
const Iyy = (m * (dims.x ** 2 + dims.z ** 2)) / 12; // about y (rocking in the x–z plane)
const Ixx = (m * (dims.y ** 2 + dims.z ** 2)) / 12;

function machine(damping: Damping): WholeMachineModel {
  return {
    body: { massKg: m, cg: { x: 0, y: 0, z: 0 }, inertia: boxInertia(m, dims) },
    mounts: [ax, -ax].flatMap((x) => [ay, -ay].map((y) => ({ position: { x, y, z: -az }, stiffness: { x: kx, y: kx, z: kz }, damping }))),
  };
}

/**
 * Harris' closed form for the pair (translation along one horizontal axis, rotation about the
 * other), f_z the uncoupled vertical frequency √(Σk_z/m)/2π, ρ the radius of gyration about the
 * rotation axis, a the half-spacing of the mounts along the translation, a_z the height of the CG
 * above the mounts' elastic centres:
 * (f/f_z)² = ½·[(k_x/k_z)(1 + (a_z/ρ)²) + (a/ρ)²] ∓ ½·√([…]² − 4·(k_x/k_z)·(a/ρ)²)
 */
function harrisPair(a: number, inertia: number): [number, number] {
  const fz = Math.sqrt((4 * kz) / m) / (2 * Math.PI);
  const rho2 = inertia / m;
  const s = (kx / kz) * (1 + az ** 2 / rho2) + a ** 2 / rho2;
  const root = Math.sqrt(s * s - 4 * (kx / kz) * (a ** 2 / rho2));
  return [fz * Math.sqrt(0.5 * (s - root)), fz * Math.sqrt(0.5 * (s + root))];
}

describe('coupled translation / rocking pair (Harris, resiliently supported rigid body) [REC, from memory]', () => {
  it('CV-41: the two coupled natural frequencies of each pair equal the closed form', () => {
    const modes = wholeMachineModes(prepareWholeMachine(machine(hystereticDamping(0.1)))).modes;
    const freq = (dofs: string[]) =>
      modes
        .filter((x) => dofs.some((d) => x.energyFractions[d as 'surge'] > 0.01))
        .map((x) => x.frequencyHz)
        .sort((a, b) => a - b);
    const surgePitch = freq(['surge', 'pitch']);
    const swayRoll = freq(['sway', 'roll']);
    const [lo, hi] = harrisPair(ax, Iyy);
    expect(surgePitch).toHaveLength(2);
    expect(Math.abs(surgePitch[0] / lo - 1)).toBeLessThan(1e-9);
    expect(Math.abs(surgePitch[1] / hi - 1)).toBeLessThan(1e-9);
    const [lo2, hi2] = harrisPair(ay, Ixx);
    expect(swayRoll).toHaveLength(2);
    expect(Math.abs(swayRoll[0] / lo2 - 1)).toBeLessThan(1e-9);
    expect(Math.abs(swayRoll[1] / hi2 - 1)).toBeLessThan(1e-9);
    // quoted: f_z = 5.0329 Hz; surge/pitch 3.7582 and 9.3466 Hz; sway/roll 2.3947 and 10.5774 Hz (Python, from the formula above)
    expect(lo).toBeCloseTo(3.7582, 4);
    expect(hi).toBeCloseTo(9.3466, 4);
    expect(lo2).toBeCloseTo(2.3947, 4);
    expect(hi2).toBeCloseTo(10.5774, 4);
  });

  for (const [name, damping, c] of [
    ['hysteretic η = 0.12', hystereticDamping(0.12), (_w: number) => math.complex(1, 0.12)],
    ['viscous ζ = 0.06', viscousDamping(0.06), (w: number) => math.complex(1, (2 * 0.06 * w) / Math.sqrt((4 * kz) / m))],
  ] as const) {
    it(`CV-41: ${name}, a horizontal force along x at 0.5 m above the CG: per-mount forces and T from the 2×2 closed form`, () => {
      const sys = prepareWholeMachine(machine(damping));
      const e = 0.5;
      const F = 1000;
      for (const f of [1, 3.7582, 5, 9.3466, 12, 30, 80]) {
        const w = 2 * Math.PI * f;
        const cw = c(w) as math.Complex;
        // springs' energy ½Σ[k_x(X − a_z·Θ)² + k_z(x_i·Θ)²] → stiffness of (X, Θ):
        const Kxx = 4 * kx;
        const Kxt = -4 * kx * az;
        const Ktt = 4 * kx * az ** 2 + 4 * kz * ax ** 2;
        const a11 = math.subtract(math.multiply(cw, Kxx), m * w * w) as math.Complex;
        const a12 = math.multiply(cw, Kxt) as math.Complex;
        const a22 = math.subtract(math.multiply(cw, Ktt), Iyy * w * w) as math.Complex;
        const det = math.subtract(math.multiply(a11, a22), math.multiply(a12, a12)) as math.Complex;
        // load: F along x, moment about y of a force at height e: +e·F
        const X = math.divide(math.subtract(math.multiply(a22, F), math.multiply(a12, e * F)), det) as math.Complex;
        const Th = math.divide(math.subtract(math.multiply(a11, e * F), math.multiply(a12, F)), det) as math.Complex;
        const r = wholeMachineResponse(sys, { at: { x: 0, y: 0, z: e }, kind: 'directional', axis: 'x', amplitudeN: F }, f);
        let sum = 0;
        sys.model.mounts.forEach((mount, i) => {
          const xi = mount.position.x;
          const fx = math.multiply(math.multiply(cw, kx), math.subtract(X, math.multiply(az, Th))) as math.Complex;
          const fz = math.multiply(math.multiply(cw, kz), math.multiply(-xi, Th)) as math.Complex;
          const peak = peakByPhaseSearch([fx.re, 0, fz.re], [fx.im, 0, fz.im]);
          sum += peak;
          expect(Math.abs(r.mountPeakForceN[i] / peak - 1)).toBeLessThan(1e-9);
          expect(Math.abs(r.mountForceRe[3 * i] - fx.re)).toBeLessThan(1e-9 * peak);
          expect(Math.abs(r.mountForceIm[3 * i + 2] - fz.im)).toBeLessThan(1e-9 * peak);
          expect(Math.abs(r.mountForceRe[3 * i + 1]) + Math.abs(r.mountForceIm[3 * i + 1])).toBeLessThan(1e-9 * peak);
        });
        expect(Math.abs(r.transmissibility / (sum / F) - 1)).toBeLessThan(1e-9);
      }
    });
  }
});
