import { Table, type MigrationInterface, type QueryRunner } from 'typeorm';

/** The catalog revision counter (one row), bumped with every change to mounts or suppliers. */
export class CreateCatalogRevision1764979200000 implements MigrationInterface {
  name = 'CreateCatalogRevision1764979200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'catalog_revision',
        columns: [
          { name: 'id', type: 'integer', isPrimary: true },
          { name: 'revision', type: 'integer', default: 0 },
        ],
      }),
    );
    await queryRunner.query('INSERT INTO "catalog_revision" ("id", "revision") VALUES (1, 0)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('catalog_revision');
  }
}
