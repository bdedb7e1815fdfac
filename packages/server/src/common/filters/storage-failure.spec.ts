import { mkdtempSync, rmSync } from 'node:fs';
import { createServer, type AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it, jest } from '@jest/globals';
import { ArgumentsHost, ConflictException } from '@nestjs/common';
import Database from 'better-sqlite3';
import { DataSource, QueryFailedError } from 'typeorm';
import { AllExceptionsFilter, toErrorBody } from './all-exceptions.filter.js';
import { storageFailureOf } from './storage-failure.js';

/** The rejection of a promise (fails the test when it resolves). */
async function rejectionOf(promise: Promise<unknown>): Promise<unknown> {
  try {
    await promise;
  } catch (error) {
    return error;
  }
  throw new Error('expected a rejection');
}

function thrownBy(fn: () => unknown): unknown {
  try {
    fn();
  } catch (error) {
    return error;
  }
  throw new Error('expected a throw');
}

// The SQLite cases provoke real errors from better-sqlite3 through TypeORM's driver, as the
// server sees them (QueryFailedError wrapping a SqliteError).
describe('storageFailureOf — real SQLite errors', () => {
  let dir: string;
  let file: string;
  const sources: DataSource[] = [];

  const open = async (options: { readonly?: boolean; prepare?: (db: Database.Database) => void } = {}): Promise<DataSource> => {
    const source = new DataSource({
      type: 'better-sqlite3',
      database: file,
      readonly: options.readonly,
      prepareDatabase: options.prepare,
    });
    await source.initialize();
    sources.push(source);
    return source;
  };

  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'tacet-storage-failure-'));
    file = join(dir, 'test.sqlite');
    const db = new Database(file);
    db.exec('CREATE TABLE t (id INTEGER PRIMARY KEY, body TEXT UNIQUE)');
    db.close();
  });

  afterAll(async () => {
    for (const source of sources) if (source.isInitialized) await source.destroy();
    rmSync(dir, { recursive: true, force: true });
  });

  it('a read-only database → read_only, 503 with words a user understands', async () => {
    const source = await open({ readonly: true });
    const error = await rejectionOf(source.query('INSERT INTO t (body) VALUES (?)', ['x']));
    expect(error).toBeInstanceOf(QueryFailedError);
    expect(storageFailureOf(error)).toMatchObject({ kind: 'read_only', code: 'SQLITE_READONLY', retryAfterSeconds: 60 });
    expect(toErrorBody(error)).toEqual({
      statusCode: 503,
      message: expect.stringMatching(/^The data store is not writable right now .*nothing was saved/),
    });
  });

  it('a full database (max_page_count reached) → full', async () => {
    const source = await open({ prepare: (db) => db.pragma(`max_page_count = ${db.pragma('page_count', { simple: true })}`) });
    const error = await rejectionOf(source.query('INSERT INTO t (body) VALUES (?)', ['y'.repeat(100_000)]));
    expect(storageFailureOf(error)).toMatchObject({ kind: 'full', code: 'SQLITE_FULL' });
    expect(toErrorBody(error)).toMatchObject({ statusCode: 503, message: expect.stringMatching(/^The data store is full/) });
  });

  it('a database another connection keeps locked past the busy timeout → busy', async () => {
    const holder = new Database(file);
    holder.exec('BEGIN IMMEDIATE');
    try {
      const source = await open({ prepare: (db) => db.pragma('busy_timeout = 0') });
      const error = await rejectionOf(source.query('INSERT INTO t (body) VALUES (?)', ['z']));
      expect(storageFailureOf(error)).toMatchObject({ kind: 'busy', code: 'SQLITE_BUSY', retryAfterSeconds: 5 });
    } finally {
      holder.exec('ROLLBACK');
      holder.close();
    }
  });

  it('a database file that cannot be opened → io', () => {
    const error = thrownBy(() => new Database(dir)); // a folder, not a database file
    expect(storageFailureOf(error)).toMatchObject({ kind: 'io', code: 'SQLITE_CANTOPEN' });
  });

  it('classifies the extended I/O codes: write failures apart from other I/O errors', () => {
    const sqlite = (code: string) => new Database.SqliteError('disk I/O error', code);
    expect(storageFailureOf(sqlite('SQLITE_IOERR_WRITE'))?.kind).toBe('write_failed');
    expect(storageFailureOf(sqlite('SQLITE_IOERR_FSYNC'))?.kind).toBe('write_failed');
    expect(storageFailureOf(sqlite('SQLITE_IOERR_READ'))?.kind).toBe('io');
    expect(storageFailureOf(sqlite('SQLITE_IOERR'))?.kind).toBe('io');
    expect(storageFailureOf(sqlite('SQLITE_READONLY_DBMOVED'))?.kind).toBe('read_only');
    expect(storageFailureOf(sqlite('SQLITE_BUSY_SNAPSHOT'))?.kind).toBe('busy');
  });

  it('leaves a request fault (a unique violation) to its 500/409 handling', async () => {
    const source = await open();
    await source.query('INSERT INTO t (body) VALUES (?)', ['same']);
    const error = await rejectionOf(source.query('INSERT INTO t (body) VALUES (?)', ['same']));
    expect((error as { code?: string }).code).toBe('SQLITE_CONSTRAINT_UNIQUE');
    expect(storageFailureOf(error)).toBeNull();
    expect(toErrorBody(error)).toEqual({ statusCode: 500, message: 'Internal server error' });
  });

  it('a closed connection (shutting down) → unavailable', async () => {
    const source = await open();
    await source.destroy();
    const error = await rejectionOf(source.query('SELECT 1'));
    expect(storageFailureOf(error)).toMatchObject({ kind: 'unavailable' });
  });
});

