import type { DataSource } from 'typeorm';

/**
 * Key of the PostgreSQL advisory lock held while a process does its one-off start-up work
 * (migrations, the first admin, the demo seed): the bytes of "tacet" read as a number.
 */
export const STARTUP_LOCK_KEY = '499850110324';

/**
 * Runs `work` while holding the start-up lock, so that API processes starting at the same time
 * against one PostgreSQL database do their start-up work one after another (each then finds
 * the work done). The lock is a session-level advisory lock on a connection of its own; it is
 * released when `work` ends, or by PostgreSQL if the process dies. On SQLite (one process) it
 * just runs `work`.
 */
export async function withStartupLock<T>(dataSource: DataSource, work: () => Promise<T>): Promise<T> {
  if (dataSource.options.type !== 'postgres') return work();
  const runner = dataSource.createQueryRunner();
  await runner.connect();
  try {
    await runner.query('SELECT pg_advisory_lock($1)', [STARTUP_LOCK_KEY]);
    try {
      return await work();
    } finally {
      await runner.query('SELECT pg_advisory_unlock($1)', [STARTUP_LOCK_KEY]);
    }
  } finally {
    await runner.release();
  }
}
