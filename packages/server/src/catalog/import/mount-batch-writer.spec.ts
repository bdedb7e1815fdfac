import { DataSource, type EntityManager } from 'typeorm';
import type { MountValues } from './catalog-columns.js';
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
    expect(sql).toMatch(/^INSERT INTO "mount" \("supplierId", "partNumber", "series", .*"active"\) VALUES \(\$1, \$2, .*\$18\), \(\$19, .*\$36\) /);
    expect(sql).toMatch(/ON CONFLICT \("supplierId", "partNumber"\) DO UPDATE SET "series" = excluded."series", .*"active" = excluded."active", "updatedAt" = now\(\)$/);
    expect(sql).not.toMatch(/"supplierId" = excluded|"partNumber" = excluded/);
    expect(parameters).toHaveLength(36);
    expect(parameters.slice(0, 4)).toEqual([3, 'WX-1', null, 'open_spring']);
    expect(parameters[17]).toBe(true);
  });

  it('uses ? placeholders and datetime(now) on SQLite, and writes nothing for an empty batch', async () => {
    const { manager, calls } = capturingManager({ type: 'better-sqlite3', database: ':memory:' });
    const writer = new MountBatchWriter();
    await writer.upsert(manager, []);
    await writer.upsert(manager, rows.slice(0, 1));
    expect(calls).toHaveLength(1);
    expect(calls[0].sql).toMatch(/VALUES \((\?, ){17}\?\) ON CONFLICT/);
    expect(calls[0].sql).toMatch(/"updatedAt" = datetime\('now'\)$/);
  });
});
