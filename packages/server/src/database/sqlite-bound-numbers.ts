import type { DataSource, ObjectLiteral } from 'typeorm';

/** The driver method replaced here (TypeORM's AbstractSqliteDriver). */
interface SqliteParameterDriver {
  escapeQueryWithParameters(sql: string, parameters: ObjectLiteral, nativeParameters: ObjectLiteral): [string, unknown[]];
}

/** A named parameter in TypeORM's SQL (`:name`, or `:...name` for a list), as the driver finds them. */
const NAMED_PARAMETER = /:(\.\.\.)?([A-Za-z0-9_.]+)/g;

/**
 * TypeORM's SQLite drivers write every number parameter into the SQL text (`"id" = 42`) rather
 * than binding it, so each design id, mount id or load limit makes a new statement: better-sqlite3
 * compiles it again, and the driver's statement cache (first in, first out, 100 statements) is
 * flushed by one-off statements. Under load that compiling was about a tenth of the server's
 * time. Here numbers are bound like strings (`"id" = ?`), so a statement is compiled once per
 * shape and then taken from the cache.
 *
 * Same results: better-sqlite3 binds a number as an 8-byte real, and SQLite compares and stores
 * it by the column's affinity (an INTEGER or NUMERIC column keeps 42 as the integer 42; a
 * comparison with an integer column is numeric). Tacet compares no text column with a number.
 * Strings, booleans (1 or 0), dates and lists go through the driver as before. PostgreSQL binds
 * numbers already and is not touched. Tested against the inlining driver in
 * sqlite-bound-numbers.spec.ts; measured with `npm run test:load` (DEVELOPERS.md).
 */
export function bindNumberParameters(dataSource: DataSource): void {
  if (dataSource.options.type !== 'better-sqlite3') return;
  const driver = dataSource.driver as unknown as SqliteParameterDriver;
  const inlining = driver.escapeQueryWithParameters.bind(driver);
  driver.escapeQueryWithParameters = (sql, parameters, nativeParameters) => {
    if (!parameters || !Object.values(parameters).some((value) => typeof value === 'number')) {
      return inlining(sql, parameters, nativeParameters);
    }
    const bound: unknown[] = [];
    const text = sql.replace(NAMED_PARAMETER, (full: string, list: string | undefined, key: string) => {
      if (!Object.prototype.hasOwnProperty.call(parameters, key)) return full;
      const value: unknown = parameters[key];
      if (typeof value === 'number' && !list) {
        bound.push(value);
        return '?';
      }
      // everything else exactly as the driver writes it, one parameter at a time
      const [part, values] = inlining(full, { [key]: value }, nativeParameters);
      bound.push(...values);
      return part;
    });
    return [text, bound];
  };
}
