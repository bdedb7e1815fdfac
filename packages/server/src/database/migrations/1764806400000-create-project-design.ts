import { Table, TableForeignKey, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { columnDefault, idColumn, timestampColumns } from '../migration-columns.js';

/** Projects and their designs (revisions with an optimistic-lock version). */
export class CreateProjectDesign1764806400000 implements MigrationInterface {
  name = 'CreateProjectDesign1764806400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'project',
        columns: [
          idColumn(),
          { name: 'name', type: 'varchar', length: '200' },
          { name: 'site', type: 'varchar', length: '200', isNullable: true },
          { name: 'client', type: 'varchar', length: '200', isNullable: true },
          { name: 'description', type: 'varchar', length: '4000', isNullable: true },
          { name: 'ownerId', type: 'integer' },
          { name: 'archived', type: 'boolean', default: columnDefault(queryRunner, false) },
          ...timestampColumns(queryRunner),
        ],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_project_owner',
            columnNames: ['ownerId'],
            referencedTableName: 'user',
            referencedColumnNames: ['id'],
            onDelete: 'RESTRICT',
          }),
        ],
      }),
    );

    await queryRunner.createTable(
      new Table({
        name: 'design',
        columns: [
          idColumn(),
          { name: 'projectId', type: 'integer' },
          { name: 'name', type: 'varchar', length: '200' },
          { name: 'revision', type: 'integer' },
          { name: 'status', type: 'varchar', length: '16' },
          { name: 'input', type: 'text' },
          { name: 'chosen', type: 'text', isNullable: true },
          { name: 'bom', type: 'text', isNullable: true },
          { name: 'snapshot', type: 'text', isNullable: true },
          { name: 'authorId', type: 'integer' },
          { name: 'checkerId', type: 'integer', isNullable: true },
          { name: 'version', type: 'integer' },
          ...timestampColumns(queryRunner),
        ],
        indices: [
          new TableIndex({
            name: 'IDX_design_project_name_revision',
            columnNames: ['projectId', 'name', 'revision'],
            isUnique: true,
          }),
        ],
        foreignKeys: [
          new TableForeignKey({
            name: 'FK_design_project',
            columnNames: ['projectId'],
            referencedTableName: 'project',
            referencedColumnNames: ['id'],
            onDelete: 'CASCADE',
          }),
          new TableForeignKey({
            name: 'FK_design_author',
            columnNames: ['authorId'],
            referencedTableName: 'user',
            referencedColumnNames: ['id'],
            onDelete: 'RESTRICT',
          }),
          new TableForeignKey({
            name: 'FK_design_checker',
            columnNames: ['checkerId'],
            referencedTableName: 'user',
            referencedColumnNames: ['id'],
            onDelete: 'RESTRICT',
          }),
        ],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('design');
    await queryRunner.dropTable('project');
  }
}
