/**
 * The whole-machine kernel against an independent six-degree-of-freedom model written here from
 * the textbook rigid body on resilient supports (Harris' Shock and Vibration Handbook, the
 * chapters on the theory of vibration isolation and on resiliently supported rigid bodies
 * [REC, from memory]), assembled with mathjs complex matrices and solved with mathjs `lusolve`
 * (a solver the package does not use). Nothing of the package's matrices is imported: only its
 * public result is compared. An asymmetric machine (offset CG, products of inertia, six unequal
 * mounts at two heights, mixed damping) with three sources: an unbalance, a force at twice shaft
 * speed, a force at a fixed frequency. Model: docs/engineering/whole-machine.md §2–§7; check
 * values: docs/engineering/check-values.md.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { peakByPhaseSearch } from './whole-machine-support.js';
import {
  type SpeedSource,
  type WholeMachineModel,
  hystereticDamping,
  prepareWholeMachine,
  sourceAmplitudeN,
  sourceFrequencyHz,
  speedSweep,
  viscousDamping,
  wholeMachineResponse,
} from './vibration.js';

type C = math.Complex;

// The machine: m, CG, inertia about the CG (tensor convention: J_xy = −∫xy dm), mounts.
const M_KG = 1850;
const CG = { x: 0.18, y: -0.07, z: 0.62 };
const J = { xx: 410, yy: 1320, zz: 1480, xy: -35, xz: 60, yz: 22 };
interface RefMount {
  p: [number, number, number];
  k: [number, number, number];
  eta?: number;
  zeta?: number;
}
const MOUNTS: RefMount[] = [
  { p: [-1.1, -0.55, 0.05], k: [3.1e5, 2.8e5, 6.2e5], eta: 0.12 },
  { p: [-1.1, 0.5, 0.05], k: [2.9e5, 3.3e5, 5.8e5], eta: 0.12 },
  { p: [0.05, -0.6, 0.0], k: [2.0e5, 2.2e5, 4.9e5], zeta: 0.05 },
  { p: [0.1, 0.6, 0.0], k: [2.4e5, 2.1e5, 5.1e5], zeta: 0.05 },
  { p: [1.25, -0.45, 0.12], k: [3.8e5, 3.5e5, 7.4e5], eta: 0.2 },
  { p: [1.2, 0.55, 0.12], k: [3.6e5, 3.9e5, 6.9e5] },
];

const SOURCES: { name: string; source: SpeedSource }[] = [
  {
    name: 'unbalance of a 95 kg impeller, G6.3, shaft along x',
    source: {
      at: { x: 0.95, y: 0.05, z: 1.05 },
      kind: 'rotating',
      axis: 'x',
      order: 1,
      unbalance: { rotorMassKg: 95, balanceGradeMmPerS: 6.3 },
    },
  },
  {
    name: 'a 420 N force along y at twice shaft speed',
    source: { at: { x: -0.7, y: -0.2, z: 0.9 }, kind: 'directional', axis: 'y', order: 2, amplitudeN: 420 },
  },
  {
    name: 'a 160 N force along z at 100 Hz',
    source: { at: { x: -0.65, y: 0.15, z: 0.75 }, kind: 'directional', axis: 'z', frequencyHz: 100, amplitudeN: 160 },
  },
];
const MIN_RPM = 250;
const MAX_RPM = 1500;

function packageModel(): WholeMachineModel {
  return {
    body: { massKg: M_KG, cg: CG, inertia: J },
    mounts: MOUNTS.map((mt, i) => ({
      label: `P${i + 1}`,
      position: { x: mt.p[0], y: mt.p[1], z: mt.p[2] },
      stiffness: { x: mt.k[0], y: mt.k[1], z: mt.k[2] },
      damping: mt.eta !== undefined ? hystereticDamping(mt.eta) : mt.zeta !== undefined ? viscousDamping(mt.zeta) : undefined,
    })),
  };
}

/** Arm of a point from the CG [m]. */
const arm = (p: [number, number, number]) => [p[0] - CG.x, p[1] - CG.y, p[2] - CG.z];

