import { existsSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { Repository } from 'typeorm';
import { getRepositoryToken } from '@nestjs/typeorm';
import { DEMO_JWT_SECRET_FILE } from '../src/config/app-config.js';
import { SQLITE_FILE } from '../src/config/database.config.js';
import { User } from '../src/users/user.entity.js';
import { DEMO_ACCOUNTS } from '../src/users/demo-users.seed.js';
import { createTestApp, makeTempDir, type TestApp } from './utils/create-test-app.js';
import { onPostgres } from './utils/test-database.js';

const SECRET = 'an-explicit-secret-for-tests-0123456789';
const usersOf = (t: TestApp) => t.app.get<Repository<User>>(getRepositoryToken(User));

describe('startup (e2e)', () => {
  let dataDir: string;
  beforeEach(() => {
    dataDir = makeTempDir();
  });
  afterEach(() => rmSync(dataDir, { recursive: true, force: true }));

  describe('demo mode', () => {
    it('creates the six demo accounts once: a second boot on the same data creates nothing', async () => {
      const first = await createTestApp({ dataDir });
      const seeded = await usersOf(first).find({ order: { id: 'ASC' } });
      expect(seeded.map(({ email, name, role }) => ({ email, name, role }))).toEqual(DEMO_ACCOUNTS);
      // SQLite keeps the data in the folder; in the PostgreSQL pass nothing but the database holds it.
      expect(existsSync(join(dataDir, SQLITE_FILE))).toBe(!onPostgres);
      // A change made by an admin survives the next boot.
      await usersOf(first).update({ email: 'viewer@tacet.test' }, { name: 'Vic V. Viewer' });
      await first.close();

      const second = await createTestApp({ dataDir });
      try {
        const again = await usersOf(second).find({ order: { id: 'ASC' } });
        expect(again).toHaveLength(DEMO_ACCOUNTS.length);
        expect(again.map((u) => u.id)).toEqual(seeded.map((u) => u.id));
        expect(again.find((u) => u.email === 'viewer@tacet.test')?.name).toBe('Vic V. Viewer');
      } finally {
        await second.close();
      }
    });

    it('keeps a generated JWT secret in the data folder, so tokens survive a restart', async () => {
      const first = await createTestApp({ dataDir });
      const token = await first.loginAs('engineer');
      await first.close();
      expect(existsSync(join(dataDir, DEMO_JWT_SECRET_FILE))).toBe(true);

      const second = await createTestApp({ dataDir });
      try {
        await second.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
      } finally {
        await second.close();
      }
    });
  });

  describe('outside demo mode', () => {
    const production = (env: Record<string, string> = {}) => createTestApp({ dataDir, env: { TACET_DEMO: 'false', ...env } });

    it('refuses to boot without JWT_SECRET, saying why', async () => {
      await expect(production()).rejects.toThrow(/JWT_SECRET is required outside demo mode/);
    });

    it('refuses the demo password for the first admin', async () => {
      await expect(
        production({ JWT_SECRET: SECRET, TACET_ADMIN_EMAIL: 'boss@example.test', TACET_ADMIN_PASSWORD: 'tacet-demo' }),
      ).rejects.toThrow(/TACET_ADMIN_PASSWORD must not be the demo password/);
    });

    it('refuses to boot when no admin exists and none is configured', async () => {
      await expect(production({ JWT_SECRET: SECRET })).rejects.toThrow(/No active admin exists/);
    });

    it('creates the first admin from the environment, seeds no demo accounts, and refuses the demo password', async () => {
      const env = { JWT_SECRET: SECRET, TACET_ADMIN_EMAIL: ' Boss@Example.TEST ', TACET_ADMIN_PASSWORD: 'first admin password' };
      const t = await production(env);
      try {
        const users = await usersOf(t).find();
        expect(users.map(({ email, role, active }) => ({ email, role, active }))).toEqual([
          { email: 'boss@example.test', role: 'admin', active: true },
        ]);
        expect(existsSync(join(dataDir, DEMO_JWT_SECRET_FILE))).toBe(false);
        const token = await t.login('boss@example.test', 'first admin password');
        await t.http().post('/api/auth/login').send({ email: 'admin@tacet.test', password: 'tacet-demo' }).expect(401);

        const auth = { Authorization: `Bearer ${token}` };
        const create = await t
          .http()
          .post('/api/users')
          .set(auth)
          .send({ email: 'new@example.test', name: 'New', role: 'viewer', password: 'tacet-demo' });
        expect(create.status).toBe(400);
        const change = await t
          .http()
          .post('/api/auth/me/password')
          .set(auth)
          .send({ currentPassword: 'first admin password', newPassword: 'tacet-demo' });
        expect(change.status).toBe(400);
      } finally {
        await t.close();
      }

      // Later boots find the admin and need neither the admin settings nor create anyone.
      const again = await production({ JWT_SECRET: SECRET });
      try {
        expect(await usersOf(again).count()).toBe(1);
      } finally {
        await again.close();
      }
    });
  });
});
