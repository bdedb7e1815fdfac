import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { writeDemoCatalog } from '../../tools/catalog/generate-demo-catalog';
import { Api } from './support/api';
import { countOf, digestOf, integrityOf, readDatabase } from './support/database';
import { cleanUp, copyOfTemplate, startServer, tempFolder } from './support/server';

/** Tables a catalog import writes (mounts, suppliers it creates, its history line). */
const CATALOG_TABLES = ['mount', 'supplier', 'catalog_import'];
/** WAL growth that proves the import's transaction is writing (it writes tens of MB in all). */
const WAL_GROWTH_BYTES = 2 * 1024 * 1024;

const walSize = (dataDir: string) => {
  const wal = join(dataDir, 'tacet.sqlite-wal');
  return existsSync(wal) ? statSync(wal).size : 0;
};

describe('kill -9 during a large catalog import', () => {
  let csv: string;
  let smallCsv: string;

  beforeAll(async () => {
    const folder = tempFolder();
    csv = join(folder, 'large-catalog.csv');
    smallCsv = join(folder, 'small-catalog.csv');
    // Seed 7, not the demo's 1: new values for the demo part numbers and 99,500 new parts.
    await writeDemoCatalog(csv, 7, 100_000);
    await writeDemoCatalog(smallCsv, 7, 1_000);
  });

  afterAll(cleanUp);

  it('leaves the catalog exactly as it was before the import', async () => {
    const dataDir = copyOfTemplate(inject('templateDir'));
    const first = await startServer(dataDir);
    const manager = await Api.signIn(first.baseURL, 'catalog@tacet.test');

    const exportBefore = await manager.bytes('/api/mounts/export.csv');
    const importsBefore = (await manager.get('/api/mounts/imports')).body;
    const digestBefore = digestOf(dataDir, CATALOG_TABLES);
    const mountsBefore = countOf(dataDir, 'mount');
    // Start from an empty WAL, so any growth is the import's transaction writing.
    readDatabase(dataDir, (db) => db.pragma('wal_checkpoint(TRUNCATE)'));
    const walBefore = walSize(dataDir);

    let answered = false;
    const startedAt = Date.now();
    const upload = manager.importCatalog(csv).then(
      (reply) => {
        answered = true;
        return reply.status;
      },
      () => 'connection lost' as const,
    );
    // Wait until the transaction has spilled pages into the WAL, then kill without warning.
    const deadline = Date.now() + 90_000;
    while (!answered && walSize(dataDir) < walBefore + WAL_GROWTH_BYTES && Date.now() < deadline) {
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
    const walAtKill = walSize(dataDir);
    console.log(`killed ${Date.now() - startedAt} ms after the upload began, WAL ${(walAtKill / 1048576).toFixed(1)} MiB`);
    expect(answered, 'the import finished before the kill: it must be killed mid-transaction').toBe(false);
    expect(walAtKill).toBeGreaterThanOrEqual(walBefore + WAL_GROWTH_BYTES);
    const exit = await first.kill();
    expect(exit.signal).toBe('SIGKILL');
    expect(await upload).toBe('connection lost');

    // Restart on the same folder: SQLite ignores the uncommitted WAL frames.
    const second = await startServer(dataDir);
    const after = manager.on(second.baseURL);
    expect((await after.bytes('/api/mounts/export.csv')).equals(exportBefore)).toBe(true);
    expect((await after.get('/api/mounts/imports')).body).toEqual(importsBefore);
    expect(countOf(dataDir, 'mount')).toBe(mountsBefore);
    expect(digestOf(dataDir, CATALOG_TABLES)).toBe(digestBefore);
    expect(integrityOf(dataDir)).toBe('ok');

    // And the catalog still takes an import after the crash.
    const retry = await after.importCatalog(smallCsv);
    expect(retry.status).toBe(200);
    expect(retry.body).toMatchObject({ accepted: 1_000, rejected: 0 });
    expect(countOf(dataDir, 'mount')).toBeGreaterThan(mountsBefore);
    await second.stop();
    expect(integrityOf(dataDir)).toBe('ok');
  });
});