describe('storageFailureOf — PostgreSQL', () => {
  // SQLSTATE codes from Appendix A "PostgreSQL Error Codes" of the PostgreSQL manual.
  // Shaped as node-postgres's DatabaseError (name "error", severity, SQLSTATE code), wrapped by TypeORM.
  const pgError = (code: string) =>
    new QueryFailedError('UPDATE design SET …', [], Object.assign(new Error('server error'), { name: 'error', severity: 'ERROR', code }));

  it.each([
    ['53100', 'full'], // disk_full
    ['25006', 'read_only'], // read_only_sql_transaction
    ['57P01', 'unavailable'], // admin_shutdown
    ['57P03', 'unavailable'], // cannot_connect_now
    ['08006', 'unavailable'], // connection_failure
    ['53300', 'unavailable'], // too_many_connections
    ['55P03', 'busy'], // lock_not_available
    ['40P01', 'busy'], // deadlock_detected
    ['58030', 'io'], // io_error
  ])('SQLSTATE %s → %s', (code, kind) => {
    expect(storageFailureOf(pgError(code))).toMatchObject({ kind, code });
  });

  it('leaves request faults alone (unique violation, undefined column)', () => {
    expect(storageFailureOf(pgError('23505'))).toBeNull();
    expect(storageFailureOf(pgError('42703'))).toBeNull();
  });

  it('a server that refuses the connection (a real ECONNREFUSED through TypeORM and node-postgres) → unavailable', async () => {
    const server = createServer();
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as AddressInfo;
    await new Promise<void>((resolve) => server.close(() => resolve()));
    const source = new DataSource({ type: 'postgres', host: '127.0.0.1', port, username: 'tacet', connectTimeoutMS: 2000 });
    const error = await rejectionOf(source.initialize());
    expect(storageFailureOf(error)).toMatchObject({ kind: 'unavailable', code: 'ECONNREFUSED' });
  });

  it('a dropped connection (node-postgres says so without a code) → unavailable', () => {
    expect(storageFailureOf(new Error('Connection terminated unexpectedly'))).toMatchObject({ kind: 'unavailable' });
  });
});

describe('storageFailureOf — the file system', () => {
  const errno = (code: string) => Object.assign(new Error(`${code}: write failed`), { code, errno: -1, syscall: 'write' });

  it('a full or read-only file system (e.g. writing an upload) → full / read_only', () => {
    expect(storageFailureOf(errno('ENOSPC'))?.kind).toBe('full');
    expect(storageFailureOf(errno('EFBIG'))?.kind).toBe('full');
    expect(storageFailureOf(errno('EROFS'))?.kind).toBe('read_only');
    expect(storageFailureOf(errno('ENOENT'))).toBeNull();
    expect(storageFailureOf(errno('EACCES'))).toBeNull();
  });
});

describe('AllExceptionsFilter with a storage failure', () => {
  const hostFor = () => {
    const headers: Record<string, string> = {};
    const sent: { status?: number; body?: unknown } = {};
    const response = {
      headersSent: false,
      setHeader: (name: string, value: string) => {
        headers[name.toLowerCase()] = value;
      },
      status(code: number) {
        sent.status = code;
        return this;
      },
      json(body: unknown) {
        sent.body = body;
      },
      end: jest.fn(),
    };
    const request = { method: 'PUT', originalUrl: '/api/designs/7' };
    const host = {
      switchToHttp: () => ({ getRequest: () => request, getResponse: () => response }),
    } as unknown as ArgumentsHost;
    return { host, headers, sent };
  };

  it('answers 503 JSON with Retry-After', () => {
    const { host, headers, sent } = hostFor();
    const error = new QueryFailedError('UPDATE …', [], new Database.SqliteError('database or disk is full', 'SQLITE_FULL'));
    new AllExceptionsFilter().catch(error, host);
    expect(sent.status).toBe(503);
    expect(sent.body).toEqual({ statusCode: 503, message: expect.stringContaining('The data store is full') });
    expect(headers['retry-after']).toBe('60');
  });

  it('sets no Retry-After for other errors', () => {
    const { host, headers, sent } = hostFor();
    new AllExceptionsFilter().catch(new ConflictException('Stale version'), host);
    expect(sent.status).toBe(409);
    expect(headers['retry-after']).toBeUndefined();
  });
});
