import { DataSource } from 'typeorm';
import { capturingPostgresQueryRunner } from '../../test/utils/postgres-sql-capture.js';
import { databaseOptions } from '../config/database.config.js';
import { MountDynamicRatioOptional1765400000000 } from '../database/migrations/1765400000000-mount-dynamic-ratio-optional.js';
import { MIGRATIONS } from '../database/migrations/index.js';

describe('MountDynamicRatioOptional migration', () => {
  it('compiles to PostgreSQL as the default and NOT NULL dropped in place (and back)', async () => {
    const { queryRunner, statements } = capturingPostgresQueryRunner();
    await new MountDynamicRatioOptional1765400000000().up(queryRunner);
    const up = statements.join('\n');
    expect(up).toContain('ALTER TABLE "mount" ALTER COLUMN "dynamicStiffnessRatio" DROP NOT NULL');
    expect(up).toContain('ALTER TABLE "mount" ALTER COLUMN "dynamicStiffnessRatio" DROP DEFAULT');
    expect(up).not.toMatch(/DROP COLUMN|CREATE TABLE/);
  });

  it('keeps every mount and its ratio on SQLite, where the table is rebuilt; a new mount may have none; back again fills 1', async () => {
    const before = MIGRATIONS.slice(0, MIGRATIONS.indexOf(MountDynamicRatioOptional1765400000000));
    const dataSource = new DataSource({ ...databaseOptions({ dataDir: '.' }), database: ':memory:', migrations: before } as never);
    await dataSource.initialize();
    const queryRunner = dataSource.createQueryRunner();
    try {
      await dataSource.query(`INSERT INTO "supplier" ("name", "nameKey") VALUES ('Vellmark Springs', 'vellmark springs')`);
      await dataSource.query(
        `INSERT INTO "mount" ("supplierId", "partNumber", "mountType", "ratedLoadN", "verticalStiffnessNPerM", "dynamicStiffnessRatio", "lossFactor") VALUES (1, 'VM-1', 'elastomer_mount', 2400, 72500, 1.4, 0.1)`,
      );
      await new MountDynamicRatioOptional1765400000000().up(queryRunner);
      await dataSource.query(
        `INSERT INTO "mount" ("supplierId", "partNumber", "mountType", "ratedLoadN", "verticalStiffnessNPerM", "lossFactor") VALUES (1, 'VM-2', 'elastomer_mount', 2400, 72500, 0.1)`,
      );
      expect(await dataSource.query(`SELECT "partNumber", "dynamicStiffnessRatio" FROM "mount" ORDER BY "id"`)).toEqual([
        { partNumber: 'VM-1', dynamicStiffnessRatio: 1.4 },
        { partNumber: 'VM-2', dynamicStiffnessRatio: null },
      ]);
      const table = await queryRunner.getTable('mount');
      expect(table?.indices.map((index) => index.name).sort()).toEqual([
        'IDX_mount_selection',
        'IDX_mount_series',
        'IDX_mount_supplier_part',
        'IDX_mount_type',
      ]);
      expect(table?.checks.map((check) => check.name)).toEqual(['CHK_mount_damping']);
      await new MountDynamicRatioOptional1765400000000().down(queryRunner);
      expect(await dataSource.query(`SELECT "partNumber", "dynamicStiffnessRatio" FROM "mount" ORDER BY "id"`)).toEqual([
        { partNumber: 'VM-1', dynamicStiffnessRatio: 1.4 },
        { partNumber: 'VM-2', dynamicStiffnessRatio: 1 },
      ]);
    } finally {
      await queryRunner.release();
      await dataSource.destroy();
    }
  });
});
