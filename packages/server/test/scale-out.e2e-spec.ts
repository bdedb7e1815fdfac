import { rmSync } from 'node:fs';
import { jest } from '@jest/globals';
import { Logger } from '@nestjs/common';
import { getRepositoryToken } from '@nestjs/typeorm';
import { DataSource, type Repository } from 'typeorm';
import { User } from '../src/users/user.entity.js';
import { DEMO_ACCOUNTS } from '../src/users/demo-users.seed.js';
import { createMount, createSupplier } from './factories/selection-catalog.factory.js';
import { createTestApp, makeTempDir, type TestApp } from './utils/create-test-app.js';
import { itPostgresOnly } from './utils/test-database.js';

/**
 * Several API processes on one PostgreSQL database (README "Scale out"): each test boots
 * three apps on one data folder, which in the PostgreSQL pass stands for one database — three
 * processes behind a load balancer. SQLite deployments are one process, so these run only in
 * the PostgreSQL pass.
 */
const WHY = 'several processes share one database only on PostgreSQL';
const PROCESSES = 3;
const BOOT_TIMEOUT_MS = 120_000;
const PRODUCTION: Record<string, string | undefined> = {
  TACET_DEMO: 'false',
  JWT_SECRET: 'a-scale-out-secret-that-is-long-enough-0123',
  TACET_ADMIN_EMAIL: 'boss@example.test',
  TACET_ADMIN_PASSWORD: 'first admin password',
};

describe('scale out (e2e)', () => {
  let dataDir: string;
  let apps: TestApp[] = [];
  beforeEach(() => {
    dataDir = makeTempDir();
  });
  afterEach(async () => {
    for (const t of apps) await t.close();
    apps = [];
    rmSync(dataDir, { recursive: true, force: true });
  });

  /** Boots the processes at the same moment, as after a deployment. */
  const bootAtOnce = async (env: Record<string, string | undefined> = {}) => {
    const booted = await Promise.allSettled(Array.from({ length: PROCESSES }, () => createTestApp({ dataDir, env })));
    apps = booted.flatMap((result) => (result.status === 'fulfilled' ? [result.value] : []));
    const failures = booted.flatMap((result) => (result.status === 'rejected' ? [String(result.reason)] : []));
    expect(failures).toEqual([]);
    return apps;
  };

  /** Boots once outside demo mode without an admin: the boot migrates the database, then refuses to go on. */
  const migrateOnly = () =>
    expect(
      createTestApp({ dataDir, env: { ...PRODUCTION, TACET_ADMIN_EMAIL: undefined, TACET_ADMIN_PASSWORD: undefined } }),
    ).rejects.toThrow(/No active admin exists/);

  itPostgresOnly(
    WHY,
    'processes starting at once on a new database migrate it once, cleanly',
    async () => {
      const logged = jest.spyOn(Logger.prototype, 'error');
      try {
        const [a] = await bootAtOnce();
        // none failed and retried (TypeORM's "Unable to connect to the database. Retrying")
        expect(logged.mock.calls).toEqual([]);
        const names = ((await a.app.get(DataSource).query('SELECT "name" FROM "migrations"')) as { name: string }[]).map((m) => m.name);
        expect(names).toHaveLength(a.app.get(DataSource).migrations.length);
        expect(new Set(names).size).toBe(names.length);
      } finally {
        logged.mockRestore();
      }
    },
    BOOT_TIMEOUT_MS,
  );

  itPostgresOnly(
    WHY,
    'processes starting at once in demo mode seed the demo data exactly once',
    async () => {
      await migrateOnly();
      const [a, , c] = await bootAtOnce();
      const users = a.app.get<Repository<User>>(getRepositoryToken(User));
      expect((await users.find({ order: { id: 'ASC' } })).map(({ email }) => email)).toEqual(DEMO_ACCOUNTS.map((u) => u.email));
      const admin = await c.loginAs('admin');
      const auth = { Authorization: `Bearer ${admin}` };
      expect((await c.http().get('/api/mounts/imports').set(auth)).body).toHaveLength(1);
      expect((await c.http().get('/api/mounts').query({ pageSize: 1, includeRetired: true }).set(auth)).body.total).toBe(500);
    },
    BOOT_TIMEOUT_MS,
  );

  itPostgresOnly(
    WHY,
    'outside demo mode, processes starting at once create one first admin',
    async () => {
      await migrateOnly();
      const [a] = await bootAtOnce(PRODUCTION);
      const users = await a.app.get<Repository<User>>(getRepositoryToken(User)).find();
      expect(users.map(({ email, role }) => ({ email, role }))).toEqual([{ email: 'boss@example.test', role: 'admin' }]);
    },
    BOOT_TIMEOUT_MS,
  );

  itPostgresOnly(
    WHY,
    'any process accepts a token and sees a change made through another',
    async () => {
      const [a, b, c] = await bootAtOnce();
      const manager = await a.loginAs('catalog_manager'); // signed in through a …
      const engineer = await c.loginAs('engineer');
      const supplier = await createSupplier(b, manager, 'Scale Out Mounts'); // … used on b
      const mount = await createMount(b, manager, supplier.id, { partNumber: 'SO-3000' });

      const select = (t: TestApp) =>
        t
          .http()
          .post('/api/selection')
          .set('Authorization', `Bearer ${engineer}`)
          .send({
            components: [{ name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 } }],
            mountPoints: [
              { label: 'A', x: 0.8, y: 0.45, z: 0 },
              { label: 'B', x: 0.8, y: -0.45, z: 0 },
              { label: 'C', x: -0.8, y: 0.45, z: 0 },
              { label: 'D', x: -0.8, y: -0.45, z: 0 },
            ],
            disturbingFrequenciesHz: [1480 / 60],
            criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [supplier.id] },
          });
      const ids = (response: { body: { candidates: { mountId?: number }[] } }) => response.body.candidates.map((x) => x.mountId);
      // every process reads the catalog (a selection warms whatever a process keeps of it) …
      for (const t of [a, b, c]) expect(ids(await select(t).expect(200))).toEqual([mount.id]);

      // … then the mount is retired through one process: none of them offers it any longer.
      await a.http().patch(`/api/mounts/${mount.id}`).set('Authorization', `Bearer ${manager}`).send({ active: false }).expect(200);
      for (const t of [a, b, c]) expect(ids(await select(t).expect(200))).toEqual([]);
    },
    BOOT_TIMEOUT_MS,
  );
});
