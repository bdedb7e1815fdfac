import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { writeDemoCatalog } from '../../tools/catalog/generate-demo-catalog';
import { Api, taggedInput } from './support/api';
import { integrityOf } from './support/database';
import { cleanUp, copyOfTemplate, startServer, tempFolder } from './support/server';

interface Accounts {
  engineer: Api;
  manager: Api;
  admin: Api;
}

/** Everything a user can see of what was entered, read through the API. */
async function snapshot({ engineer, manager, admin }: Accounts, projectId: number, designId: number) {
  const exportCsv = await manager.bytes('/api/mounts/export.csv');
  return {
    projects: (await engineer.get('/api/projects')).body,
    project: (await engineer.get(`/api/projects/${projectId}`)).body,
    designs: (await engineer.get(`/api/projects/${projectId}/designs`)).body,
    design: (await engineer.get(`/api/designs/${designId}`)).body,
    imports: (await manager.get('/api/mounts/imports')).body,
    suppliers: (await manager.get('/api/suppliers')).body,
    catalog: createHash('sha256').update(exportCsv).digest('hex'),
    users: (await admin.get('/api/users')).body,
  };
}

describe('restarting the server', () => {
  let csv: string;

  beforeAll(async () => {
    csv = join(tempFolder(), 'restart-catalog.csv');
    await writeDemoCatalog(csv, 11, 1_500); // new values for the demo parts and 1,000 new ones
  });

  afterAll(cleanUp);

  it('keeps everything entered, after a clean stop (SIGTERM) and after kill -9', async () => {
    const dataDir = copyOfTemplate(inject('templateDir'));
    let server = await startServer(dataDir);
    // Tokens stay valid across restarts (the demo secret is in the data folder): no sign-in
    // later, so nothing changes between the snapshots but what the test does.
    let accounts: Accounts = {
      engineer: await Api.signIn(server.baseURL, 'engineer@tacet.test'),
      manager: await Api.signIn(server.baseURL, 'catalog@tacet.test'),
      admin: await Api.signIn(server.baseURL, 'admin@tacet.test'),
    };
    const on = (baseURL: string): Accounts => ({
      engineer: accounts.engineer.on(baseURL),
      manager: accounts.manager.on(baseURL),
      admin: accounts.admin.on(baseURL),
    });

    const project = await accounts.engineer.post('/api/projects', {
      name: 'Restart test plant',
      site: 'Pier 4',
      client: 'Invented Utilities',
      description: 'Kept across restarts',
    });
    expect(project.status).toBe(201);
    const design = await accounts.engineer.post(`/api/projects/${project.body.id}/designs`, { name: 'Skid R', input: taggedInput(1) });
    expect(design.status).toBe(201);
    let version: number = design.body.version;
    for (let tag = 2; tag <= 4; tag++) {
      const saved = await accounts.engineer.put(`/api/designs/${design.body.id}`, { version, input: taggedInput(tag) });
      expect(saved.status).toBe(200);
      version = saved.body.version;
    }
    const imported = await accounts.manager.importCatalog(csv);
    expect(imported.status).toBe(200);
    const user = await accounts.admin.post('/api/users', {
      email: 'restart.person@tacet.test',
      name: 'Restart Person',
      role: 'viewer',
      password: 'restart-person-password',
    });
    expect(user.status, user.text).toBe(201);

    const before = await snapshot(accounts, project.body.id, design.body.id);
    expect(before.design.version).toBe(version);
    expect(before.imports[0]).toMatchObject({ fileName: 'restart-catalog.csv', accepted: 1_500 });

    // A clean stop closes the database: SQLite checkpoints and removes the WAL.
    const stopped = await server.stop();
    expect(stopped.code === 0 || stopped.signal === 'SIGTERM').toBe(true);
    expect(existsSync(join(dataDir, 'tacet.sqlite-wal'))).toBe(false);
    expect(integrityOf(dataDir)).toBe('ok');

    server = await startServer(dataDir);
    accounts = on(server.baseURL);
    expect(await snapshot(accounts, project.body.id, design.body.id)).toEqual(before);

    // One more change, then no warning at all: what was acknowledged is in the WAL and survives.
    const saved = await accounts.engineer.put(`/api/designs/${design.body.id}`, { version, name: 'Skid R (after restart)' });
    expect(saved.status).toBe(200);
    const beforeKill = await snapshot(accounts, project.body.id, design.body.id);
    const killed = await server.kill();
    expect(killed.signal).toBe('SIGKILL');

    server = await startServer(dataDir);
    accounts = on(server.baseURL);
    const afterKill = await snapshot(accounts, project.body.id, design.body.id);
    expect(afterKill).toEqual(beforeKill);
    expect(afterKill.design).toMatchObject({ name: 'Skid R (after restart)', version: version + 1 });

    await server.stop();
    expect(integrityOf(dataDir)).toBe('ok');
  });
});
