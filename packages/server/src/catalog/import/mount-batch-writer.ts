import { Injectable } from '@nestjs/common';
import type BetterSqlite3 from 'better-sqlite3';
import type { EntityManager } from 'typeorm';
import type { MountValues } from './catalog-columns.js';

/** A row ready to be written: its values and the id of its (existing or new) supplier. */
export interface MountWrite {
  supplierId: number;
  values: MountValues;
}

/** Written on insert and overwritten on conflict (the key columns excepted). */
const COLUMNS = [
  'supplierId',
  'partNumber',
  'series',
  'mountType',
  'ratedLoadN',
  'verticalStiffnessNPerM',
  'horizontalStiffnessNPerM',
  'dynamicStiffnessRatio',
  'dampingRatio',
  'lossFactor',
  'maxDeflectionMm',
  'tempMinC',
  'tempMaxC',
  'heightMm',
  'restraintCapacityN',
  'upliftCapacityN',
  'unitPrice',
  'currency',
  'leadTimeDays',
  'active',
] as const;

const KEY = ['supplierId', 'partNumber'];

function pushParameters(target: unknown[], { supplierId, values: v }: MountWrite, activeValue: boolean | number = true): void {
  target.push(
    supplierId,
    v.partNumber,
    v.series,
    v.mountType,
    v.ratedLoadN,
    v.verticalStiffnessNPerM,
    v.horizontalStiffnessNPerM,
    v.dynamicStiffnessRatio,
    v.dampingRatio,
    v.lossFactor,
    v.maxDeflectionMm,
    v.tempMinC,
    v.tempMaxC,
    v.heightMm,
    v.restraintCapacityN,
    v.upliftCapacityN,
    v.unitPrice,
    v.currency,
    v.leadTimeDays,
    activeValue, // an imported row is in the catalog: a retired mount named by a file is restored
  );
}

/**
 * Writes mounts in batches with `INSERT … ON CONFLICT (supplierId, partNumber) DO UPDATE`
 * (identifiers, placeholders and the current-time expression come from the TypeORM driver). On
 * PostgreSQL one multi-row statement per batch (one round trip). On SQLite, where there is no
 * round trip, one prepared single-row statement run per row on TypeORM's own connection (so
 * inside the import's transaction): measured faster than re-preparing a 500-row statement per
 * batch through `EntityManager.query`. A provider of its own so that a test can make it fail
 * mid-import.
 */
@Injectable()
export class MountBatchWriter {
  /** Rows per batch: 500 × 20 parameters stays far below SQLite's and PostgreSQL's limits. */
  readonly batchRows: number = 500;

  private readonly sqlCache = new Map<string, string>();
  private readonly sqliteStatements = new WeakMap<BetterSqlite3.Database, BetterSqlite3.Statement>();

  async upsert(manager: EntityManager, rows: readonly MountWrite[]): Promise<void> {
    if (rows.length === 0) return;
    const sqlite = sqliteConnectionOf(manager);
    if (sqlite) {
      let statement = this.sqliteStatements.get(sqlite);
      if (!statement) {
        statement = sqlite.prepare(this.sqlFor(manager, 1));
        this.sqliteStatements.set(sqlite, statement);
      }
      const parameters: unknown[] = [];
      for (const row of rows) {
        parameters.length = 0;
        pushParameters(parameters, row, 1); // better-sqlite3 binds no booleans
        statement.run(parameters);
      }
      return;
    }
    const parameters: unknown[] = [];
    for (const row of rows) pushParameters(parameters, row);
    await manager.query(this.sqlFor(manager, rows.length), parameters);
  }

  private sqlFor(manager: EntityManager, rowCount: number): string {
    const driver = manager.connection.driver;
    const cacheKey = `${driver.options.type}:${rowCount}`;
    const cached = this.sqlCache.get(cacheKey);
    if (cached) return cached;

    const q = (name: string) => driver.escape(name);
    let index = 0;
    const tuples = Array.from(
      { length: rowCount },
      () => `(${COLUMNS.map(() => driver.createParameter(`p${index}`, index++)).join(', ')})`,
    );
    const updates = COLUMNS.filter((column) => !KEY.includes(column)).map((column) => `${q(column)} = excluded.${q(column)}`);
    updates.push(`${q('updatedAt')} = ${driver.mappedDataTypes.updateDateDefault}`);
    const sql =
      `INSERT INTO ${q('mount')} (${COLUMNS.map(q).join(', ')}) VALUES ${tuples.join(', ')} ` +
      `ON CONFLICT (${KEY.map(q).join(', ')}) DO UPDATE SET ${updates.join(', ')}`;
    this.sqlCache.set(cacheKey, sql);
    return sql;
  }
}

/** The open better-sqlite3 connection behind a manager, or null on another driver (or before it connects). */
function sqliteConnectionOf(manager: EntityManager): BetterSqlite3.Database | null {
  if (manager.connection.options.type !== 'better-sqlite3') return null;
  const connection = (manager.connection.driver as unknown as { databaseConnection?: BetterSqlite3.Database }).databaseConnection;
  return connection?.open ? connection : null;
}
