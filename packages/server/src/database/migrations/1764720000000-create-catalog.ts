import { Table, TableCheck, TableForeignKey, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { MOUNT_DAMPING_CHECK } from '../../catalog/mount.entity.js';
import { columnDefault, idColumn, timestampColumns } from '../migration-columns.js';

/** Suppliers, mounts and the record of catalog imports. */
export class CreateCatalog1764720000000 implements MigrationInterface {
  name = 'CreateCatalog1764720000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const [createdAt] = timestampColumns(queryRunner);
    const double = { type: 'double precision' } as const;
    const optionalDouble = { type: 'double precision', isNullable: true } as const;

    await queryRunner.createTable(
      new Table({
        name: 'supplier',
        columns: [
          idColumn(),
          { name: 'name', type: 'varchar', length: '120' },
          { name: 'nameKey', type: 'varchar', length: '200' },
          { name: 'contactEmail', type: 'varchar', length: '200', isNullable: true },
          { name: 'phone', type: 'varchar', length: '40', isNullable: true },
          { name: 'notes', type: 'varchar', length: '2000', isNullable: true },
          { name: 'active', type: 'boolean', default: columnDefault(queryRunner, true) },
          ...timestampColumns(queryRunner),
        ],
        indices: [new TableIndex({ name: 'IDX_supplier_name_key', columnNames: ['nameKey'], isUnique: true })],
      }),
    );

    await queryRunner.createTable(
      new Table({
        name: 'mount',
        columns: [
          idColumn(),
          { name: 'supplierId', type: 'integer' },
          { name: 'partNumber', type: 'varchar', length: '80' },
          { name: 'series', type: 'varchar', length: '80', isNullable: true },
          { name: 'mountType', type: 'varchar', length: '32' },
          { name: 'ratedLoadN', ...double },
          { name: 'verticalStiffnessNPerM', ...double },
          { name: 'horizontalStiffnessNPerM', ...optionalDouble },
          { name: 'dynamicStiffnessRatio', ...double, default: columnDefault(queryRunner, 1) },
          { name: 'dampingRatio', ...optionalDouble },
          { name: 'lossFactor', ...optionalDouble },
          { name: 'maxDeflectionMm', ...optionalDouble },
          { name: 'tempMinC', ...optionalDouble },
          { name: 'tempMaxC', ...optionalDouble },
          { name: 'heightMm', ...optionalDouble },
          { name: 'unitPrice', ...optionalDouble },
          { name: 'currency', type: 'varchar', length: '3', default: columnDefault(queryRunner, 'USD') },
          { name: 'leadTimeDays', type: 'integer', isNullable: true },
          { name: 'active', type: 'boolean', default: columnDefault(queryRunner, true) },
          ...timestampColumns(queryRunner),
        ],
        indices: [
          new TableIndex({ name: 'IDX_mount_supplier_part', columnNames: ['supplierId', 'partNumber'], isUnique: true }),
          new TableIndex({ name: 'IDX_mount_active_load', columnNames: ['active', 'ratedLoadN'] }),
          // Leading mountType; the other columns cover every filter of the catalog search.
          new TableIndex({
            name: 'IDX_mount_type',
            columnNames: ['mountType', 'active', 'ratedLoadN', 'supplierId', 'partNumber', 'series'],
          }),
          new TableIndex({ name: 'IDX_mount_series', columnNames: ['series'] }),
        ],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_mount_supplier',
            columnNames: ['supplierId'],
            referencedTableName: 'supplier',
            referencedColumnNames: ['id'],
            onDelete: 'RESTRICT',
          }),
        ],
        checks: [new TableCheck({ name: 'CHK_mount_damping', expression: MOUNT_DAMPING_CHECK })],
      }),
    );

    await queryRunner.createTable(
      new Table({
        name: 'catalog_import',
        columns: [
          idColumn(),
          { name: 'userId', type: 'integer' },
          { name: 'fileName', type: 'varchar', length: '255' },
          createdAt,
          { name: 'mode', type: 'varchar', length: '16' },
          { name: 'accepted', type: 'integer' },
          { name: 'rejected', type: 'integer' },
          { name: 'created', type: 'integer' },
          { name: 'updated', type: 'integer' },
          { name: 'errorReport', type: 'text', isNullable: true },
        ],
        indices: [new TableIndex({ name: 'IDX_catalog_import_user', columnNames: ['userId'] })],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_catalog_import_user',
            columnNames: ['userId'],
            referencedTableName: 'user',
            referencedColumnNames: ['id'],
            onDelete: 'RESTRICT',
          }),
        ],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('catalog_import');
    await queryRunner.dropTable('mount');
    await queryRunner.dropTable('supplier');
  }
}
