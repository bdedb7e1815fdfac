import { CannotExecuteNotConnectedError } from 'typeorm';

/**
 * Why the database refused a request when the fault lies in the storage, not in the request:
 * the user can do nothing but wait or call an administrator, so the answer is 503 with
 * Retry-After rather than a bare 500.
 */
export type StorageFailureKind = 'read_only' | 'full' | 'write_failed' | 'io' | 'busy' | 'unavailable';

export interface StorageFailure {
  kind: StorageFailureKind;
  /** The driver's code (SQLite result code name, PostgreSQL SQLSTATE, or Node's errno name). */
  code: string;
  /** For the user: what happened and what to do, in plain words. */
  message: string;
  /** Seconds the client should wait before trying again (the Retry-After header). */
  retryAfterSeconds: number;
}

const ADVICE: Record<StorageFailureKind, { message: string; retryAfterSeconds: number }> = {
  read_only: {
    message:
      "The data store is not writable right now (it is read-only), so nothing was saved. Ask your administrator to check the server's data folder, then try again.",
    retryAfterSeconds: 60,
  },
  full: {
    message: 'The data store is full, so nothing was saved. Ask your administrator to free disk space on the server, then try again.',
    retryAfterSeconds: 60,
  },
  write_failed: {
    message:
      "The data store is not writable right now (the disk may be full or failing), so nothing was saved. Ask your administrator to check the server's storage, then try again.",
    retryAfterSeconds: 60,
  },
  io: {
    message:
      "The data store could not be read or written, so the request was not completed. Try again shortly; if it keeps failing, ask your administrator to check the server's storage.",
    retryAfterSeconds: 30,
  },
  busy: {
    message: 'The data store is busy, so the request was not completed. Try again in a few seconds.',
    retryAfterSeconds: 5,
  },
  unavailable: {
    message:
      'The database cannot be reached right now, so the request was not completed. Try again shortly; if it keeps failing, ask your administrator.',
    retryAfterSeconds: 30,
  },
};

/** SQLite extended result codes that mean "writing failed" (the rest of SQLITE_IOERR_* is `io`). */
const SQLITE_WRITE_IOERR = new Set([
  'SQLITE_IOERR_WRITE',
  'SQLITE_IOERR_FSYNC',
  'SQLITE_IOERR_DIR_FSYNC',
  'SQLITE_IOERR_TRUNCATE',
  'SQLITE_IOERR_DELETE',
  'SQLITE_IOERR_SHMSIZE',
]);

/** SQLite result code names as better-sqlite3 reports them (`SqliteError.code`). */
function sqliteKind(code: string): StorageFailureKind | null {
  if (code === 'SQLITE_READONLY' || code.startsWith('SQLITE_READONLY_') || code === 'SQLITE_PERM') return 'read_only';
  if (code === 'SQLITE_FULL') return 'full';
  if (SQLITE_WRITE_IOERR.has(code)) return 'write_failed';
  if (code === 'SQLITE_IOERR' || code.startsWith('SQLITE_IOERR_')) return 'io';
  if (code === 'SQLITE_CANTOPEN' || code.startsWith('SQLITE_CANTOPEN_')) return 'io';
  // BUSY reaches us only after busy_timeout has run out; LOCKED is the same wait inside one connection.
  if (code === 'SQLITE_BUSY' || code.startsWith('SQLITE_BUSY_')) return 'busy';
  if (code === 'SQLITE_LOCKED' || code.startsWith('SQLITE_LOCKED_')) return 'busy';
  return null;
}

/** PostgreSQL SQLSTATE codes (Appendix A of the PostgreSQL manual) that are storage or server faults. */
const POSTGRES_KINDS: Record<string, StorageFailureKind> = {
  '53100': 'full', // disk_full
  '25006': 'read_only', // read_only_sql_transaction (e.g. a hot standby)
  '58030': 'io', // io_error
  '53000': 'unavailable', // insufficient_resources
  '53200': 'unavailable', // out_of_memory
  '53300': 'unavailable', // too_many_connections
  '57P01': 'unavailable', // admin_shutdown
  '57P02': 'unavailable', // crash_shutdown
  '57P03': 'unavailable', // cannot_connect_now
  '57P05': 'unavailable', // idle_session_timeout
  '55P03': 'busy', // lock_not_available (lock_timeout)
  '57014': 'busy', // query_canceled (statement_timeout)
  '40001': 'busy', // serialization_failure
  '40P01': 'busy', // deadlock_detected
};

function postgresKind(code: string): StorageFailureKind | null {
  if (/^08[0-9A-Z]{3}$/.test(code)) return 'unavailable'; // class 08: connection exception
  return POSTGRES_KINDS[code] ?? null;
}

/** Node's errno names for a database server that cannot be reached. */
const CONNECTION_ERRNOS = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH', 'EAI_AGAIN', 'EPIPE']);

/** Node's errno names for a file system that refuses a write (e.g. an upload to the temp folder). */
const FILE_SYSTEM_ERRNOS: Record<string, StorageFailureKind> = {
  ENOSPC: 'full',
  EDQUOT: 'full',
  EFBIG: 'full',
  EROFS: 'read_only',
  EIO: 'io',
};

/**
 * A lost, timed-out or closed connection reported without a code: node-postgres's wording, and
 * better-sqlite3's once the connection is closed (a request still running while the server stops).
 */
const CONNECTION_LOST_MESSAGE =
  /^(Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error|The database connection is not open)/;

/** The error and the errors it wraps (TypeORM's `driverError`, standard `cause`), outermost first. */
function chainOf(error: unknown): object[] {
  const chain: object[] = [];
  let current: unknown = error;
  while (current !== null && typeof current === 'object' && chain.length < 6 && !chain.includes(current)) {
    chain.push(current);
    const next: unknown = (current as { driverError?: unknown }).driverError ?? (current as { cause?: unknown }).cause;
    current = next;
  }
  return chain;
}

function kindOf(link: object): { kind: StorageFailureKind; code: string } | null {
  if (link instanceof CannotExecuteNotConnectedError) return { kind: 'unavailable', code: 'NOT_CONNECTED' };
  const code = (link as { code?: unknown }).code;
  if (typeof code === 'string') {
    const kind = code.startsWith('SQLITE_')
      ? sqliteKind(code)
      : CONNECTION_ERRNOS.has(code)
        ? 'unavailable'
        : (FILE_SYSTEM_ERRNOS[code] ?? postgresKind(code));
    return kind ? { kind, code } : null;
  }
  const message = (link as { message?: unknown }).message;
  if (typeof message === 'string' && CONNECTION_LOST_MESSAGE.test(message)) {
    return { kind: 'unavailable', code: 'CONNECTION_LOST' };
  }
  return null;
}

/**
 * Recognises an error of the storage underneath (SQLite, PostgreSQL, the file system): read-only
 * or full storage, I/O errors, a database that stays busy or cannot be reached. Anything else → null
 * (a bug, answered with a bare 500).
 */
export function storageFailureOf(error: unknown): StorageFailure | null {
  for (const link of chainOf(error)) {
    const found = kindOf(link);
    if (found) return { ...found, ...ADVICE[found.kind] };
  }
  return null;
}
