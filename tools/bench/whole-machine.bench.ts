/**
 * Benchmark of the whole-machine kernel (packages/vibration/src/whole-machine), beside a bare
 * loop doing the same arithmetic inline in the same run. Run from the repository root:
 *
 *   npx tsx tools/bench/whole-machine.bench.ts
 *
 * One candidate as the selection judges it with Model 2: 6 mounts, a speed range 900–1800 rpm,
 * 3 sources (unbalance, order-2 force, fixed 100 Hz), both ends of a ±15 % stiffness band:
 * 2 × prepareWholeMachine + 6 × speedSweep (modes given, as the server has them already).
 * The bare loop assembles K, H and M inline and solves the same number of 6×6 complex systems on
 * the same speeds with an inline elimination. Demo numbers are invented.
 * Figures: docs/engineering/whole-machine.md §7, §11.
 */
import {
  type SpeedSource,
  type WholeMachineModel,
  boxInertia,
  hystereticDamping,
  prepareWholeMachine,
  rigidBodyModes,
  sourceFrequencyHz,
  speedSweep,
  sweepGrid,
  crossingSpeeds,
} from '../../packages/vibration/src/index.js';
import { reportFigure } from './bench-result.js';

const MIN_RPM = 900;
const MAX_RPM = 1800;
const BAND = [0.85, 1.15];
const model: WholeMachineModel = {
  body: { massKg: 1400, cg: { x: 0.08, y: -0.03, z: 0.55 }, inertia: boxInertia(1400, { x: 2.2, y: 1.0, z: 1.1 }) },
  mounts: [1.0, 0, -1.0].flatMap((x) =>
    [0.45, -0.45].map((y) => ({ position: { x, y, z: 0 }, stiffness: { x: 2.2e5, y: 2.6e5, z: 4.1e5 }, damping: hystereticDamping(0.12) })),
  ),
};
const SOURCES: SpeedSource[] = [
  { at: { x: 0.7, y: 0, z: 0.9 }, kind: 'rotating', axis: 'x', order: 1, unbalance: { rotorMassKg: 60, balanceGradeMmPerS: 6.3 } },
  { at: { x: -0.6, y: 0.1, z: 0.7 }, kind: 'directional', axis: 'y', order: 2, amplitudeN: 200 },
  { at: { x: -0.6, y: 0.1, z: 0.7 }, kind: 'directional', axis: 'z', frequencyHz: 100, amplitudeN: 120 },
];
const baseModes = rigidBodyModes({
  massKg: model.body.massKg,
  inertia: model.body.inertia,
  cg: model.body.cg,
  mounts: model.mounts,
}).modes.map((m) => m.frequencyHz);

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}
function time(fn: () => void, runs: number, warmup: number): number {
  for (let i = 0; i < warmup; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
  }
  return median(t);
}

let sink = 0;
let solvesPerCandidate = 0;
function candidateLibrary(): void {
  solvesPerCandidate = 0;
  for (const phi of BAND) {
    const sys = prepareWholeMachine(model, { stiffnessFactor: phi });
    const modes = baseModes.map((f) => f * Math.sqrt(phi)); // K → φK scales every ω² by φ
    for (const source of SOURCES) {
      const r = speedSweep(sys, { source, minRpm: MIN_RPM, maxRpm: MAX_RPM, modeFrequenciesHz: modes });
      sink += r.worst.transmissibility;
      solvesPerCandidate += r.evaluations;
    }
  }
}

