/**
 * 6-DOF eigenvalues against two independent solvers, for random layouts:
 *  1. mathjs `eigs` of the symmetric M^(−1/2)·K·M^(−1/2) (mathjs `sqrtm`, no Cholesky);
 *  2. ml-matrix's general (non-symmetric) EigenvalueDecomposition of M⁻¹·K.
 * The package itself uses Cholesky + ml-matrix's symmetric decomposition.
 */
import fc from 'fast-check';
import * as math from 'mathjs';
import { EigenvalueDecomposition, Matrix, inverse } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { type ResilientMount, massProperties, rigidBodyModes, rotationAboutAxis } from './vibration.js';

const layoutArb = fc.record({
  massKg: fc.double({ min: 50, max: 5000, noNaN: true }),
  dims: fc.tuple(
    fc.double({ min: 0.3, max: 3, noNaN: true }),
    fc.double({ min: 0.3, max: 2, noNaN: true }),
    fc.double({ min: 0.2, max: 1.5, noNaN: true }),
  ),
  // a second lumped mass makes the inertia tensor non-diagonal
  extra: fc.record({
    massKg: fc.double({ min: 1, max: 500, noNaN: true }),
    x: fc.double({ min: -1, max: 1, noNaN: true }),
    y: fc.double({ min: -0.5, max: 0.5, noNaN: true }),
    z: fc.double({ min: -0.3, max: 0.8, noNaN: true }),
  }),
  mounts: fc.array(
    fc.record({
      x: fc.double({ min: -1.5, max: 1.5, noNaN: true }),
      y: fc.double({ min: -1, max: 1, noNaN: true }),
      z: fc.double({ min: -0.6, max: 0.1, noNaN: true }),
      kh: fc.double({ min: 2e4, max: 5e5, noNaN: true }),
      kh2: fc.double({ min: 2e4, max: 5e5, noNaN: true }),
      kv: fc.double({ min: 5e4, max: 2e6, noNaN: true }),
      turn: fc.double({ min: 0, max: Math.PI, noNaN: true }),
    }),
    { minLength: 3, maxLength: 8 },
  ),
});

type Layout = typeof layoutArb extends fc.Arbitrary<infer T> ? T : never;

/** True when the mounts span a plan area, so that K is positive definite. */
function spread(l: Layout): boolean {
  const n = l.mounts.length;
  const mx = l.mounts.reduce((s, p) => s + p.x, 0) / n;
  const my = l.mounts.reduce((s, p) => s + p.y, 0) / n;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (const p of l.mounts) {
    sxx += (p.x - mx) ** 2;
    syy += (p.y - my) ** 2;
    sxy += (p.x - mx) * (p.y - my);
  }
  return sxx * syy - sxy * sxy > 1e-3;
}

function buildModel(l: Layout) {
  const props = massProperties([
    { shape: 'box', massKg: l.massKg, cg: { x: 0, y: 0, z: 0 }, dimensions: { x: l.dims[0], y: l.dims[1], z: l.dims[2] } },
    { massKg: l.extra.massKg, cg: { x: l.extra.x, y: l.extra.y, z: l.extra.z } },
  ]);
  const mounts: ResilientMount[] = l.mounts.map((p) => ({
    position: { x: p.x, y: p.y, z: p.z },
    stiffness: { x: p.kh, y: p.kh2, z: p.kv },
    orientation: rotationAboutAxis('z', p.turn),
  }));
  return { massKg: props.massKg, inertia: props.inertia, cg: props.cg, mounts };
}

function sortedAsc(values: number[]): number[] {
  return [...values].sort((a, b) => a - b);
}

describe('6-DOF eigenvalues vs second solvers (random layouts)', () => {
  it('mathjs eigs of M^(−1/2)·K·M^(−1/2) and ml-matrix general EVD of M⁻¹K agree with the package', () => {
    fc.assert(
      fc.property(layoutArb, (l) => {
        fc.pre(spread(l));
        const r = rigidBodyModes(buildModel(l));
        const ours = r.modes.map((m) => m.eigenvalue);

        // 1. mathjs, symmetric form without Cholesky
        const M = r.massMatrix;
        const K = r.stiffnessMatrix;
        const mInvSqrt = math.sqrtm(math.inv(M)) as number[][];
        const A = math.multiply(math.multiply(mInvSqrt, K), mInvSqrt) as number[][];
        const sym = A.map((row, i) => row.map((v, j) => 0.5 * (v + A[j][i])));
        const mathjsValues = sortedAsc((math.eigs(sym).values as number[]).map(Number));

        // 2. ml-matrix general eigen-decomposition of M⁻¹K (non-symmetric)
        const evd = new EigenvalueDecomposition(inverse(new Matrix(M)).mmul(new Matrix(K)));
        const generalValues = sortedAsc(evd.realEigenvalues);
        expect(Math.max(...evd.imaginaryEigenvalues.map(Math.abs))).toBeLessThan(1e-6 * Math.max(...generalValues));

        // relative to the largest eigenvalue; the non-symmetric solver and sqrtm lose a few digits
        const scale = Math.max(...ours);
        for (let i = 0; i < 6; i++) {
          expect(Math.abs(ours[i] - mathjsValues[i]) / scale).toBeLessThan(1e-7);
          expect(Math.abs(ours[i] - generalValues[i]) / scale).toBeLessThan(1e-7);
        }
      }),
      { numRuns: 60 },
    );
  });
});
