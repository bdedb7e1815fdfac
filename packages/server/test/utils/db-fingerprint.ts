import { createHash } from 'node:crypto';
import { DataSource } from 'typeorm';
import type { TestApp } from './create-test-app.js';

/** Per table: `<row count>:<hash of every row>`. */
export type DbFingerprint = Record<string, string>;

/**
 * A fingerprint of every entity table: the row count and a hash of all rows (each row as JSON,
 * sorted, so the order rows come back in does not matter). Cheap enough for the demo database
 * (a few hundred mounts) to take after every request of a fuzz run; two equal fingerprints mean
 * no row was added, removed or changed.
 */
export async function dbFingerprint(t: TestApp): Promise<DbFingerprint> {
  const dataSource = t.app.get(DataSource);
  const tables = [...new Set(dataSource.entityMetadatas.map((meta) => meta.tableName))].sort();
  const fingerprint: DbFingerprint = {};
  for (const table of tables) {
    const rows: object[] = await dataSource.query(`SELECT * FROM ${dataSource.driver.escape(table)}`);
    const lines = rows.map((row) => JSON.stringify(row)).sort();
    fingerprint[table] = `${rows.length}:${createHash('sha256').update(lines.join('\n')).digest('hex').slice(0, 16)}`;
  }
  return fingerprint;
}

/** The tables whose fingerprint differs (empty when nothing changed). */
export function changedTables(before: DbFingerprint, after: DbFingerprint): string[] {
  const tables = new Set([...Object.keys(before), ...Object.keys(after)]);
  return [...tables].filter((table) => before[table] !== after[table]).sort();
}
