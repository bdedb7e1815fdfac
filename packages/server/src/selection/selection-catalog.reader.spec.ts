import type { DataSource } from 'typeorm';
import { SelectionCatalogReader } from './selection-catalog.reader.js';
import { CATALOG_COLUMNS } from './selection-engine.js';

/** The PostgreSQL path of the prefilter: the same SQL with $n placeholders, rows turned into arrays. */
describe('SelectionCatalogReader on PostgreSQL', () => {
  it('sends the prefilter with numbered parameters and returns the columns in CATALOG_COLUMNS order', async () => {
    const calls: { sql: string; params: unknown[] }[] = [];
    const row = Object.fromEntries(CATALOG_COLUMNS.map((name, i) => [name, i]));
    const dataSource = {
      options: { type: 'postgres' },
      query: async (sql: string, params: unknown[]) => {
        calls.push({ sql, params });
        return [row];
      },
    } as unknown as DataSource;
    const reader = new SelectionCatalogReader(dataSource);
    const rows = await reader.prefiltered({
      minRatedLoadN: 2000,
      maxRatedLoadN: 6000,
      ambientTempC: 35,
      mountTypes: ['open_spring', 'housed_spring'],
      supplierIds: [4],
    });
    expect(rows).toEqual([CATALOG_COLUMNS.map((_, i) => i)]);
    expect(calls[0].params).toEqual([true, true, 2000, 6000, 35, 35, 'open_spring', 'housed_spring', 4]);
    expect(calls[0].sql).toBe(
      `SELECT ${CATALOG_COLUMNS.map((c) => `"m"."${c}"`).join(', ')} FROM "mount" "m" INNER JOIN "supplier" "s" ON "s"."id" = "m"."supplierId" ` +
        'WHERE "m"."active" = $1 AND "s"."active" = $2 AND "m"."ratedLoadN" >= $3 AND "m"."ratedLoadN" <= $4 ' +
        'AND ("m"."tempMinC" IS NULL OR "m"."tempMinC" <= $5) AND ("m"."tempMaxC" IS NULL OR "m"."tempMaxC" >= $6) ' +
        'AND "m"."mountType" IN ($7, $8) AND "m"."supplierId" IN ($9)',
    );
  });
});
