import { capturingPostgresQueryRunner } from '../../test/utils/postgres-sql-capture.js';
import { CreateCatalog1764720000000 } from '../database/migrations/1764720000000-create-catalog.js';

describe('CreateCatalog migration', () => {
  it('compiles to PostgreSQL through the schema API (types, check, foreign keys, indexes)', async () => {
    const { queryRunner, statements } = capturingPostgresQueryRunner();
    await new CreateCatalog1764720000000().up(queryRunner);

    const sql = statements.join('\n');
    expect(sql).toContain('CREATE TABLE "supplier" ("id" SERIAL NOT NULL');
    expect(sql).toContain('"ratedLoadN" double precision NOT NULL');
    expect(sql).toContain(`"dynamicStiffnessRatio" double precision NOT NULL DEFAULT '1'`);
    expect(sql).toContain(`"currency" varchar(3) NOT NULL DEFAULT 'USD'`);
    expect(sql).toContain(
      'CONSTRAINT "CHK_mount_damping" CHECK (("dampingRatio" IS NULL AND "lossFactor" IS NOT NULL) OR ("dampingRatio" IS NOT NULL AND "lossFactor" IS NULL))',
    );
    expect(sql).toMatch(/CONSTRAINT "FK_mount_supplier" FOREIGN KEY \("supplierId"\) REFERENCES "supplier" \("id"\) ON DELETE RESTRICT/);
    expect(sql).toMatch(/CONSTRAINT "FK_catalog_import_user" FOREIGN KEY \("userId"\) REFERENCES "user" \("id"\) ON DELETE RESTRICT/);
    expect(sql).toMatch(/CREATE UNIQUE INDEX "IDX_mount_supplier_part" ON "mount"\s+\("supplierId", "partNumber"\)/);
    expect(sql).toMatch(/CREATE INDEX "IDX_mount_active_load" ON "mount"\s+\("active", "ratedLoadN"\)/);
    expect(sql).toMatch(
      /CREATE INDEX "IDX_mount_type" ON "mount"\s+\("mountType", "active", "ratedLoadN", "supplierId", "partNumber", "series"\)/,
    );
    expect(sql).toMatch(/CREATE INDEX "IDX_mount_series" ON "mount"\s+\("series"\)/);
    expect(sql).toMatch(/CREATE UNIQUE INDEX "IDX_supplier_name_key" ON "supplier"\s+\("nameKey"\)/);
    expect(sql).not.toMatch(/AUTOINCREMENT|datetime\(|PRAGMA/i);
  });
});
