import { Table, TableColumn, type MigrationInterface, type QueryRunner } from 'typeorm';

const REQUIRED = new TableColumn({ name: 'dynamicStiffnessRatio', type: 'double precision', isNullable: false, default: 1 });
const OPTIONAL = new TableColumn({ name: 'dynamicStiffnessRatio', type: 'double precision', isNullable: true });

/**
 * The dynamic-to-static stiffness ratio becomes optional, with no default: a mount whose supplier
 * gives none is stored without one, and the selection assumes the unfavourable value of its type
 * and says so (docs/engineering/selection.md §14) instead of a silent 1.0. Mounts stored before keep
 * their value (a 1.0 that was filled in cannot be told from one that was given).
 *
 * SQLite changes a column by rebuilding the table, so it reads the live table (its name is
 * passed); PostgreSQL alters it in place and needs only the table, given as an object so that the
 * statements also compile without a connection (migrations.spec.ts).
 */
export class MountDynamicRatioOptional1765400000000 implements MigrationInterface {
  name = 'MountDynamicRatioOptional1765400000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.changeColumn(mountTable(queryRunner, REQUIRED), REQUIRED.name, OPTIONAL);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`UPDATE "mount" SET "dynamicStiffnessRatio" = 1 WHERE "dynamicStiffnessRatio" IS NULL`);
    await queryRunner.changeColumn(mountTable(queryRunner, OPTIONAL), OPTIONAL.name, REQUIRED);
  }
}

function mountTable(queryRunner: QueryRunner, current: TableColumn): Table | string {
  return queryRunner.connection.driver.options.type === 'postgres' ? new Table({ name: 'mount', columns: [current] }) : 'mount';
}
