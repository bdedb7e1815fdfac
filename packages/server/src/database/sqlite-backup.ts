import { existsSync, mkdirSync, renameSync, rmSync, statSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';

/** Pages per backup step: all of them, so the copy is one consistent snapshot (see backupSqlite). */
const ALL_PAGES = 0x7fffffff;

export class BackupError extends Error {}

export interface BackupResult {
  /** Absolute path of the backup file. */
  file: string;
  bytes: number;
  pages: number;
}

/** `tacet-2026-12-02T05-39-34Z.sqlite`: UTC, sortable, no characters a file system refuses. */
export function backupFileName(now: Date): string {
  return `tacet-${now.toISOString().slice(0, 19).replace(/:/g, '-')}Z.sqlite`;
}

/** A name in `folder` not taken yet (a second backup in the same second gets `-2`, …). */
function freeName(folder: string, now: Date): string {
  const base = backupFileName(now);
  for (let n = 1; ; n++) {
    const candidate = join(folder, n === 1 ? base : base.replace(/\.sqlite$/, `-${n}.sqlite`));
    if (!existsSync(candidate) && !existsSync(`${candidate}.partial`)) return candidate;
  }
}

/**
 * Writes a consistent copy of the SQLite database `source` into `folder` while the server may
 * be writing to it, with SQLite's online backup API (better-sqlite3 `db.backup`). The copy is
 * made in one step, under one read transaction, so it is the database as of one commit (WAL mode
 * lets the server keep writing meanwhile); a step-by-step copy would restart at every write of
 * the server. The copy is checked (`PRAGMA integrity_check`), switched to a self-contained
 * single file (journal_mode DELETE; the server sets WAL again when it opens it) and only then
 * given its final name, so a file with that name is always a complete backup.
 */
export async function backupSqlite(source: string, folder: string, now = new Date()): Promise<BackupResult> {
  if (!existsSync(source)) throw new BackupError(`There is no database at ${source}`);
  mkdirSync(folder, { recursive: true });
  const file = freeName(folder, now);
  const partial = `${file}.partial`;
  try {
    const db = new Database(source, { fileMustExist: true });
    let pages = 0;
    try {
      db.pragma('busy_timeout = 5000');
      // Read the schema first: a file that is not a database fails here (the backup API
      // might otherwise copy nothing and call it done).
      db.prepare('SELECT count(*) FROM sqlite_master').get();
      const progress = await db.backup(partial, { progress: () => ALL_PAGES });
      pages = progress.totalPages;
    } finally {
      db.close();
    }
    const copy = new Database(partial, { fileMustExist: true });
    try {
      const integrity = copy.pragma('integrity_check', { simple: true });
      if (integrity !== 'ok') throw new BackupError(`The backup failed its integrity check: ${String(integrity)}`);
      copy.pragma('journal_mode = DELETE');
    } finally {
      copy.close();
    }
    renameSync(partial, file);
    return { file, bytes: statSync(file).size, pages };
  } catch (error) {
    for (const leftover of [partial, `${partial}-wal`, `${partial}-shm`, `${partial}-journal`]) rmSync(leftover, { force: true });
    if (error instanceof BackupError) throw error;
    // e.g. SQLITE_NOTADB: "file is not a database"
    throw new BackupError(`The backup of ${source} failed: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
  }
}
