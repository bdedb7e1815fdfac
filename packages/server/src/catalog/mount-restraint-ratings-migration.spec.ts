import { DataSource } from 'typeorm';
import { capturingPostgresQueryRunner } from '../../test/utils/postgres-sql-capture.js';
import { databaseOptions } from '../config/database.config.js';
import { MountRestraintRatings1765300000000 } from '../database/migrations/1765300000000-mount-restraint-ratings.js';
import { MIGRATIONS } from '../database/migrations/index.js';

describe('MountRestraintRatings migration', () => {
  it('compiles to PostgreSQL as two nullable columns added in place', async () => {
    const { queryRunner, statements } = capturingPostgresQueryRunner();
    await new MountRestraintRatings1765300000000().up(queryRunner);
    await new MountRestraintRatings1765300000000().down(queryRunner);
    expect(statements).toEqual([
      'ALTER TABLE "mount" ADD "restraintCapacityN" double precision',
      'ALTER TABLE "mount" ADD "upliftCapacityN" double precision',
      'ALTER TABLE "mount" DROP COLUMN "restraintCapacityN"',
      'ALTER TABLE "mount" DROP COLUMN "upliftCapacityN"',
    ]);
  });

  it('keeps the existing mounts (with no ratings) on SQLite, where the table is rebuilt, and back again', async () => {
    const before = MIGRATIONS.slice(0, MIGRATIONS.indexOf(MountRestraintRatings1765300000000));
    const dataSource = new DataSource({ ...databaseOptions({ dataDir: '.' }), database: ':memory:', migrations: before } as never);
    await dataSource.initialize();
    const queryRunner = dataSource.createQueryRunner();
    try {
      await dataSource.query(`INSERT INTO "supplier" ("name", "nameKey") VALUES ('Vellmark Springs', 'vellmark springs')`);
      await dataSource.query(
        `INSERT INTO "mount" ("supplierId", "partNumber", "mountType", "ratedLoadN", "verticalStiffnessNPerM", "dampingRatio") VALUES (1, 'VM-1', 'restrained_spring', 2400, 72500, 0.01)`,
      );
      await new MountRestraintRatings1765300000000().up(queryRunner);
      expect(await dataSource.query(`SELECT "partNumber", "ratedLoadN", "restraintCapacityN", "upliftCapacityN" FROM "mount"`)).toEqual([
        { partNumber: 'VM-1', ratedLoadN: 2400, restraintCapacityN: null, upliftCapacityN: null },
      ]);
      const table = await queryRunner.getTable('mount');
      expect(table?.indices.map((index) => index.name).sort()).toEqual([
        'IDX_mount_selection',
        'IDX_mount_series',
        'IDX_mount_supplier_part',
        'IDX_mount_type',
      ]);
      expect(table?.checks.map((check) => check.name)).toEqual(['CHK_mount_damping']);
      await new MountRestraintRatings1765300000000().down(queryRunner);
      expect(await dataSource.query(`SELECT "partNumber", "ratedLoadN" FROM "mount"`)).toEqual([{ partNumber: 'VM-1', ratedLoadN: 2400 }]);
    } finally {
      await queryRunner.release();
      await dataSource.destroy();
    }
  });
});
