/**
 * Closed-form results of linear vibration theory ([CF]; standard textbook results, e.g. Rao,
 * Mechanical Vibrations; Thomson & Dahleh, Theory of Vibration with Applications — cited from
 * memory) checked against the package.
 */
import { describe, expect, it } from 'vitest';
import {
  STANDARD_GRAVITY,
  boxInertia,
  cornerMountLoads,
  hystereticDamping,
  mountLoads,
  naturalFrequencyFromStaticDeflection,
  rigidBodyModes,
  sdofFrfAt,
  staticDeflectionForNaturalFrequency,
  transmissibility,
  viscousDamping,
  viscousTransmissibilityPeak,
} from './vibration.js';

const DAMPING_RATIOS = [0, 0.001, 0.01, 0.05, 0.1, 0.2, 0.3, 0.5, 0.707, 1, 2];
const LOSS_FACTORS = [0, 0.01, 0.05, 0.1, 0.2, 0.4, 0.8, 1.5];

describe('transmissibility closed forms [CF]', () => {
  it('T = 1 exactly at r = √2 for every ζ and every η (numerator² = denominator²)', () => {
    for (const z of DAMPING_RATIOS) expect(transmissibility(Math.SQRT2, viscousDamping(z))).toBeCloseTo(1, 13);
    for (const e of LOSS_FACTORS) expect(transmissibility(Math.SQRT2, hystereticDamping(e))).toBeCloseTo(1, 13);
  });

  it('T → 1 as r → 0 (stiffness-controlled: the force passes straight through)', () => {
    for (const z of DAMPING_RATIOS) expect(transmissibility(1e-4, viscousDamping(z))).toBeCloseTo(1, 7);
    for (const e of LOSS_FACTORS) expect(transmissibility(1e-4, hystereticDamping(e))).toBeCloseTo(1, 7);
  });

  it('viscous peak ≈ 1/(2ζ) for light damping (error of order ζ), and exactly √(1+4ζ²)/(2ζ) at r = 1', () => {
    for (const z of [0.005, 0.01, 0.02, 0.05]) {
      const peak = viscousTransmissibilityPeak(z).transmissibility;
      expect(Math.abs(peak * 2 * z - 1)).toBeLessThan(3 * z * z + 1e-12);
      expect(transmissibility(1, viscousDamping(z))).toBeCloseTo(Math.sqrt(1 + 4 * z * z) / (2 * z), 10);
    }
  });

  it('far above resonance: hysteretic T ≈ √(1+η²)/r² (−40 dB/decade), viscous T → 2ζ/r (−20 dB/decade)', () => {
    const r = 1e4;
    expect(transmissibility(r, hystereticDamping(0.3)) * r * r).toBeCloseTo(Math.sqrt(1.09), 6);
    expect((transmissibility(r, viscousDamping(0.3)) * r) / 0.6).toBeCloseTo(1, 4);
  });
});

describe('frequency response closed forms [CF]', () => {
  it('K_d(0) = k for viscous and (real part) for hysteretic damping', () => {
    const k = 3.7e5;
    expect(sdofFrfAt({ massKg: 120, stiffnessNPerM: k, damping: viscousDamping(0.1) }, 'dynamicStiffness', 0).re).toBe(k);
    expect(sdofFrfAt({ massKg: 120, stiffnessNPerM: k, damping: hystereticDamping(0.1) }, 'dynamicStiffness', 0).re).toBe(k);
  });
  it('apparent mass → m far above resonance', () => {
    const m = sdofFrfAt({ massKg: 120, stiffnessNPerM: 3.7e5, damping: viscousDamping(0.05) }, 'apparentMass', 1e4);
    expect(Math.hypot(m.re, m.im)).toBeCloseTo(120, 2);
  });
});

describe('static deflection ↔ natural frequency [CF]', () => {
  // Source: derived from standard gravity g_n = 9.80665 m/s² (NIST SP 330, value of g_n):
  // fn = √(g_n/δ)/(2π) → fn[Hz] = √9806.65/(2π)/√δ[mm] = 15.7609/√δ[mm].
  it('fn ≈ 15.76/√δ[mm] and δ[mm] ≈ 248.4/fn²', () => {
    expect(STANDARD_GRAVITY).toBe(9.80665);
    expect(Math.sqrt(9806.65) / (2 * Math.PI)).toBeCloseTo(15.7609, 4);
    for (const mm of [1, 2.5, 5, 10, 25, 50, 100]) {
      expect(naturalFrequencyFromStaticDeflection(mm / 1000) * Math.sqrt(mm)).toBeCloseTo(15.7609, 4);
    }
    for (const fn of [2, 3, 5, 8, 12]) expect(staticDeflectionForNaturalFrequency(fn) * 1000 * fn * fn).toBeCloseTo(248.4, 1);
  });
});

