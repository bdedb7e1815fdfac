import { join } from 'node:path';
import type { DataSourceOptions } from 'typeorm';
import { ENTITIES } from '../database/entities.js';
import { MIGRATIONS } from '../database/migrations/index.js';
import { POSTGRES_SESSION_OPTIONS } from '../database/postgres-utc.js';

/** SQLite file name inside the data folder. */
export const SQLITE_FILE = 'tacet.sqlite';

export interface DatabaseSettings {
  dataDir: string;
  databaseUrl?: string;
}

/**
 * TypeORM options: PostgreSQL when DATABASE_URL is set, otherwise SQLite (better-sqlite3) in
 * the data folder. Migrations run at start on both; the schema is never synchronised.
 */
export function databaseOptions({ dataDir, databaseUrl }: DatabaseSettings): DataSourceOptions {
  const common = {
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsRun: true,
    synchronize: false,
  } as const;
  if (databaseUrl) {
    // sessions in UTC, like the timestamps they stamp (see useUtcTimestamps)
    return { ...common, type: 'postgres', url: databaseUrl, extra: { options: POSTGRES_SESSION_OPTIONS } };
  }
  return {
    ...common,
    type: 'better-sqlite3',
    database: join(dataDir, SQLITE_FILE),
    prepareDatabase: (db: { pragma(source: string): unknown }) => {
      db.pragma('journal_mode = WAL');
      db.pragma('busy_timeout = 5000');
      db.pragma('foreign_keys = ON');
    },
  };
}