/**
 * Motion of a point at arm r from the CG for q = [u_x, u_y, u_z, θ_x, θ_y, θ_z]: u + θ × r, written
 * out component by component as a 3×6 matrix.
 */
function kinematics(r: number[]): number[][] {
  const [x, y, z] = r;
  return [
    [1, 0, 0, 0, z, -y],
    [0, 1, 0, -z, 0, x],
    [0, 0, 1, y, -x, 0],
  ];
}

/** ω_v = √(Σk_z/m), the reference frequency of the viscous rows (docs/engineering/whole-machine.md §3). */
const OMEGA_V = Math.sqrt(MOUNTS.reduce((s, mt) => s + mt.k[2], 0) / M_KG);

/** Complex factor of a mount's stiffness at ω: 1 + iη (hysteretic), 1 + 2iζω/ω_v (viscous), 1 (none). */
function dampingFactor(mt: RefMount, w: number): C {
  if (mt.eta !== undefined) return math.complex(1, mt.eta);
  if (mt.zeta !== undefined) return math.complex(1, (2 * mt.zeta * w) / OMEGA_V);
  return math.complex(1, 0);
}

/** The force vector of a source, e^{iωt} convention: rotating right-handed about its axis, or along it. */
function forceVector(s: SpeedSource, amplitude: number): C[] {
  const f = [math.complex(0, 0), math.complex(0, 0), math.complex(0, 0)];
  const a = { x: 0, y: 1, z: 2 }[s.axis];
  if (s.kind === 'directional') f[a] = math.complex(amplitude, 0);
  else {
    // about +x: F(0, cos ωt, sin ωt) = Re{F(0, 1, −i)e^{iωt}}; cyclic for y and z
    f[(a + 1) % 3] = math.complex(amplitude, 0);
    f[(a + 2) % 3] = math.complex(0, -amplitude);
  }
  return f;
}

interface Reference {
  mountForces: C[][];
  mountPeaks: number[];
  transmissibility: number;
}

/** The independent solve: Σ Tᵀ·k_c·T − ω²M, load [F; r × F], mathjs lusolve. */
function referenceResponse(s: SpeedSource, f: number, amplitude: number): Reference {
  const w = 2 * Math.PI * f;
  let A = math.multiply(
    -w * w,
    math.matrix([
      [M_KG, 0, 0, 0, 0, 0],
      [0, M_KG, 0, 0, 0, 0],
      [0, 0, M_KG, 0, 0, 0],
      [0, 0, 0, J.xx, J.xy, J.xz],
      [0, 0, 0, J.xy, J.yy, J.yz],
      [0, 0, 0, J.xz, J.yz, J.zz],
    ]),
  ) as math.Matrix;
  for (const mt of MOUNTS) {
    const T = math.matrix(kinematics(arm(mt.p)));
    const kc = math.multiply(dampingFactor(mt, w), math.diag(mt.k)) as math.Matrix;
    A = math.add(A, math.multiply(math.transpose(T), math.multiply(kc, T))) as math.Matrix;
  }
  const F = forceVector(s, amplitude);
  const [rx, ry, rz] = arm([s.at.x, s.at.y, s.at.z]);
  // moment r × F about the CG
  const Mx = math.subtract(math.multiply(ry, F[2]), math.multiply(rz, F[1])) as C;
  const My = math.subtract(math.multiply(rz, F[0]), math.multiply(rx, F[2])) as C;
  const Mz = math.subtract(math.multiply(rx, F[1]), math.multiply(ry, F[0])) as C;
  const load = math.matrix([[F[0]], [F[1]], [F[2]], [Mx], [My], [Mz]]);
  const q = math.lusolve(A, load) as math.Matrix;
  const mountForces: C[][] = [];
  const mountPeaks: number[] = [];
  for (const mt of MOUNTS) {
    const u = math.multiply(math.matrix(kinematics(arm(mt.p))), q) as math.Matrix;
    const fm = [0, 1, 2].map((k) => math.multiply(math.multiply(dampingFactor(mt, w), mt.k[k]), u.get([k, 0])) as C);
    mountForces.push(fm);
    mountPeaks.push(
      peakByPhaseSearch(
        fm.map((v) => v.re),
        fm.map((v) => v.im),
      ),
    );
  }
  return { mountForces, mountPeaks, transmissibility: mountPeaks.reduce((a, b) => a + b, 0) / amplitude };
}

