import { Table, TableColumn, TableForeignKey, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnDefault, idColumn } from '../migration-columns.js';

/**
 * Hand-offs between people: temporary passwords and "forgot password" links; the author's note,
 * the named checker, the input as sent and what changed, on each submission for check; requests
 * for quotation for several machines, quoted line by line with a reference and a validity date.
 */
export class HandOffs1765152000000 implements MigrationInterface {
  name = 'HandOffs1765152000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const types = queryRunner.connection.driver.mappedDataTypes;
    const dateType = String(types.createDate);

    await queryRunner.addColumn(
      'user',
      new TableColumn({ name: 'mustChangePassword', type: 'boolean', default: columnDefault(queryRunner, false) }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'password_reset_token',
        columns: [
          idColumn(),
          { name: 'userId', type: 'integer' },
          { name: 'tokenHash', type: 'varchar', length: '64' },
          { name: 'expiresAt', type: dateType },
          { name: 'usedAt', type: dateType, isNullable: true },
          { name: 'createdAt', type: dateType, default: types.createDateDefault },
        ],
        indices: [
          new TableIndex({ name: 'IDX_password_reset_token_user', columnNames: ['userId'] }),
          new TableIndex({ name: 'IDX_password_reset_token_hash', columnNames: ['tokenHash'], isUnique: true }),
        ],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_password_reset_token_user',
            columnNames: ['userId'],
            referencedTableName: 'user',
            referencedColumnNames: ['id'],
            onDelete: 'CASCADE',
          }),
        ],
      }),
    );

    await queryRunner.addColumns('design_transition', [
      new TableColumn({ name: 'note', type: 'varchar', length: '2000', isNullable: true }),
      new TableColumn({ name: 'requestedCheckerId', type: 'integer', isNullable: true }),
      new TableColumn({ name: 'submitted', type: 'text', isNullable: true }),
      new TableColumn({ name: 'changes', type: 'text', isNullable: true }),
    ]);
    await queryRunner.createForeignKey(
      'design_transition',
      new TableForeignKey({
        name: 'FK_design_transition_requested_checker',
        columnNames: ['requestedCheckerId'],
        referencedTableName: 'user',
        referencedColumnNames: ['id'],
        onDelete: 'RESTRICT',
      }),
    );

    await queryRunner.addColumns('rfq', [
      new TableColumn({ name: 'machineCount', type: 'integer', default: columnDefault(queryRunner, 1) }),
      new TableColumn({ name: 'quoteReference', type: 'varchar', length: '200', isNullable: true }),
      new TableColumn({ name: 'quoteValidUntil', type: 'varchar', length: '10', isNullable: true }),
      new TableColumn({ name: 'quoteCurrency', type: 'varchar', length: '3', isNullable: true }),
      new TableColumn({ name: 'orderedAt', type: dateType, isNullable: true }),
    ]);
    await queryRunner.createTable(
      new Table({
        name: 'rfq_line',
        columns: [
          idColumn(),
          { name: 'rfqId', type: 'integer' },
          { name: 'position', type: 'integer' },
          { name: 'partNumber', type: 'varchar', length: '100' },
          { name: 'quantityPerMachine', type: 'integer' },
          { name: 'quantity', type: 'integer' },
          { name: 'mountPoints', type: 'text' },
          { name: 'unitPrice', type: 'double precision', isNullable: true },
          { name: 'leadTimeDays', type: 'integer', isNullable: true },
        ],
        indices: [new TableIndex({ name: 'IDX_rfq_line_rfq', columnNames: ['rfqId'] })],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_rfq_line_rfq',
            columnNames: ['rfqId'],
            referencedTableName: 'rfq',
            referencedColumnNames: ['id'],
            onDelete: 'CASCADE',
          }),
        ],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('rfq_line');
    for (const column of ['orderedAt', 'quoteCurrency', 'quoteValidUntil', 'quoteReference', 'machineCount']) {
      await queryRunner.dropColumn('rfq', column);
    }
    await queryRunner.dropForeignKey('design_transition', 'FK_design_transition_requested_checker');
    for (const column of ['changes', 'submitted', 'requestedCheckerId', 'note']) await queryRunner.dropColumn('design_transition', column);
    await queryRunner.dropTable('password_reset_token');
    await queryRunner.dropColumn('user', 'mustChangePassword');
  }
}
