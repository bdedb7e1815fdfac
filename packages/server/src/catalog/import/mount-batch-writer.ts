import { Injectable } from '@nestjs/common';
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
  'unitPrice',
  'currency',
  'leadTimeDays',
  'active',
] as const;

const KEY = ['supplierId', 'partNumber'];

function pushParameters(target: unknown[], { supplierId, values: v }: MountWrite): void {
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
    v.unitPrice,
    v.currency,
    v.leadTimeDays,
    true, // an imported row is in the catalog: a retired mount named by a file is restored
  );
}

/**
 * Writes mounts in batches: one multi-row `INSERT … ON CONFLICT (supplierId, partNumber) DO
 * UPDATE` per batch, the same SQL on SQLite and PostgreSQL (identifiers, placeholders and the
 * current-time expression come from the TypeORM driver). A provider of its own so that a test
 * can make it fail mid-import.
 */
@Injectable()
export class MountBatchWriter {
  /** Rows per statement: 500 × 18 parameters stays far below SQLite's and PostgreSQL's limits. */
  readonly batchRows: number = 500;

  private readonly sqlCache = new Map<string, string>();

  async upsert(manager: EntityManager, rows: readonly MountWrite[]): Promise<void> {
    if (rows.length === 0) return;
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
