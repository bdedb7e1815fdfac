import { Table, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnDefault, idColumn, timestampColumns } from '../migration-columns.js';

export class CreateUser1764633600000 implements MigrationInterface {
  name = 'CreateUser1764633600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'user',
        columns: [
          idColumn(),
          { name: 'email', type: 'varchar', length: '200' },
          { name: 'name', type: 'varchar', length: '200' },
          { name: 'passwordHash', type: 'varchar', length: '100' },
          { name: 'role', type: 'varchar', length: '32' },
          { name: 'unitSystem', type: 'varchar', length: '2', default: columnDefault(queryRunner, 'SI') },
          { name: 'active', type: 'boolean', default: columnDefault(queryRunner, true) },
          ...timestampColumns(queryRunner),
        ],
        indices: [new TableIndex({ name: 'IDX_user_email', columnNames: ['email'], isUnique: true })],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('user');
  }
}
