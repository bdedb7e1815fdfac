/**
 * Catalog search benchmark. Run from the repository root after building the server:
 *
 *   npm run build -w @tacet/vibration && npm run build -w @tacet/server
 *   npx tsx tools/bench/catalog-query.bench.ts
 *
 * The built server (demo mode, throw-away data folder) gets 100,000 generated mounts through
 * its import; then filtered pages of 50 are requested through HTTP on loopback
 * (GET /api/mounts with text + types + load range + sort: the items and the total), and the
 * same page and total are read with bare better-sqlite3 prepared statements on the same database
 * file (the same two steps as the server: the page's ids with the total, then those rows), with
 * the same parameter sets. Server time is the server's own `Server-Timing` header (from the
 * request's arrival to its answer's headers); the HTTP time adds the client and loopback. Target
 * (the catalog issue): a page under 30 ms of server time, p95.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { writeDemoCatalog } from '../catalog/generate-demo-catalog.js';
import { signIn } from '../harness/fixtures.mjs';
import { reportFigure } from './bench-result.js';
import { ms, percentile, startServer, uploadCatalog } from './server-bench-support.js';

const ROWS = 100_000;
const WARMUP = 20;
const REQUESTS = 300;
const TARGET_P95_MS = 30;

interface Query {
  q: string;
  types: string[];
  minLoadN: number;
  maxLoadN: number;
  sort: 'supplier,partNumber' | '-ratedLoadN' | 'unitPrice';
}

const TEXTS = ['s1', 'qm-', 'elastics', 'e2v', 'h1', '0300', 'spring', 'r1v3'];
const TYPE_SETS = [
  ['open_spring'],
  ['open_spring', 'housed_spring'],
  ['elastomer_pad', 'elastomer_mount'],
  ['restrained_spring'],
  ['wire_rope', 'air_spring', 'elastomer_mount'],
];
const SORTS: Query['sort'][] = ['supplier,partNumber', '-ratedLoadN', 'unitPrice'];

/** Deterministic parameter sets (seeded LCG). */
function queries(count: number): Query[] {
  let seed = 2024;
  const next = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
  return Array.from({ length: count }, () => {
    const minLoadN = Math.round(100 + next() * 5000);
    return {
      q: TEXTS[Math.floor(next() * TEXTS.length)],
      types: TYPE_SETS[Math.floor(next() * TYPE_SETS.length)],
      minLoadN,
      maxLoadN: minLoadN + Math.round(1000 + next() * 20000),
      sort: SORTS[Math.floor(next() * SORTS.length)],
    };
  });
}

const ORDER_BY: Record<Query['sort'], string> = {
  'supplier,partNumber': 's."nameKey" ASC, m."partNumber" ASC, m."id" ASC',
  '-ratedLoadN': 'm."ratedLoadN" DESC, m."id" ASC',
  unitPrice: 'm."unitPrice" ASC NULLS LAST, m."id" ASC',
};

/** The same page and total with a bare prepared statement (statements cached per shape). */
function bareSearch(db: Database.Database) {
  const cache = new Map<string, Database.Statement>();
  const prepared = (sql: string) => {
    let statement = cache.get(sql);
    if (!statement) cache.set(sql, (statement = db.prepare(sql)));
    return statement;
  };
  return (query: Query): number => {
    const where =
      `m."active" = 1 AND s."active" = 1 AND m."mountType" IN (${query.types.map(() => '?').join(', ')}) ` +
      `AND m."ratedLoadN" >= ? AND m."ratedLoadN" <= ? ` +
      `AND (LOWER(m."partNumber") LIKE ? ESCAPE '\\' OR LOWER(m."series") LIKE ? ESCAPE '\\' OR s."nameKey" LIKE ? ESCAPE '\\')`;
    const pattern = `%${query.q}%`;
    const parameters = [...query.types, query.minLoadN, query.maxLoadN, pattern, pattern, pattern];
    const from = 'FROM "mount" m INNER JOIN "supplier" s ON s."id" = m."supplierId"';
    // The same two steps as the server: the page's ids and the total, then those rows.
    const page = prepared(
      `SELECT m."id" AS id, COUNT(*) OVER () AS total ${from} WHERE ${where} ORDER BY ${ORDER_BY[query.sort]} LIMIT 50 OFFSET 0`,
    ).all(...parameters) as Array<{ id: number; total: number }>;
    if (page.length === 0) return 0;
    const rows = prepared(`SELECT m.*, s."id" AS sid, s."name" AS sname ${from} WHERE m."id" IN (${page.map(() => '?').join(', ')})`).all(
      ...page.map((row) => row.id),
    );
    return rows.length;
  };
}

