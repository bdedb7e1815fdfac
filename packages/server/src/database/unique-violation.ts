import { QueryFailedError } from 'typeorm';

/** True when a query failed on a unique index (SQLite or PostgreSQL). */
export function isUniqueViolation(error: unknown): boolean {
  if (!(error instanceof QueryFailedError)) return false;
  const code = (error.driverError as { code?: string } | undefined)?.code;
  return code === 'SQLITE_CONSTRAINT_UNIQUE' || code === '23505';
}
