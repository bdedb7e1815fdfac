import { DataSource } from 'typeorm';
import { capturingPostgresQueryRunner } from '../../../test/utils/postgres-sql-capture.js';
import { databaseOptions } from '../../config/database.config.js';
import { MIGRATIONS } from './index.js';

describe('migrations', () => {
  it('bring a new SQLite database exactly to the schema the entities describe', async () => {
    const dataSource = new DataSource({ ...databaseOptions({ dataDir: '.' }), database: ':memory:' } as never);
    await dataSource.initialize(); // runs every migration (migrationsRun)
    try {
      const pending = await dataSource.driver.createSchemaBuilder().log();
      expect(pending.upQueries.map((query) => query.query)).toEqual([]);
    } finally {
      await dataSource.destroy();
    }
  });

  it('compile to PostgreSQL through the schema API (no SQLite-only SQL)', async () => {
    const { queryRunner, statements } = capturingPostgresQueryRunner();
    for (const Migration of MIGRATIONS) await new Migration().up(queryRunner);

    const sql = statements.join('\n');
    expect(sql).toContain('CREATE TABLE "user" ("id" SERIAL NOT NULL');
    expect(sql).toContain('"active" boolean NOT NULL DEFAULT true');
    expect(sql).toContain('"createdAt" timestamp NOT NULL DEFAULT now()');
    expect(sql).toContain('CREATE UNIQUE INDEX "IDX_user_email" ON "user"');
    expect(sql).not.toMatch(/AUTOINCREMENT|datetime\(|PRAGMA/i);
  });

  it('are listed oldest first with unique names', () => {
    const timestamps = MIGRATIONS.map((Migration) => Number(/(\d{13})$/.exec(Migration.name)?.[1]));
    expect(timestamps.every(Number.isFinite)).toBe(true);
    expect([...timestamps].sort((a, b) => a - b)).toEqual(timestamps);
    expect(new Set(timestamps).size).toBe(timestamps.length);
  });
});
