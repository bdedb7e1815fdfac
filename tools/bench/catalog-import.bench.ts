/**
 * Catalog import benchmark. Run from the repository root after building the server:
 *
 *   npm run build -w @tacet/vibration && npm run build -w @tacet/server
 *   npx tsx tools/bench/catalog-import.bench.ts
 *
 * 100,000 invented rows (tools/catalog/generate-demo-catalog.ts) are imported through HTTP
 * (POST /api/mounts/import: upload, validation pass, write pass in one transaction, import
 * record) into the built server, started in demo mode with a throw-away data folder. The bare
 * baseline, in a fresh process of its own: csv-parse streaming the same file + better-sqlite3
 * prepared INSERTs in one transaction into the same tables (DDL copied from the server's
 * database, indexes included). Memory: growth of the peak resident set (VmHWM) of the process
 * doing the work. Targets (PRODUCT.md): under 5 s, within 2× of the baseline, memory flat.
 */
import { spawnSync } from 'node:child_process';
import { createReadStream, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { parse } from 'csv-parse';
import { writeDemoCatalog } from '../catalog/generate-demo-catalog.js';
import { reportFigure } from './bench-result.js';
import { memoryOf, mib, ms, startServer, uploadCatalog } from './server-bench-support.js';

const ROWS = 100_000;
const TARGET_MS = 5000;
const TARGET_RATIO = 2;

interface BaselineResult {
  ms: number;
  peakGrowthMiB: number;
  rows: number;
}

/** The bare baseline (runs in its own process): csv-parse + prepared inserts in one transaction. */
async function baseline(csvPath: string, ddlPath: string, dbPath: string): Promise<BaselineResult> {
  const db = new Database(dbPath);
  db.pragma('journal_mode = WAL');
  for (const sql of JSON.parse((await import('node:fs')).readFileSync(ddlPath, 'utf8')) as string[]) db.exec(sql);
  const start = memoryOf();
  const t0 = performance.now();
  const insertSupplier = db.prepare('INSERT INTO "supplier" ("name", "nameKey") VALUES (?, ?)');
  const insertMount = db.prepare(
    'INSERT INTO "mount" ("supplierId", "partNumber", "series", "mountType", "ratedLoadN", "verticalStiffnessNPerM", ' +
      '"horizontalStiffnessNPerM", "dynamicStiffnessRatio", "dampingRatio", "lossFactor", "maxDeflectionMm", "tempMinC", ' +
      '"tempMaxC", "heightMm", "restraintCapacityN", "upliftCapacityN", "unitPrice", "currency", "leadTimeDays", "active") ' +
      'VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 1)',
  );
  const supplierIds = new Map<string, number>();
  const num = (text: string) => (text === '' ? null : Number(text));
  let rows = 0;
  db.exec('BEGIN');
  for await (const r of createReadStream(csvPath).pipe(parse({ bom: true, from_line: 2 })) as AsyncIterable<string[]>) {
    let supplierId = supplierIds.get(r[0]);
    if (supplierId === undefined) {
      supplierId = Number(insertSupplier.run(r[0], r[0].toLowerCase()).lastInsertRowid);
      supplierIds.set(r[0], supplierId);
    }
    const k = num(r[5]) as number;
    const kh = num(r[6]);
    insertMount.run(
      supplierId,
      r[1],
      r[2] || null,
      r[3],
      num(r[4]),
      k * 1000,
      kh === null ? null : kh * 1000,
      num(r[7]) ?? 1,
      num(r[8]),
      num(r[9]),
      num(r[10]),
      num(r[11]),
      num(r[12]),
      num(r[13]),
      num(r[14]),
      num(r[15]),
      num(r[16]),
      r[17] || 'USD',
      num(r[18]),
    );
    rows++;
  }
  db.exec('COMMIT');
  const elapsed = performance.now() - t0;
  const end = memoryOf();
  db.close();
  return { ms: elapsed, peakGrowthMiB: end.peakMiB - start.rssMiB, rows };
}

async function main(): Promise<void> {
  const work = mkdtempSync(join(tmpdir(), 'tacet-import-bench-'));
  try {
    const csvPath = join(work, 'catalog-100k.csv');
    await writeDemoCatalog(csvPath, 7, ROWS);
    console.log(`file: ${ROWS} rows, ${(statSync(csvPath).size / 1024 / 1024).toFixed(1)} MiB (generated, seed 7)`);

    // --- the real import, through HTTP --------------------------------------------------
    const server = await startServer();
    let first: { ms: number; peakGrowthMiB: number; body: Record<string, unknown> };
    let second: { ms: number; body: Record<string, unknown> };
    const ddlPath = join(work, 'ddl.json');
    try {
      const before = memoryOf(server.pid);
      let t0 = performance.now();
      const created = await uploadCatalog(server, csvPath);
      first = { ms: performance.now() - t0, peakGrowthMiB: memoryOf(server.pid).peakMiB - before.rssMiB, body: created.body };
      if (created.status !== 200) throw new Error(`import failed: ${created.status} ${JSON.stringify(created.body).slice(0, 500)}`);
      t0 = performance.now();
      const updated = await uploadCatalog(server, csvPath);
      second = { ms: performance.now() - t0, body: updated.body };
      if (updated.status !== 200) throw new Error(`re-import failed: ${updated.status}`);

      const db = new Database(join(server.dataDir, 'tacet.sqlite'), { readonly: true });
      const ddl = db
        .prepare(`SELECT sql FROM sqlite_master WHERE tbl_name IN ('supplier', 'mount') AND sql IS NOT NULL ORDER BY type DESC, name`)
        .all() as Array<{ sql: string }>;
      db.close();
      // Tables first (the order above puts 'table' before 'index'), supplier before mount.
      const tables = ddl.filter((d) => d.sql.startsWith('CREATE TABLE')).sort((a) => (a.sql.includes('"supplier"') ? -1 : 1));
      writeFileSync(ddlPath, JSON.stringify([...tables, ...ddl.filter((d) => !d.sql.startsWith('CREATE TABLE'))].map((d) => d.sql)));
    } finally {
      await server.stop();
    }

    // --- the bare baseline, in a fresh process -------------------------------------------
    const child = spawnSync(
      process.execPath,
      [...process.execArgv, fileURLToPath(import.meta.url), '--baseline', csvPath, ddlPath, join(work, 'bare.sqlite')],
      {
        encoding: 'utf8',
      },
    );
    if (child.status !== 0) throw new Error(`baseline failed: ${child.stderr}`);
    const bare = JSON.parse(child.stdout.trim().split('\n').pop() as string) as BaselineResult;

    const ratio = first.ms / bare.ms;
    console.log(
      `Tacet import (HTTP, new catalog):   ${ms(first.ms)}  created ${first.body.created}, updated ${first.body.updated}, rejected ${first.body.rejected}; server peak RSS growth ${mib(first.peakGrowthMiB)}`,
    );
    console.log(`Tacet import (HTTP, all updates):   ${ms(second.ms)}  created ${second.body.created}, updated ${second.body.updated}`);
    console.log(`bare csv-parse + prepared inserts:  ${ms(bare.ms)}  ${bare.rows} rows; peak RSS growth ${mib(bare.peakGrowthMiB)}`);
    reportFigure({
      figure: `catalog import, ${ROWS} rows (HTTP, new catalog)`,
      value: first.ms,
      unit: 'ms',
      target: TARGET_MS,
      bare: bare.ms,
      ratioTarget: TARGET_RATIO,
    });
    reportFigure({
      figure: `catalog import, ${ROWS} rows: server peak RSS growth`,
      value: first.peakGrowthMiB,
      unit: 'MiB',
      bare: bare.peakGrowthMiB,
    });
    console.log(
      `ratio Tacet / bare: ${ratio.toFixed(2)}× (target ≤ ${TARGET_RATIO}×); time target < ${TARGET_MS} ms: ${first.ms < TARGET_MS ? 'met' : 'NOT met'}; ratio target: ${ratio <= TARGET_RATIO ? 'met' : 'NOT met'}`,
    );
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

if (process.argv[2] === '--baseline') {
  const [csvPath, ddlPath, dbPath] = process.argv.slice(3);
  console.log(JSON.stringify(await baseline(csvPath, ddlPath, dbPath)));
} else {
  await main();
}
