/**
 * Benchmark of the @tacet/vibration hot paths, each beside a bare loop that computes the same
 * figures inline in the same run. Run from the repository root:
 *
 *   npx tsx tools/bench/vibration.bench.ts
 *
 * 1. Selection kernel: rigid-frame loads on 6 mount points + bounce natural frequency +
 *    transmissibility at 3 disturbing frequencies for 100,000 candidates (target < 20 ms,
 *    no per-candidate allocation: all buffers are allocated once, before timing).
 * 2. One 6-DOF rigid-body mode solve (target < 0.2 ms).
 *
 * Prints medians of repeated runs and the ratio library / bare loop. Demo numbers are invented.
 */
import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, inverse } from 'ml-matrix';
import {
  boxInertia,
  mountLoadsBatch,
  prepareMountLayout,
  rigidBodyModes,
  transmissibilityBatch,
  type ResilientMount,
} from '../../packages/vibration/src/index.js';
import { reportFigure } from './bench-result.js';
import { medianRunMs as time } from './timing.js';

const CANDIDATES = 100_000;
const POINTS = [
  { x: 0.9, y: 0.45 },
  { x: 0.9, y: -0.45 },
  { x: 0, y: 0.45 },
  { x: 0, y: -0.45 },
  { x: -0.9, y: 0.45 },
  { x: -0.9, y: -0.45 },
];
const N = POINTS.length;
const MASS = 1000;
const WEIGHT = MASS * 9.80665;
const CG = { x: 0.06, y: 0.015 };
const FREQS = [24.667, 49.333, 100];
const NF = FREQS.length;

// ---- candidate data (invented), allocated once -------------------------------------------
let seed = 12345;
const rnd = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
const stiffness = new Float64Array(CANDIDATES * N);
const dynRatio = new Float64Array(CANDIDATES);
const damping = new Float64Array(CANDIDATES);
const isHyst = new Uint8Array(CANDIDATES);
for (let c = 0; c < CANDIDATES; c++) {
  const base = 5e4 + rnd() * 1e6;
  for (let i = 0; i < N; i++) stiffness[c * N + i] = base * (0.9 + 0.2 * rnd());
  isHyst[c] = rnd() < 0.6 ? 1 : 0;
  dynRatio[c] = isHyst[c] ? 1.2 + rnd() * 0.8 : 1;
  damping[c] = isHyst[c] ? 0.05 + rnd() * 0.25 : 0.005 + rnd() * 0.05;
}
const loadsLib = new Float64Array(CANDIDATES * N);
const fnLib = new Float64Array(CANDIDATES);
const sumK = new Float64Array(CANDIDATES);
const tLib = new Float64Array(CANDIDATES * NF);
const loadsBare = new Float64Array(CANDIDATES * N);
const fnBare = new Float64Array(CANDIDATES);
const tBare = new Float64Array(CANDIDATES * NF);
const layout = prepareMountLayout(POINTS);
const px = Float64Array.from(POINTS, (p) => p.x);
const py = Float64Array.from(POINTS, (p) => p.y);
const twoPi = 2 * Math.PI;

function selectionLibrary(): void {
  mountLoadsBatch(layout, WEIGHT, CG.x, CG.y, stiffness, loadsLib, sumK);
  for (let c = 0; c < CANDIDATES; c++) fnLib[c] = Math.sqrt((dynRatio[c] * sumK[c]) / MASS) / twoPi;
  transmissibilityBatch(fnLib, damping, isHyst, FREQS, tLib);
}

function selectionBare(): void {
  for (let c = 0; c < CANDIDATES; c++) {
    const o = c * N;
    let ks = 0;
    let kx = 0;
    let ky = 0;
    for (let i = 0; i < N; i++) {
      const k = stiffness[o + i];
      ks += k;
      kx += k * px[i];
      ky += k * py[i];
    }
    const xc = kx / ks;
    const yc = ky / ks;
    let kxx = 0;
    let kyy = 0;
    let kxy = 0;
    for (let i = 0; i < N; i++) {
      const k = stiffness[o + i];
      const dx = px[i] - xc;
      const dy = py[i] - yc;
      kxx += k * dx * dx;
      kyy += k * dy * dy;
      kxy += k * dx * dy;
    }
    const det = kxx * kyy - kxy * kxy;
    const mx = WEIGHT * (CG.x - xc);
    const my = WEIGHT * (CG.y - yc);
    const bx = (kyy * mx - kxy * my) / det;
    const by = (kxx * my - kxy * mx) / det;
    const w0 = WEIGHT / ks;
    for (let i = 0; i < N; i++) loadsBare[o + i] = stiffness[o + i] * (w0 + bx * (px[i] - xc) + by * (py[i] - yc));
    const fn = Math.sqrt((dynRatio[c] * ks) / MASS) / twoPi;
    fnBare[c] = fn;
    const v = damping[c];
    for (let j = 0; j < NF; j++) {
      const r = FREQS[j] / fn;
      const r2 = r * r;
      const a = 1 - r2;
      const d = isHyst[c] ? v * v : 4 * v * v * r2;
      const num = isHyst[c] ? 1 + v * v : 1 + d;
      tBare[c * NF + j] = Math.sqrt(num / (a * a + d));
    }
  }
}

