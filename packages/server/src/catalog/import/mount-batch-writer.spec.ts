import { DataSource, type EntityManager } from 'typeorm';
import type { MountValues } from './catalog-columns.js';
import { databaseOptions } from '../../config/database.config.js';
import { MountBatchWriter } from './mount-batch-writer.js';

const values: MountValues = {
  supplierName: 'Wrenfield Example Mounts',
  partNumber: 'WX-1',
  series: null,
  mountType: 'open_spring',
  ratedLoadN: 1200,
  verticalStiffnessNPerM: 40_000,
  horizontalStiffnessNPerM: null,
  dynamicStiffnessRatio: 1,
  dampingRatio: 0.01,
  lossFactor: null,
  maxDeflectionMm: null,
  tempMinC: null,
  tempMaxC: null,
  heightMm: null,
  restraintCapacityN: 9000,
  upliftCapacityN: null,
  unitPrice: null,
  currency: 'USD',
  leadTimeDays: null,
};

/** A manager on a driver that is built but never connected; queries are captured. */
function capturingManager(options: ConstructorParameters<typeof DataSource>[0]) {
  const calls: Array<{ sql: string; parameters: unknown[] }> = [];
  const manager = {
    connection: new DataSource(options),
    query: async (sql: string, parameters: unknown[]) => {
      calls.push({ sql, parameters });
      return [];
    },
  } as unknown as EntityManager;
  return { manager, calls };
}

describe('MountBatchWriter', () => {
  const rows = [
    { supplierId: 3, values },
    { supplierId: 4, values: { ...values, partNumber: 'WX-2' } },
  ];

  it('writes one multi-row upsert per batch on PostgreSQL ($n placeholders, EXCLUDED, now())', async () => {
    const { manager, calls } = capturingManager({ type: 'postgres', url: 'postgres://tacet@127.0.0.1:9/tacet' });
    await new MountBatchWriter().upsert(manager, rows);
    expect(calls).toHaveLength(1);
    const { sql, parameters } = calls[0];
    expect(sql).toMatch(
      /^INSERT INTO "mount" \("supplierId", "partNumber", "series", .*"active"\) VALUES \(\$1, \$2, .*\$20\), \(\$21, .*\$40\) /,
    );
    expect(sql).toMatch(
      /ON CONFLICT \("supplierId", "partNumber"\) DO UPDATE SET "series" = excluded."series", .*"active" = excluded."active", "updatedAt" = now\(\)$/,
    );
    expect(sql).not.toMatch(/"supplierId" = excluded|"partNumber" = excluded/);
    expect(parameters).toHaveLength(40);
    expect(parameters.slice(0, 4)).toEqual([3, 'WX-1', null, 'open_spring']);
    expect(parameters[14]).toBe(9000); // restraintCapacityN
    expect(parameters[19]).toBe(true);
  });

  it('uses ? placeholders and datetime(now) on SQLite, and writes nothing for an empty batch', async () => {
    const { manager, calls } = capturingManager({ type: 'better-sqlite3', database: ':memory:' });
    const writer = new MountBatchWriter();
    await writer.upsert(manager, []);
    await writer.upsert(manager, rows.slice(0, 1));
    expect(calls).toHaveLength(1);
    expect(calls[0].sql).toMatch(/VALUES \((\?, ){19}\?\) ON CONFLICT/);
    expect(calls[0].sql).toMatch(/"updatedAt" = datetime\('now'\)$/);
  });

  it("on an open SQLite connection, inserts then updates in place inside the caller's transaction (and restores a retired part)", async () => {
    const dataSource = new DataSource({ ...databaseOptions({ dataDir: '.' }), database: ':memory:' } as never);
    await dataSource.initialize(); // migrations
    try {
      await dataSource.query(`INSERT INTO "supplier" ("name", "nameKey") VALUES ('Wrenfield Example Mounts', 'wrenfield example mounts')`);
      const writer = new MountBatchWriter();
      const batch = [
        { supplierId: 1, values },
        { supplierId: 1, values: { ...values, partNumber: 'WX-2', dampingRatio: null, lossFactor: 0.2 } },
      ];
      await dataSource.transaction((manager) => writer.upsert(manager, batch));
      await dataSource.query(`UPDATE "mount" SET "active" = 0 WHERE "partNumber" = 'WX-2'`);
      // a rolled-back transaction leaves nothing behind
      await expect(
        dataSource.transaction(async (manager) => {
          await writer.upsert(manager, [{ supplierId: 1, values: { ...values, partNumber: 'WX-3' } }]);
          throw new Error('crash');
        }),
      ).rejects.toThrow('crash');
      await dataSource.transaction((manager) =>
        writer.upsert(manager, [{ supplierId: 1, values: { ...batch[1].values, ratedLoadN: 1500 } }]),
      );
      const rows = await dataSource.query(
        `SELECT "partNumber", "ratedLoadN", "lossFactor", "dampingRatio", "active" FROM "mount" ORDER BY "id"`,
      );
      expect(rows).toEqual([
        { partNumber: 'WX-1', ratedLoadN: 1200, lossFactor: null, dampingRatio: 0.01, active: 1 },
        { partNumber: 'WX-2', ratedLoadN: 1500, lossFactor: 0.2, dampingRatio: null, active: 1 },
      ]);
    } finally {
      await dataSource.destroy();
    }
  });
});
