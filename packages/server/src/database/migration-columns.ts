import type { ColumnMetadata } from 'typeorm/metadata/ColumnMetadata.js';
import type { QueryRunner, TableColumnOptions } from 'typeorm';

/**
 * Column definitions shared by migrations, written with TypeORM's schema API so that one
 * migration runs on SQLite and PostgreSQL alike.
 */

/** `id` integer primary key, generated (INTEGER AUTOINCREMENT / SERIAL). */
export const idColumn = (): TableColumnOptions => ({
  name: 'id',
  type: 'integer',
  isPrimary: true,
  isGenerated: true,
  generationStrategy: 'increment',
});

/**
 * `createdAt` and `updatedAt` with the type and default the current driver gives
 * `@CreateDateColumn` / `@UpdateDateColumn`.
 */
export function timestampColumns(queryRunner: QueryRunner): TableColumnOptions[] {
  const types = queryRunner.connection.driver.mappedDataTypes;
  return [
    { name: 'createdAt', type: String(types.createDate), default: types.createDateDefault },
    { name: 'updatedAt', type: String(types.updateDate), default: types.updateDateDefault },
  ];
}

/**
 * A column default written the way the current driver writes an entity's `default`
 * (e.g. `true` → `1` on SQLite, `true` on PostgreSQL), so migrations and entities agree.
 */
export function columnDefault(queryRunner: QueryRunner, value: string | number | boolean): string | undefined {
  return queryRunner.connection.driver.normalizeDefault({ default: value } as ColumnMetadata);
}