// ---- bare: the same solves inline ---------------------------------------------------------
const n = model.mounts.length;
const speedsPerSource = BAND.map((phi) =>
  SOURCES.map((s) => {
    if (s.frequencyHz !== undefined) return [MIN_RPM];
    const modes = baseModes.map((f) => f * Math.sqrt(phi));
    const cr = crossingSpeeds({ modeFrequenciesHz: modes, order: s.order ?? 1, minRpm: MIN_RPM, maxRpm: MAX_RPM }).map((c) => c.speedRpm);
    const g = Array.from(sweepGrid(MIN_RPM, MAX_RPM, [], cr));
    return [...g, ...new Array<number>(18).fill(g[Math.floor(g.length / 2)])]; // + the refinement's solves
  }),
);
const K = new Float64Array(36);
const H = new Float64Array(36);
const M = new Float64Array(36);
const ar = new Float64Array(36);
const ai = new Float64Array(36);
const br = new Float64Array(6);
const bi = new Float64Array(6);
const lr0 = new Float64Array(6);
const li0 = new Float64Array(6);
const px = new Float64Array(3 * n);
const kk = new Float64Array(3 * n);
function candidateBare(): void {
  const { body, mounts } = model;
  for (let bandIndex = 0; bandIndex < BAND.length; bandIndex++) {
    const phi = BAND[bandIndex];
    K.fill(0);
    H.fill(0);
    M.fill(0);
    M[0] = M[7] = M[14] = body.massKg;
    const j = body.inertia;
    M[21] = j.xx;
    M[28] = j.yy;
    M[35] = j.zz;
    M[22] = M[27] = j.xy;
    M[23] = M[33] = j.xz;
    M[29] = M[34] = j.yz;
    for (let i = 0; i < n; i++) {
      const m = mounts[i];
      const rx = (px[3 * i] = m.position.x - body.cg.x);
      const ry = (px[3 * i + 1] = m.position.y - body.cg.y);
      const rz = (px[3 * i + 2] = m.position.z - body.cg.z);
      const k = [(kk[3 * i] = phi * m.stiffness.x), (kk[3 * i + 1] = phi * m.stiffness.y), (kk[3 * i + 2] = phi * m.stiffness.z)];
      const T = [
        [1, 0, 0, 0, rz, -ry],
        [0, 1, 0, -rz, 0, rx],
        [0, 0, 1, ry, -rx, 0],
      ];
      for (let a = 0; a < 6; a++)
        for (let b = 0; b < 6; b++) {
          const v = T[0][a] * k[0] * T[0][b] + T[1][a] * k[1] * T[1][b] + T[2][a] * k[2] * T[2][b];
          K[6 * a + b] += v;
          H[6 * a + b] += 0.12 * v;
        }
    }
    for (let si = 0; si < SOURCES.length; si++) {
      const s = SOURCES[si];
      const r = [s.at.x - body.cg.x, s.at.y - body.cg.y, s.at.z - body.cg.z];
      const fr = [0, 0, 0];
      const fi = [0, 0, 0];
      const a = { x: 0, y: 1, z: 2 }[s.axis];
      if (s.kind === 'directional') fr[a] = 1;
      else {
        fr[(a + 1) % 3] = 1;
        fi[(a + 2) % 3] = -1;
      }
      for (const [f, l] of [
        [fr, lr0],
        [fi, li0],
      ] as const) {
        l[0] = f[0];
        l[1] = f[1];
        l[2] = f[2];
        l[3] = r[1] * f[2] - r[2] * f[1];
        l[4] = r[2] * f[0] - r[0] * f[2];
        l[5] = r[0] * f[1] - r[1] * f[0];
      }
      let worst = 0;
      for (const speed of speedsPerSource[bandIndex][si]) {
        const w = 2 * Math.PI * sourceFrequencyHz(s, speed);
        for (let e = 0; e < 36; e++) {
          ar[e] = K[e] - w * w * M[e];
          ai[e] = H[e];
        }
        br.set(lr0);
        bi.set(li0);
        for (let c = 0; c < 6; c++) {
          let p = c;
          let best = ar[7 * c] ** 2 + ai[7 * c] ** 2;
          for (let rr = c + 1; rr < 6; rr++) {
            const v = ar[6 * rr + c] ** 2 + ai[6 * rr + c] ** 2;
            if (v > best) [best, p] = [v, rr];
          }
          if (p !== c) {
            for (let k2 = 0; k2 < 6; k2++) {
              [ar[6 * c + k2], ar[6 * p + k2]] = [ar[6 * p + k2], ar[6 * c + k2]];
              [ai[6 * c + k2], ai[6 * p + k2]] = [ai[6 * p + k2], ai[6 * c + k2]];
            }
            [br[c], br[p]] = [br[p], br[c]];
            [bi[c], bi[p]] = [bi[p], bi[c]];
          }
          const ir = ar[7 * c] / best;
          const ii = -ai[7 * c] / best;
          for (let rr = c + 1; rr < 6; rr++) {
            const xr = ar[6 * rr + c];
            const xi = ai[6 * rr + c];
            const lr = xr * ir - xi * ii;
            const li = xr * ii + xi * ir;
            for (let k2 = c + 1; k2 < 6; k2++) {
              ar[6 * rr + k2] -= lr * ar[6 * c + k2] - li * ai[6 * c + k2];
              ai[6 * rr + k2] -= lr * ai[6 * c + k2] + li * ar[6 * c + k2];
            }
            const b0 = br[c];
            const b1 = bi[c];
            br[rr] -= lr * b0 - li * b1;
            bi[rr] -= lr * b1 + li * b0;
          }
        }
        for (let rr = 5; rr >= 0; rr--) {
          let sr = br[rr];
          let sim = bi[rr];
          for (let k2 = rr + 1; k2 < 6; k2++) {
            sr -= ar[6 * rr + k2] * br[k2] - ai[6 * rr + k2] * bi[k2];
            sim -= ar[6 * rr + k2] * bi[k2] + ai[6 * rr + k2] * br[k2];
          }
          const d2 = ar[7 * rr] ** 2 + ai[7 * rr] ** 2;
          br[rr] = (sr * ar[7 * rr] + sim * ai[7 * rr]) / d2;
          bi[rr] = (sim * ar[7 * rr] - sr * ai[7 * rr]) / d2;
        }
        let sum = 0;
        for (let i = 0; i < n; i++) {
          const [rx, ry, rz] = [px[3 * i], px[3 * i + 1], px[3 * i + 2]];
          const u = [
            br[0] + br[4] * rz - br[5] * ry,
            br[1] + br[5] * rx - br[3] * rz,
            br[2] + br[3] * ry - br[4] * rx,
            bi[0] + bi[4] * rz - bi[5] * ry,
            bi[1] + bi[5] * rx - bi[3] * rz,
            bi[2] + bi[3] * ry - bi[4] * rx,
          ];
          let rr2 = 0;
          let ii2 = 0;
          let ri = 0;
          for (let p2 = 0; p2 < 3; p2++) {
            const k = kk[3 * i + p2];
            const fre = k * (u[p2] - 0.12 * u[3 + p2]);
            const fim = k * (u[3 + p2] + 0.12 * u[p2]);
            rr2 += fre * fre;
            ii2 += fim * fim;
            ri += fre * fim;
          }
          sum += Math.sqrt(0.5 * (rr2 + ii2 + Math.hypot(rr2 - ii2, 2 * ri)));
        }
        if (sum > worst) worst = sum;
      }
      sink += worst;
    }
  }
}

candidateLibrary();
const bareSolves = speedsPerSource.flat().reduce((s, g) => s + g.length, 0);
const CANDIDATES = 200;
const lib =
  time(
    () => {
      for (let c = 0; c < CANDIDATES; c++) candidateLibrary();
    },
    9,
    3,
  ) / CANDIDATES;
const bare =
  time(
    () => {
      for (let c = 0; c < CANDIDATES; c++) candidateBare();
    },
    9,
    3,
  ) / CANDIDATES;
console.log(`whole-machine kernel — Node ${process.version}, medians per candidate`);
console.log(`library: ${lib.toFixed(3)} ms (${solvesPerCandidate} solves); bare inline loop: ${bare.toFixed(3)} ms (${bareSolves} solves)`);
console.log(`per solve: library ${((lib / solvesPerCandidate) * 1000).toFixed(2)} µs, bare ${((bare / bareSolves) * 1000).toFixed(2)} µs`);
if (!Number.isFinite(sink)) console.log('unexpected non-finite result');
reportFigure({
  figure: 'whole-machine: one candidate, 6 mounts, 3 sources × 2 band ends over 900–1800 rpm',
  value: lib,
  unit: 'ms',
  bare,
  ratioTarget: 2,
});
