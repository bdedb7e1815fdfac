import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll } from '@jest/globals';
import { Test, type TestingModuleBuilder } from '@nestjs/testing';
import request from 'supertest';
import { configureApp } from '../../src/app.factory.js';
import { AppModule } from '../../src/app.module.js';
import { loadConfig } from '../../src/config/app-config.js';
import { DEMO_PASSWORD } from '../../src/config/environment.js';
import type { Role } from '../../src/common/roles.js';
import { TEST_DATABASE_URL, createTestDatabase, dropTestDatabase } from './test-database.js';

/** The demo account used for each role (engineer@ is the first engineer). */
export const DEMO_EMAIL_BY_ROLE: Record<Role, string> = {
  admin: 'admin@tacet.test',
  catalog_manager: 'catalog@tacet.test',
  engineer: 'engineer@tacet.test',
  purchaser: 'buyer@tacet.test',
  viewer: 'viewer@tacet.test',
};

export interface TestAppOptions {
  /** Environment on top of the defaults (demo mode on, a fresh data folder, no web client). */
  env?: Record<string, string | undefined>;
  /**
   * Reuse a data folder (e.g. to boot twice); it is then not deleted by `close()`. In the
   * PostgreSQL pass the folder stands for its database too: every boot on it uses the same one.
   */
  dataDir?: string;
  /** Replace providers before the app compiles (e.g. `b => b.overrideProvider(X).useValue(y)`). */
  override?: (builder: TestingModuleBuilder) => TestingModuleBuilder;
}

export interface TestApp {
  app: NestExpressApplication;
  dataDir: string;
  /** A supertest agent bound to the app. */
  http: () => ReturnType<typeof request>;
  /** Signs in with the demo account of `role` and returns its access token. */
  loginAs: (role: Role) => Promise<string>;
  /** Signs in with any account and returns its access token (fails the test otherwise). */
  login: (email: string, password: string) => Promise<string>;
  close: () => Promise<void>;
}

/** A fresh data folder under the OS temp folder. */
export const makeTempDir = (): string => mkdtempSync(join(tmpdir(), 'tacet-test-'));

/**
 * PostgreSQL pass: the database of each caller-owned data folder (booted on more than once);
 * dropped after the test file, since the caller deletes only the folder.
 */
const databaseOfDataDir = new Map<string, Promise<string>>();
if (TEST_DATABASE_URL) {
  afterAll(async () => {
    for (const url of databaseOfDataDir.values()) await dropTestDatabase(await url);
    databaseOfDataDir.clear();
  });
}

/**
 * Boots the real AppModule with `configureApp`, on a throwaway SQLite file (migrations and
 * demo seeding run as in production) — or, when TACET_TEST_DATABASE_URL is set, on a fresh
 * PostgreSQL database of that cluster (`tacet_t_<random>`, dropped by `close()`). Call
 * `close()` in afterAll.
 */
export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const ownsDataDir = options.dataDir === undefined;
  const dataDir = options.dataDir ?? makeTempDir();
  let ownedDatabaseUrl: string | undefined;
  let databaseUrl: string | undefined;
  if (TEST_DATABASE_URL && !(options.env && 'DATABASE_URL' in options.env)) {
    if (ownsDataDir) {
      databaseUrl = ownedDatabaseUrl = await createTestDatabase();
    } else {
      // boots on one folder, even at the same time, share its database
      const created = databaseOfDataDir.get(dataDir) ?? createTestDatabase();
      databaseOfDataDir.set(dataDir, created);
      databaseUrl = await created;
    }
  }
  const cleanUp = async () => {
    if (ownsDataDir) rmSync(dataDir, { recursive: true, force: true });
    if (ownedDatabaseUrl) await dropTestDatabase(ownedDatabaseUrl);
  };
  let app: NestExpressApplication | undefined;
  try {
    const config = loadConfig({
      TACET_DEMO: 'true',
      TACET_DATA_DIR: dataDir,
      TACET_WEB_DIST: join(dataDir, 'no-web-client'),
      ...(databaseUrl ? { DATABASE_URL: databaseUrl } : {}),
      ...options.env,
    });
    const builder = Test.createTestingModule({ imports: [AppModule.forRoot(config)] });
    const moduleRef = await (options.override?.(builder) ?? builder).compile();
    app = moduleRef.createNestApplication<NestExpressApplication>({ logger: ['fatal', 'error', 'warn'] });
    configureApp(app);
    await app.init();
  } catch (error) {
    await app?.close();
    await cleanUp();
    throw error;
  }
  const server = app.getHttpServer() as Parameters<typeof request>[0];
  const http = () => request(server);
  const login = async (email: string, password: string): Promise<string> => {
    const response = await http().post('/api/auth/login').send({ email, password });
    if (response.status !== 200) throw new Error(`Login as ${email} failed: ${response.status} ${response.text}`);
    return response.body.accessToken as string;
  };
  const started = app;
  return {
    app: started,
    dataDir,
    http,
    login,
    loginAs: (role) => login(DEMO_EMAIL_BY_ROLE[role], DEMO_PASSWORD),
    close: async () => {
      await started.close();
      await cleanUp();
    },
  };
}