async function main(): Promise<void> {
  const work = mkdtempSync(join(tmpdir(), 'tacet-query-bench-'));
  const server = await startServer('viewer@tacet.test');
  try {
    const csvPath = join(work, 'catalog-100k.csv');
    await writeDemoCatalog(csvPath, 7, ROWS);
    const importer = await signIn(server.url, 'catalog@tacet.test'); // the import needs that role
    const imported = await uploadCatalog({ ...server, token: importer }, csvPath);
    if (imported.status !== 200) throw new Error(`import failed: ${imported.status}`);

    const list = queries(WARMUP + REQUESTS);
    const http: number[] = [];
    const serverTimes: number[] = [];
    let totals = 0;
    for (const [index, query] of list.entries()) {
      const params = new URLSearchParams({
        q: query.q,
        type: query.types.join(','),
        minLoadN: String(query.minLoadN),
        maxLoadN: String(query.maxLoadN),
        sort: query.sort,
        pageSize: '50',
      });
      const t0 = performance.now();
      const response = await fetch(`${server.url}/api/mounts?${params}`, { headers: { Authorization: `Bearer ${server.token}` } });
      const body = (await response.json()) as { items: unknown[]; total: number };
      const elapsed = performance.now() - t0;
      if (response.status !== 200) throw new Error(`search failed: ${response.status} ${JSON.stringify(body)}`);
      totals += body.total;
      if (index >= WARMUP) {
        http.push(elapsed);
        serverTimes.push(serverTiming(response));
      }
    }

    const db = new Database(join(server.dataDir, 'tacet.sqlite'), { readonly: true });
    const search = bareSearch(db);
    const bare: number[] = [];
    for (const [index, query] of list.entries()) {
      const t0 = performance.now();
      search(query);
      if (index >= WARMUP) bare.push(performance.now() - t0);
    }
    db.close();

    const p95 = percentile(http, 95);
    const serverP95 = percentile(serverTimes, 95);
    console.log(
      `catalog: ${ROWS} imported + 500 demo mounts; ${REQUESTS} filtered pages of 50 (text + types + load range + sort), mean total ${(totals / list.length).toFixed(0)} matches`,
    );
    console.log(`Tacet GET /api/mounts (HTTP, loopback): p50 ${ms(percentile(http, 50))}, p95 ${ms(p95)}`);
    console.log(`  of which in the server (Server-Timing): p50 ${ms(percentile(serverTimes, 50))}, p95 ${ms(serverP95)}`);
    console.log(`bare prepared statements (ids + total, rows): p50 ${ms(percentile(bare, 50))}, p95 ${ms(percentile(bare, 95))}`);
    console.log(
      `ratio server p95 / bare: ${(serverP95 / percentile(bare, 95)).toFixed(2)}×; target server p95 < ${TARGET_P95_MS} ms: ${serverP95 < TARGET_P95_MS ? 'met' : 'NOT met'}`,
    );
    reportFigure({
      figure: `catalog page of 50 from ${ROWS + 500} mounts, server p95`,
      value: serverP95,
      unit: 'ms',
      target: TARGET_P95_MS,
      bare: percentile(bare, 95),
    });
    reportFigure({ figure: `catalog page of 50 from ${ROWS + 500} mounts, HTTP p95`, value: p95, unit: 'ms', bare: percentile(bare, 95) });
  } finally {
    await server.stop();
    rmSync(work, { recursive: true, force: true });
  }
}

/** The server's own time for a request, from its `Server-Timing: app;dur=<ms>` header. */
function serverTiming(response: Response): number {
  const match = /app;dur=([\d.]+)/.exec(response.headers.get('server-timing') ?? '');
  if (!match) throw new Error('no Server-Timing header: build the server first (npm run build)');
  return Number(match[1]);
}

await main();
