import { DataSource, type DataSourceOptions } from 'typeorm';
import { useUtcTimestamps } from './postgres-utc.js';
import { bindNumberParameters } from './sqlite-bound-numbers.js';
import { withStartupLock } from './startup-lock.js';

/** The part of pg's Pool we use (pg-pool emits `remove` once a client's socket has closed). */
interface PgPool {
  totalCount: number;
  on(event: 'remove', listener: () => void): unknown;
  off(event: 'remove', listener: () => void): unknown;
}

/** Upper bound on waiting for PostgreSQL sockets to close at shutdown (a safety net, not a timing). */
const SOCKET_CLOSE_LIMIT_MS = 5000;

/**
 * A DataSource whose `destroy()` resolves only when every pooled PostgreSQL connection has
 * closed its socket. pg's `Pool.end()` resolves as soon as it has asked its clients to end, so
 * without this a stopped server would still hold sockets for a moment (and a test process
 * could not tell that shutdown is complete).
 */
export class ClosingDataSource extends DataSource {
  override async destroy(): Promise<void> {
    const pool = this.options.type === 'postgres' ? (this.driver as unknown as { master?: PgPool }).master : undefined;
    if (!pool) return super.destroy();
    let left = pool.totalCount;
    let done: () => void = () => undefined;
    const closed = new Promise<void>((resolve) => {
      done = resolve;
    });
    const onRemove = () => {
      if (--left <= 0) done();
    };
    if (left === 0) done();
    pool.on('remove', onRemove);
    const limit = setTimeout(done, SOCKET_CLOSE_LIMIT_MS);
    try {
      await super.destroy();
      await closed;
    } finally {
      clearTimeout(limit);
      pool.off('remove', onRemove);
    }
  }
}

/**
 * Opens the connection and brings the schema up to date. On PostgreSQL, where several API
 * processes may start at once against one database, the migrations run under the startup
 * lock (a PostgreSQL advisory lock): the first process migrates, the others wait and then find
 * nothing pending. On SQLite (one process) TypeORM runs them while connecting (`migrationsRun`).
 */
export async function openDataSource(options: DataSourceOptions): Promise<DataSource> {
  if (options.type !== 'postgres') {
    const sqlite = new ClosingDataSource(options);
    bindNumberParameters(sqlite);
    return sqlite.initialize();
  }
  const dataSource = new ClosingDataSource({ ...options, migrationsRun: false });
  useUtcTimestamps(dataSource);
  await dataSource.initialize();
  if (!options.migrationsRun) return dataSource;
  try {
    await withStartupLock(dataSource, () => dataSource.runMigrations({ transaction: options.migrationsTransactionMode ?? 'all' }));
  } catch (error) {
    await dataSource.destroy();
    throw error;
  }
  return dataSource;
}
