import type { DataSource } from 'typeorm';
import { STARTUP_LOCK_KEY, withStartupLock } from './startup-lock.js';

/** A DataSource stand-in that records what its one query runner is asked to do. */
function fakeDataSource(type: string) {
  const log: string[] = [];
  const dataSource = {
    options: { type },
    createQueryRunner: () => ({
      connect: async () => log.push('connect'),
      query: async (sql: string, parameters: unknown[]) => log.push(`${sql} ${parameters.join(',')}`),
      release: async () => log.push('release'),
    }),
  } as unknown as DataSource;
  return { dataSource, log };
}

describe('withStartupLock', () => {
  it('on PostgreSQL runs the work between pg_advisory_lock and pg_advisory_unlock on a connection of its own', async () => {
    const { dataSource, log } = fakeDataSource('postgres');
    expect(await withStartupLock(dataSource, async () => (log.push('work'), 42))).toBe(42);
    expect(log).toEqual([
      'connect',
      `SELECT pg_advisory_lock($1) ${STARTUP_LOCK_KEY}`,
      'work',
      `SELECT pg_advisory_unlock($1) ${STARTUP_LOCK_KEY}`,
      'release',
    ]);
  });

  it('releases the lock and the connection when the work fails', async () => {
    const { dataSource, log } = fakeDataSource('postgres');
    await expect(withStartupLock(dataSource, async () => Promise.reject(new Error('migration failed')))).rejects.toThrow(
      'migration failed',
    );
    expect(log.slice(-2)).toEqual([`SELECT pg_advisory_unlock($1) ${STARTUP_LOCK_KEY}`, 'release']);
  });

  it('on SQLite (one process) just runs the work', async () => {
    const { dataSource, log } = fakeDataSource('better-sqlite3');
    expect(await withStartupLock(dataSource, async () => 'done')).toBe('done');
    expect(log).toEqual([]);
  });

  it('uses the bytes of "tacet" as the key', () => {
    expect(BigInt(STARTUP_LOCK_KEY)).toBe(BigInt(`0x${Buffer.from('tacet').toString('hex')}`));
  });
});
