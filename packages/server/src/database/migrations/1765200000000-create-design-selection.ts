import { Table, TableForeignKey, type MigrationInterface, type QueryRunner } from 'typeorm';

/** The last selection run on each design, with the fingerprint of the input it ran on. */
export class CreateDesignSelection1765200000000 implements MigrationInterface {
  name = 'CreateDesignSelection1765200000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const types = queryRunner.connection.driver.mappedDataTypes;
    await queryRunner.createTable(
      new Table({
        name: 'design_selection',
        columns: [
          { name: 'designId', type: 'integer', isPrimary: true },
          { name: 'inputFingerprint', type: 'varchar', length: '64' },
          { name: 'catalogRevision', type: 'integer' },
          { name: 'candidateLimit', type: 'integer' },
          { name: 'result', type: 'text' },
          { name: 'ranById', type: 'integer', isNullable: true },
          { name: 'ranAt', type: String(types.createDate) },
        ],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_design_selection_design',
            columnNames: ['designId'],
            referencedTableName: 'design',
            referencedColumnNames: ['id'],
            onDelete: 'CASCADE',
          }),
          new TableForeignKey({
            name: 'FK_design_selection_user',
            columnNames: ['ranById'],
            referencedTableName: 'user',
            referencedColumnNames: ['id'],
            onDelete: 'SET NULL',
          }),
        ],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('design_selection');
  }
}
