import { Table, TableForeignKey, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { idColumn } from '../migration-columns.js';

/** As-built measurements (tap tests) of released designs and their comparison with the prediction. */
export class CreateDesignVerification1765100000000 implements MigrationInterface {
  name = 'CreateDesignVerification1765100000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const types = queryRunner.connection.driver.mappedDataTypes;
    await queryRunner.createTable(
      new Table({
        name: 'design_verification',
        columns: [
          idColumn(),
          { name: 'designId', type: 'integer' },
          { name: 'userId', type: 'integer' },
          { name: 'kind', type: 'varchar', length: '8' },
          { name: 'quantity', type: 'varchar', length: '16' },
          { name: 'fileName', type: 'varchar', length: '255' },
          { name: 'note', type: 'varchar', length: '500', isNullable: true },
          { name: 'tolerancePct', type: 'double precision' },
          { name: 'naturalFrequencyHz', type: 'double precision' },
          { name: 'predictedFrequencyHz', type: 'double precision' },
          { name: 'deviationPct', type: 'double precision' },
          { name: 'verdict', type: 'varchar', length: '8' },
          { name: 'outcome', type: 'text' },
          { name: 'createdAt', type: String(types.createDate), default: types.createDateDefault },
        ],
        indices: [new TableIndex({ name: 'IDX_design_verification_design', columnNames: ['designId'] })],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_design_verification_design',
            columnNames: ['designId'],
            referencedTableName: 'design',
            referencedColumnNames: ['id'],
            onDelete: 'CASCADE',
          }),
          new TableForeignKey({
            name: 'FK_design_verification_user',
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
    await queryRunner.dropTable('design_verification');
  }
}
