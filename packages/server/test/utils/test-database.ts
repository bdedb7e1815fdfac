import { randomBytes } from 'node:crypto';
import { describe, it } from '@jest/globals';
import { ClosingDataSource } from '../../src/database/open-data-source.js';

/**
 * The PostgreSQL pass of the API tests. With `TACET_TEST_DATABASE_URL` (an admin URL of a
 * throwaway cluster, see tools/pg/start-test-postgres.mjs) every test app gets a database of
 * its own; without it the tests run on SQLite files.
 */
export const TEST_DATABASE_URL: string | undefined = process.env.TACET_TEST_DATABASE_URL || undefined;

/** True in the PostgreSQL pass. */
export const onPostgres = TEST_DATABASE_URL !== undefined;

async function withAdmin<T>(run: (admin: ClosingDataSource) => Promise<T>): Promise<T> {
  const admin = new ClosingDataSource({ type: 'postgres', url: TEST_DATABASE_URL, poolSize: 1 });
  await admin.initialize();
  try {
    return await run(admin);
  } finally {
    await admin.destroy();
  }
}

/** Creates an empty database `tacet_t_<random>` on the test cluster and returns its URL. */
export async function createTestDatabase(): Promise<string> {
  if (!TEST_DATABASE_URL) throw new Error('TACET_TEST_DATABASE_URL is not set');
  const name = `tacet_t_${randomBytes(6).toString('hex')}`;
  await withAdmin((admin) => admin.query(`CREATE DATABASE "${name}"`));
  const url = new URL(TEST_DATABASE_URL);
  url.pathname = `/${name}`;
  return url.toString();
}

/** Drops a database made by `createTestDatabase` (closing any connection still open to it). */
export async function dropTestDatabase(databaseUrl: string): Promise<void> {
  const name = decodeURIComponent(new URL(databaseUrl).pathname.slice(1));
  if (!/^tacet_t_[0-9a-f]+$/.test(name)) throw new Error(`refusing to drop ${name}: not a test database`);
  await withAdmin((admin) => admin.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
}

type TestFn = Parameters<typeof it>[1];

/**
 * `it` for a test of SQLite internals (the database file, PRAGMAs, better-sqlite3 itself):
 * skipped in the PostgreSQL pass, its title then saying why. Keep these few: everything the API
 * promises runs on both databases.
 */
export function itSqliteOnly(reason: string, name: string, fn: TestFn, timeout?: number): void {
  if (onPostgres) it.skip(`${name} [SQLite only: ${reason}]`, fn);
  else it(name, fn, timeout);
}

/** `describe` whose tests all concern SQLite internals (see `itSqliteOnly`). */
export function describeSqliteOnly(reason: string, name: string, fn: () => void): void {
  if (onPostgres) describe.skip(`${name} [SQLite only: ${reason}]`, fn);
  else describe(name, fn);
}

/** `it` for what only PostgreSQL deployments do (several API processes on one database). */
export function itPostgresOnly(reason: string, name: string, fn: TestFn, timeout?: number): void {
  if (onPostgres) it(name, fn, timeout);
  else it.skip(`${name} [PostgreSQL only: ${reason}]`, fn);
}
