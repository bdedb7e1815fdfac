/**
 * Property tests (fast-check) of physical invariants: statics of the rigid frame, monotonic
 * isolation above √2, and scaling of the rigid-body frequencies.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hystereticDamping, mountLoads, rigidBodyModes, transmissibility, viscousDamping } from './vibration.js';

const point = fc.record({ x: fc.double({ min: -2, max: 2, noNaN: true }), y: fc.double({ min: -1.5, max: 1.5, noNaN: true }) });

function planArea(points: { x: number; y: number }[]): number {
  // twice the area spanned about the centroid via the second-moment determinant
  const n = points.length;
  const mx = points.reduce((s, p) => s + p.x, 0) / n;
  const my = points.reduce((s, p) => s + p.y, 0) / n;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (const p of points) {
    sxx += (p.x - mx) ** 2;
    syy += (p.y - my) ** 2;
    sxy += (p.x - mx) * (p.y - my);
  }
  return sxx * syy - sxy * sxy;
}

describe('rigid-frame loads (property)', () => {
  it('loads sum to W and their moments equal W·x_G and W·y_G; a CG inside the polygon gives no polygon warning', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({ p: point, k: fc.double({ min: 1e4, max: 1e7, noNaN: true }), w: fc.double({ min: 0.05, max: 1, noNaN: true }) }),
          {
            minLength: 3,
            maxLength: 10,
          },
        ),
        fc.double({ min: 100, max: 1e6, noNaN: true }),
        (mounts, weightN) => {
          const points = mounts.map((m) => m.p);
          fc.pre(planArea(points) > 1e-2);
          // CG as a convex combination with positive weights → strictly inside the hull
          const ws = mounts.reduce((s, m) => s + m.w, 0);
          const cg = {
            x: mounts.reduce((s, m) => s + m.w * m.p.x, 0) / ws,
            y: mounts.reduce((s, m) => s + m.w * m.p.y, 0) / ws,
          };
          const r = mountLoads({ points, stiffnessNPerM: mounts.map((m) => m.k), weightN, cg });
          const sum = r.loadsN.reduce((s, f) => s + f, 0);
          const mx = r.loadsN.reduce((s, f, i) => s + f * points[i].x, 0);
          const my = r.loadsN.reduce((s, f, i) => s + f * points[i].y, 0);
          const tol = 1e-8 * weightN * 3;
          expect(Math.abs(sum - weightN)).toBeLessThan(tol);
          expect(Math.abs(mx - weightN * cg.x)).toBeLessThan(tol);
          expect(Math.abs(my - weightN * cg.y)).toBeLessThan(tol);
          expect(r.warnings.some((w) => w.code === 'cg-outside-mount-polygon')).toBe(false);
          // rigid plane: every deflection lies on w + β_x·x + β_y·y
          r.deflectionsM.forEach((d, i) => {
            const plane = r.deflectionAtOriginM + r.tiltX * points[i].x + r.tiltY * points[i].y;
            expect(Math.abs(d - plane)).toBeLessThan(1e-9 * Math.max(...r.deflectionsM.map(Math.abs)) + 1e-15);
          });
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('transmissibility (property)', () => {
  it('T decreases with r above √2 for any viscous ζ or hysteretic η', () => {
    fc.assert(
      fc.property(
        fc.double({ min: Math.SQRT2, max: 1000, noNaN: true }),
        fc.double({ min: 1e-3, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        fc.boolean(),
        (r, step, d, hysteretic) => {
          const damping = hysteretic ? hystereticDamping(d) : viscousDamping(d);
          const t1 = transmissibility(r, damping);
          const t2 = transmissibility(r * (1 + step), damping);
          expect(t2).toBeLessThan(t1);
          expect(t1).toBeLessThanOrEqual(1 + 1e-12);
        },
      ),
      { numRuns: 1000 },
    );
  });
});

describe('rigid-body modes (property)', () => {
  const layout = fc.record({
    massKg: fc.double({ min: 50, max: 5000, noNaN: true }),
    inertia: fc.tuple(
      fc.double({ min: 5, max: 2000, noNaN: true }),
      fc.double({ min: 5, max: 2000, noNaN: true }),
      fc.double({ min: 5, max: 2000, noNaN: true }),
    ),
    mounts: fc.array(
      fc.record({
        p: point,
        z: fc.double({ min: -0.8, max: 0.2, noNaN: true }),
        kh: fc.double({ min: 1e4, max: 1e6, noNaN: true }),
        kv: fc.double({ min: 1e4, max: 3e6, noNaN: true }),
      }),
      { minLength: 3, maxLength: 8 },
    ),
    s: fc.double({ min: 0.01, max: 100, noNaN: true }),
  });

  it('frequencies are positive for ≥ 3 non-collinear mounts, and scaling all stiffnesses by s scales them by √s', () => {
    fc.assert(
      fc.property(layout, (l) => {
        fc.pre(planArea(l.mounts.map((m) => m.p)) > 1e-2);
        const [ixx, iyy, izz] = l.inertia;
        const inertia = { xx: ixx, yy: iyy, zz: izz, xy: 0, xz: 0, yz: 0 };
        const mounts = (scale: number) =>
          l.mounts.map((m) => ({
            position: { x: m.p.x, y: m.p.y, z: m.z },
            stiffness: { x: m.kh * scale, y: m.kh * scale, z: m.kv * scale },
          }));
        const a = rigidBodyModes({ massKg: l.massKg, inertia, mounts: mounts(1) });
        const b = rigidBodyModes({ massKg: l.massKg, inertia, mounts: mounts(l.s) });
        for (let i = 0; i < 6; i++) {
          expect(a.modes[i].status).toBe('ok');
          expect(a.modes[i].frequencyHz).toBeGreaterThan(0);
          expect(b.modes[i].frequencyHz / a.modes[i].frequencyHz).toBeCloseTo(Math.sqrt(l.s), 7);
        }
      }),
      { numRuns: 150 },
    );
  });
});
