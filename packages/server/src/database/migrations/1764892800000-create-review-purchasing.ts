import { Table, TableForeignKey, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { idColumn, timestampColumns } from '../migration-columns.js';

/** The review audit trail of designs, and requests for quotation with their status history. */
export class CreateReviewPurchasing1764892800000 implements MigrationInterface {
  name = 'CreateReviewPurchasing1764892800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const types = queryRunner.connection.driver.mappedDataTypes;
    const atColumn = { name: 'at', type: String(types.createDate), default: types.createDateDefault };
    await queryRunner.createTable(
      new Table({
        name: 'design_transition',
        columns: [
          idColumn(),
          { name: 'designId', type: 'integer' },
          { name: 'userId', type: 'integer' },
          { name: 'from', type: 'varchar', length: '16', isNullable: true },
          { name: 'to', type: 'varchar', length: '16' },
          { name: 'comment', type: 'varchar', length: '2000', isNullable: true },
          atColumn,
        ],
        indices: [new TableIndex({ name: 'IDX_design_transition_design', columnNames: ['designId'] })],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_design_transition_design',
            columnNames: ['designId'],
            referencedTableName: 'design',
            referencedColumnNames: ['id'],
            onDelete: 'CASCADE',
          }),
          new TableForeignKey({
            name: 'FK_design_transition_user',
            columnNames: ['userId'],
            referencedTableName: 'user',
            referencedColumnNames: ['id'],
            onDelete: 'RESTRICT',
          }),
        ],
      }),
    );

    await queryRunner.createTable(
      new Table({
        name: 'rfq',
        columns: [
          idColumn(),
          { name: 'designId', type: 'integer' },
          { name: 'supplierId', type: 'integer' },
          { name: 'status', type: 'varchar', length: '16' },
          { name: 'messageId', type: 'varchar', length: '300', isNullable: true },
          { name: 'failureReason', type: 'varchar', length: '2000', isNullable: true },
          { name: 'quotedPrice', type: 'double precision', isNullable: true },
          { name: 'quotedAt', type: String(types.createDate), isNullable: true },
          { name: 'createdById', type: 'integer' },
          ...timestampColumns(queryRunner),
        ],
        indices: [new TableIndex({ name: 'IDX_rfq_design', columnNames: ['designId'] })],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_rfq_design',
            columnNames: ['designId'],
            referencedTableName: 'design',
            referencedColumnNames: ['id'],
            onDelete: 'RESTRICT',
          }),
          new TableForeignKey({
            name: 'FK_rfq_supplier',
            columnNames: ['supplierId'],
            referencedTableName: 'supplier',
            referencedColumnNames: ['id'],
            onDelete: 'RESTRICT',
          }),
          new TableForeignKey({
            name: 'FK_rfq_created_by',
            columnNames: ['createdById'],
            referencedTableName: 'user',
            referencedColumnNames: ['id'],
            onDelete: 'RESTRICT',
          }),
        ],
      }),
    );

    await queryRunner.createTable(
      new Table({
        name: 'rfq_event',
        columns: [
          idColumn(),
          { name: 'rfqId', type: 'integer' },
          { name: 'status', type: 'varchar', length: '16' },
          { name: 'userId', type: 'integer' },
          { name: 'note', type: 'varchar', length: '2000', isNullable: true },
          atColumn,
        ],
        indices: [new TableIndex({ name: 'IDX_rfq_event_rfq', columnNames: ['rfqId'] })],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_rfq_event_rfq',
            columnNames: ['rfqId'],
            referencedTableName: 'rfq',
            referencedColumnNames: ['id'],
            onDelete: 'CASCADE',
          }),
          new TableForeignKey({
            name: 'FK_rfq_event_user',
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
    await queryRunner.dropTable('rfq_event');
    await queryRunner.dropTable('rfq');
    await queryRunner.dropTable('design_transition');
  }
}