describe('rigid frame on mounts [CF]', () => {
  it('four symmetric corner mounts under a centred CG carry equal loads W/4', () => {
    for (const [a, b] of [
      [0.8, 0.45],
      [1.3, 0.6],
      [0.5, 0.5],
    ]) {
      const points = [
        { x: a, y: b },
        { x: a, y: -b },
        { x: -a, y: b },
        { x: -a, y: -b },
      ];
      const r = mountLoads({ points, stiffnessNPerM: 2.5e5, weightN: 12000, cg: { x: 0, y: 0 } });
      for (const f of r.loadsN) expect(f).toBeCloseTo(3000, 8);
      expect(Math.abs(r.tiltX) + Math.abs(r.tiltY)).toBeLessThan(1e-15);
      const c = cornerMountLoads({ halfSpacingX: a, halfSpacingY: b, weightN: 12000, cgOffset: { x: 0, y: 0 } });
      expect(c.loadsN).toEqual([3000, 3000, 3000, 3000]);
    }
  });
});

describe('symmetric 6-DOF layout decouples [CF]', () => {
  it('mounts in the CG plane at (±a, ±b): six pure modes with closed-form frequencies', () => {
    const m = 1450;
    const J = boxInertia(m, { x: 2.4, y: 1.2, z: 0.9 });
    const [a, b, kh, kv] = [1.05, 0.5, 1.4e5, 3.1e5];
    const mounts = [a, -a].flatMap((x) => [b, -b].map((y) => ({ position: { x, y, z: 0 }, stiffness: { x: kh, y: kh, z: kv } })));
    const r = rigidBodyModes({ massKg: m, inertia: J, mounts });
    const hz = (k: number, mass: number) => Math.sqrt(k / mass) / (2 * Math.PI);
    const expected = {
      surge: hz(4 * kh, m),
      sway: hz(4 * kh, m),
      bounce: hz(4 * kv, m),
      roll: hz(4 * kv * b * b, J.xx),
      pitch: hz(4 * kv * a * a, J.yy),
      yaw: hz(4 * kh * (a * a + b * b), J.zz),
    };
    for (const mode of r.modes) {
      expect(mode.frequencyHz).toBeCloseTo(expected[mode.dominant], 9);
      expect(mode.energyFractions[mode.dominant]).toBeCloseTo(1, 9);
    }
    expect(new Set(r.modes.map((x) => x.dominant)).size).toBe(6);
  });

  it('mounts below the CG: sway/roll pair follows ω² = ½[(A + B) ∓ √((A − B)² + 4C)]', () => {
    const m = 1000;
    const J = boxInertia(m, { x: 2, y: 1, z: 0.8 });
    const [a, b, h, kh, kv] = [0.9, 0.4, 0.4, 1e5, 2.5e5];
    const mounts = [a, -a].flatMap((x) => [b, -b].map((y) => ({ position: { x, y, z: -h }, stiffness: { x: kh, y: kh, z: kv } })));
    const r = rigidBodyModes({ massKg: m, inertia: J, mounts });
    const A = (4 * kh) / m;
    const B = (4 * kh * h * h + 4 * kv * b * b) / J.xx;
    const C = (4 * kh * h) ** 2 / (m * J.xx);
    const lo = 0.5 * (A + B - Math.sqrt((A - B) ** 2 + 4 * C));
    const hi = 0.5 * (A + B + Math.sqrt((A - B) ** 2 + 4 * C));
    const sway = r.modes.find((x) => x.dominant === 'sway')!;
    const roll = r.modes.find((x) => x.dominant === 'roll')!;
    expect(sway.eigenvalue).toBeCloseTo(lo, 6);
    expect(roll.eigenvalue).toBeCloseTo(hi, 6);
    // the lower root falls below both A and B, the upper rises above both
    expect(lo).toBeLessThan(Math.min(A, B));
    expect(hi).toBeGreaterThan(Math.max(A, B));
  });
});
