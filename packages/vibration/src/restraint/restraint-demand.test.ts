/**
 * Per-mount restraint demand: closed forms for a symmetric layout, equilibrium for an offset one,
 * and the exact worst direction against a search (docs/engineering/seismic-restraint.md §6–§9,
 * docs/engineering/check-values.md CV-33). The independent 6-DOF equilibrium check with mathjs is in
 * tests/reference/restraint-vs-equilibrium.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { degToRad, mmToM } from '../units/convert.js';
import { governingRestraintDemand } from './governing-demand.js';
import { type RestraintDemandInput, restraintForcesInDirection, seismicRestraintDemand } from './restraint-demand.js';

const a = 0.8;
const b = 0.45;
const CORNERS = [
  { x: a, y: b },
  { x: a, y: -b },
  { x: -a, y: b },
  { x: -a, y: -b },
];
const SEISMIC = { sdsG: 1.0, importanceFactor: 1.0, zOverH: 0.5, snubberGapM: mmToM(5) };

describe('seismic restraint demand per mount', () => {
  it('CV-33 [CF]: four equal corner mounts, CG over the centre: shear F/4 in every direction, overturning F·h/4·√(1/a² + 1/b²)', () => {
    const W = 10_000;
    const h = 0.6;
    const r = seismicRestraintDemand({
      ...SEISMIC,
      points: CORNERS,
      verticalStiffnessNPerM: 2e5,
      horizontalStiffnessNPerM: 1.5e5,
      weightN: W,
      cg: { x: 0, y: 0 },
      cgHeightM: h,
    });
    expect(r.designForceN).toBeCloseTo(10_000, 9); // CV-32 a
    const overturning = (10_000 * h * Math.hypot(1 / a, 1 / b)) / 4; // 3824.5 N
    expectRounded(overturning, '3824.5');
    for (const p of r.perPoint) {
      expect(p.deadLoadN).toBeCloseTo(W / 4, 9);
      expect(p.shearN).toBeCloseTo(W / 4, 6);
      expect(p.overturningN).toBeCloseTo(overturning, 6);
      // uplift = max(0, ΔR − (0.9 − 0.2·1.0)·2500) = 3824.5 − 1750 = 2074.5 N; compression = 1.4·2500 + 3824.5 = 7324.5 N
      expectRounded(p.tensionN, '2074.5');
      expectRounded(p.compressionN, '7324.5');
    }
    // the (+a, +b) corner is pressed hardest when the force points along (1/a, 1/b): 60.6° from +x
    expectRounded((r.perPoint[0].compressionDirectionRad * 180) / Math.PI, '60.64');
    expectRounded((r.perPoint[0].tensionDirectionRad * 180) / Math.PI, '240.64');
    expect(r.centreOfStiffness.x).toBeCloseTo(0, 12);
    expect(r.centreOfStiffness.y).toBeCloseTo(0, 12);
  });

  const offset: RestraintDemandInput = {
    ...SEISMIC,
    sdsG: 1.2,
    importanceFactor: 1.5,
    points: [
      { x: 0, y: 0 },
      { x: 1.6, y: 0 },
      { x: 2.4, y: 0.2 },
      { x: 2.2, y: 1.1 },
      { x: 0.9, y: 1.3 },
    ],
    verticalStiffnessNPerM: [3.1e5, 2.4e5, 2.8e5, 3.6e5, 2.2e5],
    horizontalStiffnessNPerM: [2.0e5, 1.5e5, 1.9e5, 2.5e5, 1.2e5],
    weightN: 17_000,
    cg: { x: 1.45, y: 0.55 },
    cgHeightM: 0.85,
  };

  it('[CF] equilibrium in any direction: shears add up to the force, their moment about the CG is zero, ΔR add to zero and resist F·h', () => {
    const F = seismicRestraintDemand(offset).designForceN;
    for (const deg of [0, 37, 90, 151, 222, 300]) {
      const th = degToRad(deg);
      const r = restraintForcesInDirection(offset, th);
      const sx = r.shearXN.reduce((s, v) => s + v, 0);
      const sy = r.shearYN.reduce((s, v) => s + v, 0);
      expect(sx / F).toBeCloseTo(Math.cos(th), 10);
      expect(sy / F).toBeCloseTo(Math.sin(th), 10);
      const torque = offset.points.reduce((s, p, i) => s + (p.x - offset.cg.x) * r.shearYN[i] - (p.y - offset.cg.y) * r.shearXN[i], 0);
      expect(torque / F).toBeCloseTo(0, 10);
      expect(r.overturningN.reduce((s, v) => s + v, 0) / F).toBeCloseTo(0, 10);
      const mx = offset.points.reduce((s, p, i) => s + p.x * r.overturningN[i], 0);
      const my = offset.points.reduce((s, p, i) => s + p.y * r.overturningN[i], 0);
      expect(mx / (F * offset.cgHeightM)).toBeCloseTo(Math.cos(th), 10);
      expect(my / (F * offset.cgHeightM)).toBeCloseTo(Math.sin(th), 10);
    }
  });

  it('the exact worst direction is never beaten by a search over 0.1° steps, and the search comes within 1e-6 of it', () => {
    const env = seismicRestraintDemand(offset);
    const maxShear = offset.points.map(() => 0);
    const maxTension = offset.points.map(() => 0);
    const maxCompression = offset.points.map(() => -Infinity);
    for (let k = 0; k < 3600; k++) {
      const r = restraintForcesInDirection(offset, degToRad(k / 10));
      r.shearN.forEach((v, i) => (maxShear[i] = Math.max(maxShear[i], v)));
      r.tensionN.forEach((v, i) => (maxTension[i] = Math.max(maxTension[i], v)));
      r.compressionN.forEach((v, i) => (maxCompression[i] = Math.max(maxCompression[i], v)));
    }
    env.perPoint.forEach((p, i) => {
      expect(p.shearN).toBeGreaterThanOrEqual(maxShear[i] * (1 - 1e-12));
      expect(p.shearN).toBeLessThanOrEqual(maxShear[i] * (1 + 1e-6));
      expect(p.tensionN).toBeGreaterThanOrEqual(maxTension[i] - 1e-9);
      expect(p.tensionN).toBeLessThanOrEqual(maxTension[i] + 1e-6 * p.overturningN);
      expect(p.compressionN).toBeGreaterThanOrEqual(maxCompression[i] - 1e-9);
      expect(p.compressionN).toBeLessThanOrEqual(maxCompression[i] + 1e-6 * p.overturningN);
      // the reported direction produces the reported demand
      expect(restraintForcesInDirection(offset, p.shearDirectionRad).shearN[i]).toBeCloseTo(p.shearN, 6);
      expect(restraintForcesInDirection(offset, p.compressionDirectionRad).compressionN[i]).toBeCloseTo(p.compressionN, 6);
      expect(p.shearDirectionRad).toBeGreaterThanOrEqual(0);
      expect(p.shearDirectionRad).toBeLessThan(Math.PI);
    });
    expect(env.perPoint.some((p) => p.tensionN > 0)).toBe(true);
  });

  it('a CG below the mount plane turns the overturning round', () => {
    const up = seismicRestraintDemand({ ...offset, cgHeightM: 0.5 });
    const down = seismicRestraintDemand({ ...offset, cgHeightM: -0.5 });
    up.perPoint.forEach((p, i) => {
      expect(down.perPoint[i].overturningN).toBeCloseTo(p.overturningN, 9);
      const turned = (p.compressionDirectionRad + Math.PI) % (2 * Math.PI);
      expect(Math.abs(Math.sin(down.perPoint[i].compressionDirectionRad - turned))).toBeLessThan(1e-9);
    });
  });

  it('refuses bad layouts and stiffnesses with the field named', () => {
    expect(() => seismicRestraintDemand({ ...offset, points: offset.points.slice(0, 2) })).toThrow(VibrationInputError);
    expect(() => seismicRestraintDemand({ ...offset, horizontalStiffnessNPerM: [1, 2] })).toThrow(
      /horizontalStiffnessNPerM: must be one number or 5 values/,
    );
    expect(() => seismicRestraintDemand({ ...offset, verticalStiffnessNPerM: 0 })).toThrow(
      /verticalStiffnessNPerM: must be greater than zero/,
    );
    expect(() => seismicRestraintDemand({ ...offset, cgHeightM: Number.NaN })).toThrow(/cgHeightM/);
    expect(() => restraintForcesInDirection(offset, Number.POSITIVE_INFINITY)).toThrow(/directionRad/);
  });
});

describe('governing restraint check', () => {
  const demand = seismicRestraintDemand({
    ...SEISMIC,
    points: CORNERS,
    verticalStiffnessNPerM: 2e5,
    horizontalStiffnessNPerM: [1.5e5, 1.5e5, 3e5, 1.5e5],
    weightN: 10_000,
    cg: { x: 0.2, y: 0.1 },
    cgHeightM: 0.6,
  }).perPoint;

  it('takes the largest demand/rating, uplift included where there is uplift [DES]', () => {
    const ratings = demand.map(() => ({ shearCapacityN: 10_000, upliftCapacityN: 4_000 }));
    const check = governingRestraintDemand(demand, ratings);
    const all = demand.flatMap((p, i) => [
      { i, kind: 'shear', u: p.shearN / 10_000 },
      ...(p.tensionN > 0 ? [{ i, kind: 'tension', u: p.tensionN / 4_000 }] : []),
    ]);
    const worst = all.reduce((m, c) => (c.u > m.u ? c : m));
    expect(check.governing.pointIndex).toBe(worst.i);
    expect(check.governing.kind).toBe(worst.kind);
    expect(check.governing.utilisation).toBeCloseTo(worst.u, 12);
    const p = demand[worst.i];
    expect(check.governing.directionRad).toBe(worst.kind === 'shear' ? p.shearDirectionRad : p.tensionDirectionRad);
  });

  it('without ratings the largest shear governs, with no utilisation', () => {
    const check = governingRestraintDemand(
      demand,
      demand.map(() => ({ shearCapacityN: null, upliftCapacityN: null })),
    );
    const largest = Math.max(...demand.map((p) => p.shearN));
    expect(check.governing.kind).toBe('shear');
    expect(check.governing.demandN).toBe(largest);
    expect(check.governing.utilisation).toBeNull();
    expect(check.perPoint.every((u) => u.shear === null && u.tension === null)).toBe(true);
  });

  it('refuses a rating list of the wrong length and negative ratings', () => {
    expect(() => governingRestraintDemand(demand, [])).toThrow(/ratings: must have 4 entries/);
    expect(() =>
      governingRestraintDemand(
        demand,
        demand.map(() => ({ shearCapacityN: -1, upliftCapacityN: null })),
      ),
    ).toThrow(VibrationInputError);
  });
});
