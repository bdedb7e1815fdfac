import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from '@jest/globals';
import Database from 'better-sqlite3';
import { BackupError, backupFileName, backupSqlite } from './sqlite-backup.js';

describe('backupSqlite', () => {
  let dir: string;
  let source: string;
  let live: Database.Database;

  beforeEach(() => {
    dir = mkdtempSync(join(tmpdir(), 'tacet-backup-'));
    source = join(dir, 'tacet.sqlite');
    // A database as the server keeps it: WAL mode, a connection open, recent commits still in the WAL.
    live = new Database(source);
    live.pragma('journal_mode = WAL');
    live.pragma('wal_autocheckpoint = 0');
    live.exec('CREATE TABLE item (id INTEGER PRIMARY KEY, body TEXT NOT NULL)');
    const insert = live.prepare('INSERT INTO item (body) VALUES (?)');
    for (let i = 0; i < 2000; i++) insert.run(`row ${i} ${'x'.repeat(200)}`);
  });

  afterEach(() => {
    if (live.open) live.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('copies every committed row, including those only in the WAL, while the source stays open', async () => {
    expect(existsSync(`${source}-wal`)).toBe(true);
    const now = new Date('2026-03-04T05:06:07.890Z');
    const result = await backupSqlite(source, join(dir, 'backups'), now);
    expect(result.file).toBe(join(dir, 'backups', 'tacet-2026-03-04T05-06-07Z.sqlite'));
    expect(readdirSync(join(dir, 'backups'))).toEqual(['tacet-2026-03-04T05-06-07Z.sqlite']);

    const copy = new Database(result.file, { readonly: true });
    try {
      expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
      expect(copy.pragma('journal_mode', { simple: true })).toBe('delete'); // one self-contained file
      expect(copy.prepare('SELECT count(*) AS n FROM item').get()).toEqual({ n: 2000 });
    } finally {
      copy.close();
    }
    // The source is untouched and still writable by its own connection.
    live.prepare('INSERT INTO item (body) VALUES (?)').run('after');
    expect(live.prepare('SELECT count(*) AS n FROM item').get()).toEqual({ n: 2001 });
  });

  it('leaves out what is not committed yet', async () => {
    live.exec('BEGIN');
    live.prepare('INSERT INTO item (body) VALUES (?)').run('uncommitted');
    const { file } = await backupSqlite(source, join(dir, 'backups'));
    live.exec('ROLLBACK');
    const copy = new Database(file, { readonly: true });
    try {
      expect(copy.prepare('SELECT count(*) AS n FROM item').get()).toEqual({ n: 2000 });
    } finally {
      copy.close();
    }
  });

  it('never overwrites an earlier backup taken in the same second', async () => {
    const now = new Date('2026-03-04T05:06:07Z');
    const first = await backupSqlite(source, dir, now);
    const second = await backupSqlite(source, dir, now);
    expect(second.file).not.toBe(first.file);
    expect(second.file.endsWith('tacet-2026-03-04T05-06-07Z-2.sqlite')).toBe(true);
  });

  it('refuses a missing database and leaves no partial file behind a failure', async () => {
    await expect(backupSqlite(join(dir, 'missing.sqlite'), join(dir, 'out'))).rejects.toThrow(BackupError);
    const notADatabase = join(dir, 'junk.sqlite');
    writeFileSync(notADatabase, 'this is not a database file, just text that is long enough '.repeat(20));
    await expect(backupSqlite(notADatabase, join(dir, 'out'))).rejects.toThrow(/not a database/);
    expect(existsSync(join(dir, 'out')) ? readdirSync(join(dir, 'out')) : []).toEqual([]);
  });

  it('names files by UTC time, sortable', () => {
    expect(backupFileName(new Date('2026-12-31T23:59:59.999Z'))).toBe('tacet-2026-12-31T23-59-59Z.sqlite');
    expect(backupFileName(new Date('2026-01-02T03:04:05Z')) < backupFileName(new Date('2026-01-10T00:00:00Z'))).toBe(true);
  });
});
