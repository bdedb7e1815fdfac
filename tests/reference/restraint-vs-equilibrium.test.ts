/**
 * Seismic restraint demand per mount against an independent computation: the machine as a rigid
 * body on six-degree-of-freedom springs, K·u = f solved with mathjs (LU) for the weight and for the
 * horizontal design force at the CG, the mount forces read from the spring deflections. Nothing of
 * the package's restraint code is used here except the result under test; the force F_p is worked
 * by hand from ASCE 7-16 Eq. 13.3-1 [REC: ASCE 7-16 §13.3.1, from memory] and the combinations
 * (0.9 − 0.2·S_DS)·D ± E_h, (1.2 + 0.2·S_DS)·D + E_h [REC: ASCE 7-16 §2.3.6 and §12.4.2, from memory].
 * docs/engineering/seismic-restraint.md §5–§8.
 *
 * The case: an offset machine on six mounts of a non-square, irregular layout with different
 * vertical and horizontal stiffnesses per mount (sizes of a series mixed per point).
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { restraintForcesInDirection, seismicRestraintDemand } from './vibration.js';

const G = 9.80665;
const mounts = [
  { x: 0.0, y: 0.0, kv: 3.1e5, kh: 2.0e5 },
  { x: 1.6, y: -0.1, kv: 2.4e5, kh: 1.5e5 },
  { x: 2.5, y: 0.2, kv: 2.8e5, kh: 1.9e5 },
  { x: 2.2, y: 1.15, kv: 3.6e5, kh: 2.5e5 },
  { x: 0.9, y: 1.3, kv: 2.2e5, kh: 1.2e5 },
  { x: -0.1, y: 0.85, kv: 2.0e5, kh: 1.4e5 },
];
const massKg = 1800;
const W = massKg * G; // 17 651.97 N
const cg = { x: 1.45, y: 0.58, z: 0.85 }; // z: CG height above the mount plane, m
// S_DS = 0.4 g, I_p = 1.5, z/h = 0.25, Table 13.6-1 defaults a_p = 2.5, R_p = 2.0, gap 5 mm (≤ 0.25 in: not doubled)
const seismic = { sdsG: 0.4, importanceFactor: 1.5, zOverH: 0.25, snubberGapM: 0.005 };
// by hand: F_p = 0.4·2.5·0.4·W·(1 + 2·0.25)/(2.0/1.5) = 0.45·W, within 0.3·0.4·1.5·W = 0.18·W … 1.6·0.4·1.5·W = 0.96·W
const F = 0.45 * W;
const upliftFactor = 0.9 - 0.2 * seismic.sdsG;
const compressionFactor = 1.2 + 0.2 * seismic.sdsG;

const input = {
  ...seismic,
  points: mounts.map((m) => ({ x: m.x, y: m.y })),
  verticalStiffnessNPerM: mounts.map((m) => m.kv),
  horizontalStiffnessNPerM: mounts.map((m) => m.kh),
  weightN: W,
  cg: { x: cg.x, y: cg.y },
  cgHeightM: cg.z,
};

/** 6×6 stiffness of the rigid body about the origin (on the mount plane): Σ Tᵢᵀ·kᵢ·Tᵢ, Tᵢ = [I | −[rᵢ]×]. */
function stiffness(): math.Matrix {
  let K = math.zeros(6, 6) as math.Matrix;
  for (const m of mounts) {
    const r = [m.x, m.y, 0];
    // d = t + ω × r  →  T = [I, −skew(r)]
    const T = math.matrix([
      [1, 0, 0, 0, r[2], -r[1]],
      [0, 1, 0, -r[2], 0, r[0]],
      [0, 0, 1, r[1], -r[0], 0],
    ]);
    const k = math.diag([m.kh, m.kh, m.kv]);
    K = math.add(K, math.multiply(math.transpose(T), math.multiply(k, T))) as math.Matrix;
  }
  return K;
}

const lu = math.lup(stiffness());

/** Mount forces for a force f at the CG: horizontal (x, y) on each mount and its compression [N]. */
function mountForces(f: [number, number, number]): { vx: number[]; vy: number[]; compression: number[] } {
  const moment = math.cross([cg.x, cg.y, cg.z], f) as number[];
  const solution = math.lusolve(lu, [...f, ...moment]);
  const u = ((math.isMatrix(solution) ? solution.toArray() : solution) as number[][]).map((row) => row[0]);
  const vx: number[] = [];
  const vy: number[] = [];
  const compression: number[] = [];
  for (const m of mounts) {
    const dx = u[0] - u[5] * m.y;
    const dy = u[1] + u[5] * m.x;
    const dz = u[2] + u[3] * m.y - u[4] * m.x;
    vx.push(m.kh * dx);
    vy.push(m.kh * dy);
    compression.push(-m.kv * dz);
  }
  return { vx, vy, compression };
}

