import { copyFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, inject, it } from 'vitest';
import { Api, tagOfInput, taggedInput } from './support/api';
import { integrityOf, readDatabase, storedDesign } from './support/database';
import { BACKUP_MAIN, cleanUp, copyOfTemplate, runToEnd, startServer, tempFolder } from './support/server';

describe('npm run backup while the server writes', () => {
  afterAll(cleanUp);

  it('writes a consistent copy that a new server starts on, with everything acknowledged before the backup', async () => {
    const dataDir = copyOfTemplate(inject('templateDir'));
    const server = await startServer(dataDir);
    const engineer = await Api.signIn(server.baseURL, 'engineer@tacet.test');
    const project = (await engineer.post('/api/projects', { name: 'Backup test plant' })).body;
    const design = (await engineer.post(`/api/projects/${project.id}/designs`, { name: 'Skid B', input: taggedInput(0) })).body;

    // Two writers: new projects, and saves of one design (its tag = its version - 1).
    const projectsAcknowledged: string[] = [];
    let designAcknowledged = design.version as number;
    let running = true;
    const createProjects = async () => {
      for (let n = 1; running; n++) {
        const name = `Backup load ${n}`;
        const reply = await engineer.post('/api/projects', { name });
        expect(reply.status, reply.text).toBe(201);
        projectsAcknowledged.push(name);
      }
    };
    const saveDesign = async () => {
      while (running) {
        const version = designAcknowledged;
        const reply = await engineer.put(`/api/designs/${design.id}`, { version, input: taggedInput(version) });
        expect(reply.status, reply.text).toBe(200);
        designAcknowledged = reply.body.version;
      }
    };
    const writers = [createProjects(), saveDesign()];
    await new Promise((resolve) => setTimeout(resolve, 500));

    const before = { projects: [...projectsAcknowledged], designVersion: designAcknowledged };
    const backupDir = tempFolder();
    const backup = await runToEnd(process.execPath, [BACKUP_MAIN, backupDir], { TACET_DATA_DIR: dataDir });
    const after = { projects: [...projectsAcknowledged], designVersion: designAcknowledged };
    running = false;
    await Promise.all(writers);
    await server.stop();

    expect(backup.code, backup.stderr).toBe(0);
    const [file, ...others] = readdirSync(backupDir);
    expect(others).toEqual([]);
    expect(file).toMatch(/^tacet-\d{4}-\d\d-\d\dT\d\d-\d\d-\d\dZ\.sqlite$/);
    expect(backup.stdout).toContain(join(backupDir, file));
    expect(backup.stdout).toMatch(/To restore it:[\s\S]*stop[\s\S]*tacet\.sqlite-wal[\s\S]*cp /);
    console.log(
      `backup taken with ${before.projects.length}–${after.projects.length} projects and design versions ` +
        `${before.designVersion}–${after.designVersion} acknowledged`,
    );

    // Restore as the printed steps say, into a new folder, and start a server on it.
    const restoredDir = tempFolder();
    copyFileSync(join(backupDir, file), join(restoredDir, 'tacet.sqlite'));
    expect(integrityOf(restoredDir)).toBe('ok');
    const restored = await startServer(restoredDir);
    const reader = await Api.signIn(restored.baseURL, 'engineer@tacet.test');
    const names: string[] = (await reader.get('/api/projects')).body.map((p: { name: string }) => p.name);
    // Everything acknowledged before the backup began is there; nothing that was never sent.
    for (const name of before.projects) expect(names).toContain(name);
    const loadNames = names.filter((name) => name.startsWith('Backup load '));
    expect(loadNames.length).toBeLessThanOrEqual(after.projects.length + 1);
    const restoredDesign = (await reader.get(`/api/designs/${design.id}`)).body;
    expect(restoredDesign.version).toBeGreaterThanOrEqual(before.designVersion);
    expect(restoredDesign.version).toBeLessThanOrEqual(after.designVersion + 1);
    expect(tagOfInput(restoredDesign.input)).toBe(restoredDesign.version - 1);
    await restored.stop();

    expect(integrityOf(restoredDir)).toBe('ok');
    expect(storedDesign(restoredDir, design.id).version).toBe(restoredDesign.version);
    expect(readDatabase(restoredDir, (db) => db.pragma('foreign_key_check'))).toEqual([]);
  });
});
