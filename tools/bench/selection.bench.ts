/**
 * Benchmark of POST /api/selection over a 100,000-mount catalog (PRODUCT.md, Targets): p95
 * under 100 ms through HTTP on this machine, and within 2× of a bare loop in the same run that
 * reads the same rows with a better-sqlite3 prepared statement (same prefilter, same file) and
 * computes the same figures inline. Run from the repository root after building the server:
 *
 *   npm run build -w @tacet/vibration && npm run build -w @tacet/server
 *   npx tsx tools/bench/selection.bench.ts            (--rows N, --requests N, --keep to keep the temp folder)
 *
 * Steps: generate the invented catalog with writeDemoCatalog into a temp folder, start the built
 * server (demo mode, for its accounts) on a free port with that folder as its data folder,
 * import the file through POST /api/mounts/import, then fire selections with 4, 6 and 8 mount
 * points and 3 disturbing frequencies, one request at a time. The server and the temp folder are
 * removed at the end.
 */
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import {
  createLevellingWorkspace,
  isInsideConvexHull,
  massProperties,
  mountLoads,
  prepareMountLayout,
  rigidBodyModes,
  selectSizesForLevellingInto,
  type AssemblyComponent,
} from '../../packages/vibration/src/index.js';
import { writeDemoCatalog } from '../catalog/generate-demo-catalog.js';
import { signIn } from '../harness/fixtures.mjs';
import type { TacetServer } from '../harness/server.mjs';
import { reportFigure } from './bench-result.js';
import { percentile, startBenchServer } from './server-bench-support.js';

const arg = (name: string, fallback: number): number => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
};
const ROWS = arg('rows', 100_000);
const REQUESTS = arg('requests', 200);
const WARMUP = 20;
const LIMIT = 20;
const FREQUENCIES = [1480 / 60, 2 * (1480 / 60), 100];

