import { createHash } from 'node:crypto';
import { join } from 'node:path';
import Database from 'better-sqlite3';

export const SQLITE_FILE = 'tacet.sqlite';

/**
 * Opens the data folder's database read-only for one look (the server may be running: WAL mode
 * lets a reader in beside it).
 */
export function readDatabase<T>(dataDir: string, look: (db: Database.Database) => T): T {
  const db = new Database(join(dataDir, SQLITE_FILE), { readonly: true, fileMustExist: true });
  try {
    return look(db);
  } finally {
    db.close();
  }
}

/** `PRAGMA integrity_check`: 'ok' or SQLite's list of problems. */
export function integrityOf(dataDir: string): string {
  return readDatabase(dataDir, (db) => String(db.pragma('integrity_check', { simple: true })));
}

/** SHA-256 of every row of the tables, in primary-key order: equal digests, equal contents. */
export function digestOf(dataDir: string, tables: string[]): string {
  return readDatabase(dataDir, (db) => {
    const hash = createHash('sha256');
    for (const table of tables) {
      hash.update(`\u0000${table}\u0000`);
      for (const row of db.prepare(`SELECT * FROM "${table}" ORDER BY rowid`).iterate()) hash.update(JSON.stringify(row));
    }
    return hash.digest('hex');
  });
}

export function countOf(dataDir: string, table: string): number {
  return readDatabase(dataDir, (db) => (db.prepare(`SELECT count(*) AS n FROM "${table}"`).get() as { n: number }).n);
}

export interface StoredDesign {
  version: number;
  name: string;
  input: { components: Array<{ massKg: number }> };
}

export function storedDesign(dataDir: string, id: number): StoredDesign {
  return readDatabase(dataDir, (db) => {
    const row = db.prepare('SELECT version, name, input FROM design WHERE id = ?').get(id) as
      { version: number; name: string; input: string } | undefined;
    if (!row) throw new Error(`design ${id} is not in the database`);
    return { version: row.version, name: row.name, input: JSON.parse(row.input) };
  });
}
