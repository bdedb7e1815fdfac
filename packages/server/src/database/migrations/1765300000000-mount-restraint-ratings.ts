import { Table, TableColumn, type MigrationInterface, type QueryRunner, type TableColumnOptions } from 'typeorm';

/** The two optional ratings of a restraint (strength level, N), as the entity had them when this was written. */
const RATINGS: TableColumnOptions[] = [
  { name: 'restraintCapacityN', type: 'double precision', isNullable: true },
  { name: 'upliftCapacityN', type: 'double precision', isNullable: true },
];

/**
 * Adds the horizontal restraint rating and the uplift rating to the mount (seismic restraint,
 * docs/engineering/seismic-restraint.md §9). Existing mounts get none (null).
 *
 * SQLite adds a column by rebuilding the table, so it must read the live table (its name is
 * passed); PostgreSQL adds it in place and needs only the name, given as a Table object so that
 * the statements also compile without a connection (migrations.spec.ts).
 */
export class MountRestraintRatings1765300000000 implements MigrationInterface {
  name = 'MountRestraintRatings1765300000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.addColumns(
      mountTable(queryRunner),
      RATINGS.map((column) => new TableColumn(column)),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropColumns(
      mountTable(queryRunner),
      RATINGS.map((column) => column.name),
    );
  }
}

function mountTable(queryRunner: QueryRunner): Table | string {
  return queryRunner.connection.driver.options.type === 'postgres' ? new Table({ name: 'mount', columns: RATINGS }) : 'mount';
}