// ---- scenarios (invented machines; per-point loads ~2–3 kN) ---------------------------------
interface Scenario {
  name: string;
  components: { name: string; massKg: number; cg: { x: number; y: number; z: number }; box?: { lx: number; ly: number; lz: number } }[];
  mountPoints: { label: string; x: number; y: number; z: number }[];
}
const row = (xs: number[], ys: number[]) => xs.flatMap((x, i) => ys.map((y, j) => ({ label: `P${i * ys.length + j + 1}`, x, y, z: 0 })));
const SCENARIOS: Scenario[] = [
  {
    name: '4 points',
    components: [
      { name: 'Pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 }, box: { lx: 0.6, ly: 0.4, lz: 0.5 } },
      { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 }, box: { lx: 0.8, ly: 0.4, lz: 0.4 } },
      { name: 'Frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 }, box: { lx: 1.8, ly: 1.0, lz: 0.2 } },
    ],
    mountPoints: row([0.8, -0.8], [0.45, -0.45]),
  },
  {
    name: '6 points',
    components: [
      { name: 'Pump', massKg: 500, cg: { x: 0.9, y: 0.05, z: 0.55 }, box: { lx: 0.8, ly: 0.5, lz: 0.6 } },
      { name: 'Motor', massKg: 700, cg: { x: -0.4, y: 0, z: 0.5 }, box: { lx: 1.0, ly: 0.5, lz: 0.5 } },
      { name: 'Frame', massKg: 400, cg: { x: 0, y: 0, z: 0.1 }, box: { lx: 2.6, ly: 1.1, lz: 0.2 } },
    ],
    mountPoints: row([1.2, 0, -1.2], [0.5, -0.5]),
  },
  {
    name: '8 points',
    components: [
      { name: 'Compressor', massKg: 800, cg: { x: 0.8, y: 0.05, z: 0.6 }, box: { lx: 1.0, ly: 0.7, lz: 0.8 } },
      { name: 'Motor', massKg: 900, cg: { x: -0.7, y: 0, z: 0.5 }, box: { lx: 1.1, ly: 0.6, lz: 0.6 } },
      { name: 'Frame', massKg: 500, cg: { x: 0, y: 0, z: 0.1 }, box: { lx: 3.2, ly: 1.2, lz: 0.2 } },
    ],
    mountPoints: row([1.5, 0.5, -0.5, -1.5], [0.55, -0.55]),
  },
];
const CRITERIA = { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0 };

// ---- helpers ----------------------------------------------------------------------------------
const fmt = (ms: number) => ms.toFixed(1).padStart(7);

// ---- the bare baseline: prepared statement + the same math inline --------------------------
/** The columns the server reads, in its order (CATALOG_COLUMNS of the selection engine). */
const C = {
  id: 0,
  supplierId: 1,
  series: 2,
  ratedLoadN: 3,
  verticalStiffnessNPerM: 4,
  dynamicStiffnessRatio: 5,
  dampingRatio: 6,
  lossFactor: 7,
  maxDeflectionMm: 8,
  unitPrice: 9,
  currency: 10,
  leadTimeDays: 11,
} as const;
type BareRow = (number | string | null)[];
const n0 = (v: number | string | null): number => (v === null ? Number.NaN : Number(v));

function bareSelection(db: Database.Database, scenario: Scenario): number {
  const components: AssemblyComponent[] = scenario.components.map((c) => ({
    name: c.name,
    massKg: c.massKg,
    cg: c.cg,
    shape: 'box',
    dimensions: { x: c.box!.lx, y: c.box!.ly, z: c.box!.lz },
  }));
  const mass = massProperties(components);
  const points = scenario.mountPoints;
  const n = points.length;
  const layout = prepareMountLayout(points);
  const loads = new Float64Array(mountLoads({ points, stiffnessNPerM: 1, weightN: mass.weightN, cg: mass.cg }).loadsN);
  isInsideConvexHull(mass.cg, points);
  let minLoad = Infinity;
  let maxLoad = -Infinity;
  for (const f of loads) {
    minLoad = Math.min(minLoad, f);
    maxLoad = Math.max(maxLoad, f);
  }
  const lo = Math.max(minLoad, 0) / CRITERIA.maxUtilization;
  const hi = maxLoad / CRITERIA.minUtilization;
  const rows = statement(db).all(lo, hi) as BareRow[];
  const R = rows.length;
  const nf = FREQUENCIES.length;
  const score = new Float64Array(R);
  const tTarget = 1 - CRITERIA.minIsolationPct / 100;
  const dbTarget = -20 * Math.log10(tTarget);
  const twoPi = 2 * Math.PI;
  const spread = maxLoad - minLoad;
  let best = -1;
  for (let r = 0; r < R; r++) {
    const row = rows[r];
    const k = n0(row[C.verticalStiffnessNPerM]);
    const rated = n0(row[C.ratedLoadN]);
    const maxDefl = row[C.maxDeflectionMm] === null ? Infinity : n0(row[C.maxDeflectionMm]) / 1000;
    let ok = true;
    let sumU = 0;
    for (let i = 0; i < n; i++) {
      const u = loads[i] / rated;
      sumU += u;
      if (u > CRITERIA.maxUtilization || u < CRITERIA.minUtilization || loads[i] / k > maxDefl) ok = false;
    }
    const nd = n0(row[C.dynamicStiffnessRatio]) || 1;
    const fn = Math.sqrt((nd * n * k) / mass.massKg) / twoPi;
    const hyst = row[C.lossFactor] !== null;
    const v = hyst ? n0(row[C.lossFactor]) : n0(row[C.dampingRatio]) || 0;
    let worst = 0;
    for (let j = 0; j < nf; j++) {
      const q = FREQUENCIES[j] / fn;
      const q2 = q * q;
      const a = 1 - q2;
      const d = hyst ? v * v : 4 * v * v * q2;
      const t = Math.sqrt((hyst ? 1 + v * v : 1 + d) / (a * a + d));
      if (t > worst) worst = t;
    }
    if (worst > tTarget) ok = false;
    const meanDefl = mass.weightN / (n * k);
    score[r] =
      0.4 * Math.min(1, Math.max(0, (-20 * Math.log10(worst)) / dbTarget)) +
      0.2 * (1 - Math.min(1, Math.abs(sumU / n - 0.8) / 0.3)) +
      0.15 * (1 - Math.min(1, spread / k / meanDefl)) +
      (row[C.unitPrice] === null ? 0 : 0.15) +
      (row[C.leadTimeDays] === null ? 0 : 0.1);
    if (ok && (best < 0 || score[r] > score[best])) best = r;
  }
  // series: group by supplier + series, per-point sizes for a level skid
  const groups = new Map<string, number[]>();
  for (let r = 0; r < R; r++) {
    const s = rows[r][C.series] as string | null;
    if (!s) continue;
    const key = `${rows[r][C.supplierId]}:${s}`;
    const list = groups.get(key);
    if (list) list.push(r);
    else groups.set(key, [r]);
  }
  const rated = new Float64Array(R);
  const kv = new Float64Array(R);
  let p = 0;
  const workspace = createLevellingWorkspace(layout);
  let levelled = 0;
  for (const list of groups.values()) {
    const from = p;
    for (const r of list) {
      rated[p] = n0(rows[r][C.ratedLoadN]);
      kv[p] = n0(rows[r][C.verticalStiffnessNPerM]);
      p++;
    }
    if (list.length < 2) continue;
    let target = 0;
    for (let s = from; s < p; s++) target += rated[s] / kv[s];
    selectSizesForLevellingInto(
      layout,
      mass.weightN,
      mass.cg.x,
      mass.cg.y,
      loads,
      rated,
      kv,
      from,
      p,
      (0.8 * target) / (p - from),
      workspace,
    );
    levelled += workspace.levelErrorM;
  }
  // the rigid-body modes of the 2×limit best (as the server does)
  const order: number[] = []; // the best 2×limit by score, kept sorted by insertion
  for (let r = 0; r < R; r++) {
    if (order.length === 2 * LIMIT && score[r] <= score[order[order.length - 1]]) continue;
    let at = order.length;
    while (at > 0 && score[order[at - 1]] < score[r]) at--;
    order.splice(at, 0, r);
    if (order.length > 2 * LIMIT) order.pop();
  }
  const horizontal = details(db).all(...order.map((r) => rows[r][C.id])) as [number, number | null][];
  const khById = new Map(horizontal);
  for (const r of order) {
    const row = rows[r];
    const nd = n0(row[C.dynamicStiffnessRatio]) || 1;
    const kz = n0(row[C.verticalStiffnessNPerM]) * nd;
    const kh = (khById.get(Number(row[C.id])) ?? kz / nd) * nd;
    rigidBodyModes({
      massKg: mass.massKg,
      inertia: mass.inertia,
      cg: mass.cg,
      mounts: points.map((pt) => ({ position: { x: pt.x, y: pt.y, z: pt.z }, stiffness: { x: kh, y: kh, z: kz } })),
    });
  }
  return R + groups.size + best + levelled * 0;
}

let detailsStatement: Database.Statement | undefined;
function details(db: Database.Database): Database.Statement {
  detailsStatement ??= db
    .prepare(`SELECT id, horizontalStiffnessNPerM FROM mount WHERE id IN (${Array.from({ length: 2 * LIMIT }, () => '?').join(', ')})`)
    .raw(true);
  return detailsStatement;
}

let prepared: Database.Statement | undefined;
function statement(db: Database.Database): Database.Statement {
  // the same columns and filter as the server's prefilter, rows as arrays
  prepared ??= db
    .prepare(
      `SELECT m.id, m.supplierId, m.series, m.ratedLoadN, m.verticalStiffnessNPerM, m.dynamicStiffnessRatio,
              m.dampingRatio, m.lossFactor, m.maxDeflectionMm, m.unitPrice, m.currency, m.leadTimeDays
         FROM mount m INNER JOIN supplier s ON s.id = m.supplierId
        WHERE m.active = 1 AND s.active = 1 AND m.ratedLoadN >= ? AND m.ratedLoadN <= ?`,
    )
    .raw(true);
  return prepared;
}

// ---- run --------------------------------------------------------------------------------------
async function main(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'tacet-selection-bench-'));
  let app: TacetServer | undefined;
  try {
    const csv = join(dir, 'bench-mounts.csv');
    const t0 = performance.now();
    const written = await writeDemoCatalog(csv, 7, ROWS);
    console.log(
      `catalog: ${written} invented mounts (${(statSync(csv).size / 1e6).toFixed(1)} MB) in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
    );

    // The data folder inside ours, so --keep keeps the database too.
    app = await startBenchServer({ dataDir: join(dir, 'data') });
    const base = app.baseURL;

    const manager = await signIn(base, 'catalog@tacet.test');
    const form = new FormData();
    form.append('file', new Blob([readFileSync(csv)], { type: 'text/csv' }), 'bench-mounts.csv');
    const t1 = performance.now();
    const imported = await fetch(`${base}/api/mounts/import?onInvalid=skip`, {
      method: 'POST',
      headers: { Authorization: `Bearer ${manager}` },
      body: form,
    });
    const importBody = (await imported.json()) as { accepted: number; rejected: number; created: number };
    if (!imported.ok) throw new Error(`import: ${imported.status} ${JSON.stringify(importBody).slice(0, 300)}`);
    console.log(
      `import: ${importBody.accepted} accepted, ${importBody.rejected} rejected, ${importBody.created} created in ${((performance.now() - t1) / 1000).toFixed(1)} s`,
    );

    const engineer = await signIn(base, 'engineer@tacet.test');
    const bodies = SCENARIOS.map((s) =>
      JSON.stringify({
        components: s.components,
        mountPoints: s.mountPoints,
        disturbingFrequenciesHz: FREQUENCIES,
        criteria: CRITERIA,
        limit: LIMIT,
      }),
    );
    const http: number[][] = SCENARIOS.map(() => []);
    const server: number[][] = SCENARIOS.map(() => []);
    const considered: number[] = SCENARIOS.map(() => 0);
    for (let i = 0; i < WARMUP + REQUESTS; i++) {
      const k = i % SCENARIOS.length;
      const start = performance.now();
      const response = await fetch(`${base}/api/selection`, {
        method: 'POST',
        headers: { Authorization: `Bearer ${engineer}`, 'content-type': 'application/json' },
        body: bodies[k],
      });
      const body = (await response.json()) as { elapsedMs: number; considered: number; candidates: { passes: boolean }[] };
      const elapsed = performance.now() - start;
      if (!response.ok) throw new Error(`selection: ${response.status} ${JSON.stringify(body).slice(0, 300)}`);
      if (i >= WARMUP) {
        http[k].push(elapsed);
        server[k].push(body.elapsedMs);
        considered[k] = body.considered;
      }
    }

    // the bare loop over the same file (WAL: a second reader is fine while the server runs)
    const db = new Database(join(dir, 'data', 'tacet.sqlite'), { readonly: true });
    const bare: number[][] = SCENARIOS.map(() => []);
    let sink = 0;
    for (let i = 0; i < WARMUP + REQUESTS; i++) {
      const k = i % SCENARIOS.length;
      const start = performance.now();
      sink += bareSelection(db, SCENARIOS[k]);
      if (i >= WARMUP) bare[k].push(performance.now() - start);
    }
    db.close();

    console.log(`\nPOST /api/selection, ${REQUESTS} requests one at a time, 3 frequencies, limit ${LIMIT} (times in ms)`);
    console.log('scenario   considered  HTTP p50  HTTP p95  server p50  server p95  bare p50  bare p95  p95 ratio');
    const all = { http: [] as number[], server: [] as number[], bare: [] as number[] };
    SCENARIOS.forEach((s, k) => {
      all.http.push(...http[k]);
      all.server.push(...server[k]);
      all.bare.push(...bare[k]);
      console.log(
        `${s.name.padEnd(10)} ${String(considered[k]).padStart(10)} ${fmt(percentile(http[k], 50))}   ${fmt(percentile(http[k], 95))}   ${fmt(percentile(server[k], 50))}     ${fmt(percentile(server[k], 95))}    ${fmt(percentile(bare[k], 50))}   ${fmt(percentile(bare[k], 95))}   ${(percentile(http[k], 95) / percentile(bare[k], 95)).toFixed(2).padStart(6)}×`,
      );
    });
    const p95 = percentile(all.http, 95);
    const ratio = p95 / percentile(all.bare, 95);
    console.log(
      `${'all'.padEnd(10)} ${''.padStart(10)} ${fmt(percentile(all.http, 50))}   ${fmt(p95)}   ${fmt(percentile(all.server, 50))}     ${fmt(percentile(all.server, 95))}    ${fmt(percentile(all.bare, 50))}   ${fmt(percentile(all.bare, 95))}   ${ratio.toFixed(2).padStart(6)}×`,
    );
    reportFigure({
      figure: `selection over ${ROWS} mounts, 4-8 points, HTTP p95`,
      value: p95,
      unit: 'ms',
      target: 100,
      bare: percentile(all.bare, 95),
      ratioTarget: 2,
    });
    console.log(
      `\ntarget p95 < 100 ms through HTTP: ${p95 < 100 ? 'met' : 'NOT met'} (${p95.toFixed(1)} ms); within 2× of the bare loop: ${ratio <= 2 ? 'met' : 'NOT met'} (${ratio.toFixed(2)}×)` +
        (sink === -1 ? '' : ''),
    );
  } finally {
    await app?.stop();
    if (!process.argv.includes('--keep')) rmSync(dir, { recursive: true, force: true });
    else console.log(`kept ${dir}`);
  }
}

await main();
