import { spawnSync } from 'node:child_process';
import { chmodSync, chownSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { writeDemoCatalog } from '../../tools/catalog/generate-demo-catalog';
import { Api, taggedInput, type Reply } from './support/api';
import { countOf, digestOf, integrityOf, SQLITE_FILE } from './support/database';
import { cleanUp, copyOfTemplate, limitFileSize, SERVER_MAIN, startServer, tempFolder } from './support/server';

/** Every table that holds what users entered. */
const ALL_TABLES = ['user', 'supplier', 'mount', 'catalog_import', 'project', 'design', 'design_transition', 'rfq'];

function expectStorageRefusal(reply: Reply, wording: RegExp): void {
  expect(reply.status, reply.text).toBe(503);
  expect(reply.headers.get('content-type')).toMatch(/application\/json/);
  expect(reply.body).toEqual({ statusCode: 503, message: expect.stringMatching(wording) });
  expect(Number(reply.headers.get('retry-after'))).toBeGreaterThan(0);
}

describe('storage that refuses writes', () => {
  let smallCsv: string;

  beforeAll(async () => {
    smallCsv = join(tempFolder(), 'small-catalog.csv');
    await writeDemoCatalog(smallCsv, 5, 200);
  });

  afterAll(cleanUp);

  // A full disk, simulated with a file-size limit on the running server (RLIMIT_FSIZE via
  // prlimit): every write to a file fails as on a full disk, for root too, and lifting the
  // limit is like freeing space. Node ignores SIGXFSZ, so the write fails with EFBIG.
  it('a full disk: writes get 503 with plain words, reads go on, nothing is half-written, writes resume once there is room', async () => {
    const dataDir = copyOfTemplate(inject('templateDir'));
    const server = await startServer(dataDir);
    const engineer = await Api.signIn(server.baseURL, 'engineer@tacet.test');
    const manager = await Api.signIn(server.baseURL, 'catalog@tacet.test');
    const project = (await engineer.post('/api/projects', { name: 'Before the disk filled' })).body;
    const design = (await engineer.post(`/api/projects/${project.id}/designs`, { name: 'Skid A', input: taggedInput(1) })).body;
    const projectsBefore = (await engineer.get('/api/projects')).body;
    const digestBefore = digestOf(dataDir, ALL_TABLES);

    limitFileSize(server.pid, 1);
    try {
      const notWritable = /^The data store is not writable right now|^The data store is full/;
      expectStorageRefusal(await engineer.post('/api/projects', { name: 'While the disk is full' }), notWritable);
      expectStorageRefusal(
        await engineer.put(`/api/designs/${design.id}`, { version: design.version, name: 'Skid A renamed', input: taggedInput(2) }),
        notWritable,
      );
      expectStorageRefusal(await manager.importCatalog(smallCsv), notWritable);

      // Reads still work and show the data as it was.
      expect((await engineer.get('/api/health')).status).toBe(200);
      expect((await engineer.get('/api/projects')).body).toEqual(projectsBefore);
      const served = await engineer.get(`/api/designs/${design.id}`);
      expect(served.status).toBe(200);
      expect(served.body).toMatchObject({ version: design.version, name: 'Skid A' });
      expect((await engineer.get('/api/mounts?type=open_spring&minLoadN=1000&pageSize=20')).status).toBe(200);
    } finally {
      limitFileSize(server.pid, null);
    }
    expect(digestOf(dataDir, ALL_TABLES)).toBe(digestBefore);

    // Room again: the same writes succeed, from the version the refused save did not change.
    expect((await engineer.post('/api/projects', { name: 'After the disk was freed' })).status).toBe(201);
    const saved = await engineer.put(`/api/designs/${design.id}`, {
      version: design.version,
      name: 'Skid A renamed',
      input: taggedInput(2),
    });
    expect(saved.status).toBe(200);
    expect(saved.body.version).toBe(design.version + 1);
    expect((await manager.importCatalog(smallCsv)).status).toBe(200);
    expect(server.log()).toMatch(/the data store refused it \(SQLITE_(IOERR_WRITE|FULL)/);

    await server.stop();
    expect(integrityOf(dataDir)).toBe('ok');
  });

  // A read-only data folder. As root, file permissions do not stop writes, so the server runs
  // as an unprivileged user here, on a database file it may only read.
  const nobody = { name: 'nobody', group: 'nogroup' };
  const canRunAsNobody =
    process.getuid?.() === 0 &&
    spawnSync('setpriv', [
      '--reuid',
      nobody.name,
      '--regid',
      nobody.group,
      '--clear-groups',
      process.execPath,
      '-e',
      `require('fs').accessSync(${JSON.stringify(SERVER_MAIN)}, require('fs').constants.R_OK)`,
    ]).status === 0;

  it.skipIf(!canRunAsNobody)(
    'a read-only database: writes get 503 "not writable", reads go on; writable again, writes succeed',
    async () => {
      const dataDir = copyOfTemplate(inject('templateDir'));
      const othersBefore = digestOf(
        dataDir,
        ALL_TABLES.filter((table) => table !== 'project'),
      );
      const projectsBefore = countOf(dataDir, 'project');
      const { uid, gid } = idsOf(nobody.name);
      chownSync(dataDir, uid, gid);
      for (const file of readdirSync(dataDir)) chownSync(join(dataDir, file), uid, gid);
      chmodSync(join(dataDir, SQLITE_FILE), 0o444);

      const readOnly = await startServer(dataDir, { user: nobody });
      const engineer = await Api.signIn(readOnly.baseURL, 'engineer@tacet.test');
      expectStorageRefusal(
        await engineer.post('/api/projects', { name: 'On a read-only disk' }),
        /^The data store is not writable right now \(it is read-only\)/,
      );
      const projects = await engineer.get('/api/projects');
      expect(projects.status).toBe(200);
      expect(projects.body.length).toBeGreaterThan(0);
      expect(readOnly.log()).toMatch(/the data store refused it \(SQLITE_READONLY/);
      await readOnly.stop();

      // Writable again: the database and the -wal/-shm files the read-only run left beside it.
      for (const file of readdirSync(dataDir).filter((name) => name.startsWith(SQLITE_FILE))) chmodSync(join(dataDir, file), 0o644);
      const writable = await startServer(dataDir, { user: nobody });
      const again = engineer.on(writable.baseURL);
      expect((await again.post('/api/projects', { name: 'Writable again' })).status).toBe(201);
      await writable.stop();
      expect(integrityOf(dataDir)).toBe('ok');
      expect(countOf(dataDir, 'project')).toBe(projectsBefore + 1); // only the write made once writable
      expect(
        digestOf(
          dataDir,
          ALL_TABLES.filter((table) => table !== 'project'),
        ),
      ).toBe(othersBefore);
    },
  );
});

function idsOf(user: string): { uid: number; gid: number } {
  const out = spawnSync('id', ['-u', user], { encoding: 'utf8' }).stdout.trim();
  const group = spawnSync('id', ['-g', user], { encoding: 'utf8' }).stdout.trim();
  return { uid: Number(out), gid: Number(group) };
}