const dead = mountForces([0, 0, -W]).compression;

/** The combinations for the design force in direction θ. */
function demandsAt(thetaRad: number) {
  const s = mountForces([F * Math.cos(thetaRad), F * Math.sin(thetaRad), 0]);
  return mounts.map((_, i) => ({
    shear: Math.hypot(s.vx[i], s.vy[i]),
    tension: Math.max(0, -upliftFactor * dead[i] - s.compression[i]),
    compression: compressionFactor * dead[i] + s.compression[i],
  }));
}

describe('restraint demand per mount vs a 6-DOF equilibrium solve (mathjs)', () => {
  it('the design force is worked by hand: F_p = 0.45·W, not doubled', () => {
    const r = seismicRestraintDemand(input);
    expect(r.fpN).toBeCloseTo(F, 6);
    expect(r.designForceN).toBeCloseTo(F, 6);
    expect(r.doubled).toBe(false);
    expect(r.verticalForceN).toBeCloseTo(0.2 * seismic.sdsG * W, 6); // E_v = 0.2·S_DS·D
  });

  it('dead loads D_i equal the 6-DOF solve under the weight', () => {
    const r = seismicRestraintDemand(input);
    r.perPoint.forEach((p, i) => expect(p.deadLoadN).toBeCloseTo(dead[i], 6));
    expect(dead.reduce((s, v) => s + v, 0)).toBeCloseTo(W, 6);
  });

  it('in a direction between the axes (θ = 30° and 127°): shear, uplift and compression per mount agree', () => {
    for (const deg of [30, 127]) {
      const th = (deg * Math.PI) / 180;
      const lib = restraintForcesInDirection(input, th);
      const ref = demandsAt(th);
      ref.forEach((q, i) => {
        expect(lib.shearN[i]).toBeCloseTo(q.shear, 6);
        expect(lib.tensionN[i]).toBeCloseTo(q.tension, 6);
        expect(lib.compressionN[i]).toBeCloseTo(q.compression, 6);
      });
    }
  });

  it('the worst over every direction matches the largest of 3600 direct solves (0.1° steps) and is reached at the reported direction', () => {
    const r = seismicRestraintDemand(input);
    const worst = mounts.map(() => ({ shear: 0, tension: 0, compression: -Infinity }));
    for (let k = 0; k < 3600; k++) {
      demandsAt((k / 10) * (Math.PI / 180)).forEach((q, i) => {
        worst[i].shear = Math.max(worst[i].shear, q.shear);
        worst[i].tension = Math.max(worst[i].tension, q.tension);
        worst[i].compression = Math.max(worst[i].compression, q.compression);
      });
    }
    r.perPoint.forEach((p, i) => {
      // a sampled maximum of a·cos(θ − θ*) lies within a·(1 − cos 0.05°) ≈ 4e-7·a of the true one
      const slack = 1e-6 * Math.max(p.shearN, p.overturningN);
      expect(p.shearN).toBeGreaterThanOrEqual(worst[i].shear - 1e-6);
      expect(p.shearN).toBeLessThanOrEqual(worst[i].shear + slack);
      expect(p.tensionN).toBeGreaterThanOrEqual(worst[i].tension - 1e-6);
      expect(p.tensionN).toBeLessThanOrEqual(worst[i].tension + slack);
      expect(p.compressionN).toBeGreaterThanOrEqual(worst[i].compression - 1e-6);
      expect(p.compressionN).toBeLessThanOrEqual(worst[i].compression + slack);
      expect(demandsAt(p.shearDirectionRad)[i].shear).toBeCloseTo(p.shearN, 6);
      expect(demandsAt(p.compressionDirectionRad)[i].compression).toBeCloseTo(p.compressionN, 6);
      if (p.tensionN > 0) expect(demandsAt(p.tensionDirectionRad)[i].tension).toBeCloseTo(p.tensionN, 6);
    });
    // the case exercises both: some mounts lift under the design force, some never do
    expect(r.perPoint.some((p) => p.tensionN > 0)).toBe(true);
    expect(r.perPoint.some((p) => p.tensionN === 0)).toBe(true);
    // and the worst shear directions are not along the axes
    expect(r.perPoint.some((p) => Math.abs(Math.sin(2 * p.shearDirectionRad)) > 0.2)).toBe(true);
  });
});
