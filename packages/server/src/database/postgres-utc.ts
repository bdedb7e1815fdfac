import type { DataSource } from 'typeorm';

/** Session setting sent when each PostgreSQL connection starts (see databaseOptions). */
export const POSTGRES_SESSION_OPTIONS = '-c TimeZone=UTC';

/** pg's type id of `timestamp without time zone` and `timestamp with time zone`. */
const TIMESTAMP = 1114;
const TIMESTAMPTZ = 1184;

/** The parts of the `pg` module used here (TypeORM's driver holds the loaded module). */
interface PgModule {
  defaults: { parseInputDatesAsUTC: boolean };
  types: {
    getTypeParser(oid: number, format: 'text'): (text: string) => unknown;
    setTypeParser(oid: number, format: 'text', parse: (text: string) => unknown): void;
  };
}

/**
 * Tacet's timestamps are `timestamp` columns holding UTC (as SQLite holds them). On
 * PostgreSQL the sessions run in UTC (POSTGRES_SESSION_OPTIONS, so `now()` stamps UTC) and
 * pg is told to write and read those columns as UTC, not in the server process's own zone.
 * Without this a process in one zone and a database in another shift every stamp by the
 * difference. The settings belong to the `pg` module (process-wide): Tacet is its only user.
 */
export function useUtcTimestamps(dataSource: DataSource): void {
  if (dataSource.options.type !== 'postgres') return;
  const pg = (dataSource.driver as unknown as { postgres?: PgModule }).postgres;
  if (!pg?.types || !pg.defaults) return; // pg-native: not used by Tacet
  pg.defaults.parseInputDatesAsUTC = true;
  const parseWithZone = pg.types.getTypeParser(TIMESTAMPTZ, 'text');
  pg.types.setTypeParser(TIMESTAMP, 'text', (text) => parseWithZone(`${text}+00`));
}