describe('whole-machine response vs an independent 6-DOF model solved with mathjs (asymmetric machine, three sources)', () => {
  const sys = prepareWholeMachine(packageModel());
  for (const { name, source } of SOURCES) {
    it(`CV-42: ${name}: per-mount forces and T agree within 1e-6 across the range and at the sweep's worst point`, () => {
      const sweep = speedSweep(sys, { source, minRpm: MIN_RPM, maxRpm: MAX_RPM });
      const speeds = [MIN_RPM, 400, 777.7, 1234.5, MAX_RPM, sweep.worst.speedRpm, ...sweep.crossings.map((c) => c.speedRpm)];
      for (const n of speeds) {
        const f = sourceFrequencyHz(source, n);
        const amplitude = sourceAmplitudeN(source, n, MAX_RPM);
        const ref = referenceResponse(source, f, amplitude);
        const r = wholeMachineResponse(sys, { at: source.at, kind: source.kind, axis: source.axis, amplitudeN: amplitude }, f);
        expect(Math.abs(r.transmissibility / ref.transmissibility - 1)).toBeLessThan(1e-6);
        ref.mountPeaks.forEach((peak, i) => {
          expect(Math.abs(r.mountPeakForceN[i] / peak - 1)).toBeLessThan(1e-6);
          for (let k = 0; k < 3; k++) {
            expect(Math.abs(r.mountForceRe[3 * i + k] - ref.mountForces[i][k].re)).toBeLessThan(1e-6 * peak);
            expect(Math.abs(r.mountForceIm[3 * i + k] - ref.mountForces[i][k].im)).toBeLessThan(1e-6 * peak);
          }
        });
      }
      // the sweep's worst point is the worst of the independent model nearby
      if (source.frequencyHz === undefined) {
        const tRef = (n: number) => referenceResponse(source, sourceFrequencyHz(source, n), 1).transmissibility;
        const worstRef = tRef(sweep.worst.speedRpm);
        expect(Math.abs(sweep.worst.transmissibility / worstRef - 1)).toBeLessThan(1e-6);
        for (const d of [-0.002, -0.0005, 0.0005, 0.002]) {
          const n = sweep.worst.speedRpm * (1 + d);
          if (n >= MIN_RPM && n <= MAX_RPM) expect(tRef(n)).toBeLessThanOrEqual(worstRef * (1 + 1e-9));
        }
      }
    });
  }

  it('the case is a real test: asymmetric coupling spreads a vertical force into horizontal mount forces, and a mode lies in the range', () => {
    const ref = referenceResponse(SOURCES[2].source, 100, 160);
    const horizontal = ref.mountForces.reduce((s, fm) => s + math.abs(fm[0]) + math.abs(fm[1]), 0);
    expect(horizontal).toBeGreaterThan(1e-3 * ref.mountPeaks.reduce((a, b) => a + b, 0));
    // modes 3.81 … 10.60 Hz: the unbalance (order 1, 4.2–25 Hz) crosses five of them, the order-2 force (8.3–50 Hz) two
    const unbalance = speedSweep(sys, { source: SOURCES[0].source, minRpm: MIN_RPM, maxRpm: MAX_RPM });
    expect(unbalance.crossings).toHaveLength(5);
    expect(unbalance.worst.transmissibility).toBeGreaterThan(2);
    expect(speedSweep(sys, { source: SOURCES[1].source, minRpm: MIN_RPM, maxRpm: MAX_RPM }).crossings).toHaveLength(2);
  });
});