// ---- 6-DOF ----------------------------------------------------------------------------------
const body = { massKg: 1000, inertia: boxInertia(1000, { x: 2, y: 1, z: 0.8 }) };
const mounts: ResilientMount[] = [0.9, -0.9].flatMap((x) =>
  [0.45, -0.4].map((y) => ({ position: { x, y, z: -0.4 }, stiffness: { x: 1e5, y: 1.2e5, z: 2.5e5 } })),
);
let sinkLib = 0;
let sinkBare = 0;

function modesLibrary(): void {
  const r = rigidBodyModes({ ...body, mounts });
  sinkLib = r.modes[0].frequencyHz;
}

/** Same figures (six frequencies, sorted) with the same ml-matrix solver, assembled inline, no checks or naming. */
function modesBare(): number[] {
  const M = new Matrix(6, 6);
  const K = new Matrix(6, 6);
  const j = body.inertia;
  M.set(0, 0, 1000).set(1, 1, 1000).set(2, 2, 1000);
  M.set(3, 3, j.xx).set(4, 4, j.yy).set(5, 5, j.zz);
  for (const m of mounts) {
    const { x: rx, y: ry, z: rz } = m.position;
    const kd = [m.stiffness.x, m.stiffness.y, m.stiffness.z];
    const T = [
      [1, 0, 0, 0, rz, -ry],
      [0, 1, 0, -rz, 0, rx],
      [0, 0, 1, ry, -rx, 0],
    ];
    for (let a = 0; a < 6; a++)
      for (let b = 0; b < 6; b++)
        K.set(a, b, K.get(a, b) + T[0][a] * kd[0] * T[0][b] + T[1][a] * kd[1] * T[1][b] + T[2][a] * kd[2] * T[2][b]);
  }
  const L = new CholeskyDecomposition(M).lowerTriangularMatrix;
  const Li = inverse(L);
  const A = Li.mmul(K).mmul(Li.transpose());
  const lam = new EigenvalueDecomposition(A, { assumeSymmetric: true }).realEigenvalues.sort((a, b) => a - b);
  const f = lam.map((l) => Math.sqrt(l) / twoPi);
  sinkBare = f[0];
  return f;
}

// ---- run ------------------------------------------------------------------------------------
selectionLibrary();
selectionBare();
let maxDiff = 0;
for (let i = 0; i < loadsLib.length; i++) maxDiff = Math.max(maxDiff, Math.abs(loadsLib[i] - loadsBare[i]) / WEIGHT);
for (let i = 0; i < tLib.length; i++) maxDiff = Math.max(maxDiff, Math.abs(tLib[i] - tBare[i]));
const libFreqs = rigidBodyModes({ ...body, mounts }).modes.map((m) => m.frequencyHz);
const bareFreqs = modesBare();
const modesDiff = Math.max(...libFreqs.map((f, i) => Math.abs(f - bareFreqs[i])));

const selLib = time(selectionLibrary, 15, 5);
const selBare = time(selectionBare, 15, 5);
const SOLVES = 2000;
const modLib =
  time(
    () => {
      for (let i = 0; i < SOLVES; i++) modesLibrary();
    },
    7,
    2,
  ) / SOLVES;
const modBare =
  time(
    () => {
      for (let i = 0; i < SOLVES; i++) modesBare();
    },
    7,
    2,
  ) / SOLVES;

const rows = [
  ['selection kernel: loads + fn + T, 100,000 × 6 points × 3 freqs', selLib, selBare, 20],
  ['6-DOF rigid-body modes, one solve', modLib, modBare, 0.2],
] as const;
const pad = (s: string, n: number) => s.padEnd(n);
const num = (v: number) => (v < 1 ? v.toFixed(4) : v.toFixed(2)).padStart(10);
console.log(`@tacet/vibration benchmark — Node ${process.version}, medians`);
console.log(`${pad('case', 66)}${'library ms'.padStart(10)}${'bare ms'.padStart(10)}${'ratio'.padStart(8)}${'target ms'.padStart(11)}  ok`);
for (const [name, lib, bare, target] of rows) {
  console.log(
    `${pad(name, 66)}${num(lib)}${num(bare)}${(lib / bare).toFixed(2).padStart(8)}${String(target).padStart(11)}  ${lib < target ? 'yes' : 'NO'}`,
  );
}
console.log(
  `same figures: selection max |Δ| = ${maxDiff.toExponential(1)} (loads/W, T); modes max |Δf| = ${modesDiff.toExponential(1)} Hz`,
);
if (!Number.isFinite(sinkLib + sinkBare)) console.log('unexpected non-finite result');
for (const [name, lib, bare, target] of rows) reportFigure({ figure: name, value: lib, unit: 'ms', target, bare });
