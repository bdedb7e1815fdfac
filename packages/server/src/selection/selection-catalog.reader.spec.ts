import type { DataSource } from 'typeorm';
import type { CatalogRevisionService } from '../catalog-revision/catalog-revision.service.js';
import { SelectionCatalogReader } from './selection-catalog.reader.js';
import { CATALOG_COLUMNS } from './engine/catalog-tuple.js';

interface FakeMount {
  id: number;
  supplierId: number;
  ratedLoadN: number;
  mountType: string;
  tempMinC: number | null;
  tempMaxC: number | null;
}

/** A reader over a fake PostgreSQL data source (rows as objects, like `pg` returns them) and a settable revision. */
function readerOver(mounts: FakeMount[]) {
  const calls: { sql: string; params: unknown[] }[] = [];
  let revision = 1;
  const dataSource = {
    options: { type: 'postgres' },
    query: async (sql: string, params: unknown[]) => {
      calls.push({ sql, params });
      await Promise.resolve();
      // the database orders by rated load, then id
      return [...mounts]
        .sort((a, b) => a.ratedLoadN - b.ratedLoadN || a.id - b.id)
        .map((m) => ({ ...Object.fromEntries(CATALOG_COLUMNS.map((c) => [c, null])), ...m, ratedLoadN: String(m.ratedLoadN) }));
    },
  } as unknown as DataSource;
  const revisions = { current: async () => revision } as unknown as CatalogRevisionService;
  return {
    reader: new SelectionCatalogReader(dataSource, revisions),
    calls,
    setRevision: (r: number) => (revision = r),
  };
}

const mount = (id: number, ratedLoadN: number, extra: Partial<FakeMount> = {}): FakeMount => ({
  id,
  supplierId: 1,
  ratedLoadN,
  mountType: 'open_spring',
  tempMinC: null,
  tempMaxC: null,
  ...extra,
});
const ids = (rows: readonly (readonly unknown[])[]) => rows.map((row) => row[0]);

describe('SelectionCatalogReader', () => {
  const catalog = [
    mount(1, 1000),
    mount(2, 2000),
    mount(3, 2000, { mountType: 'elastomer_pad', supplierId: 2 }),
    mount(4, 4000, { tempMinC: -10, tempMaxC: 30 }),
    mount(5, 6000, { tempMinC: 40 }),
    mount(6, 6000.5),
  ];

  it('reads the active catalog once, with numbered parameters, ordered by rated load', async () => {
    const { reader, calls } = readerOver(catalog);
    await reader.prefiltered({ minRatedLoadN: 0, maxRatedLoadN: 1e9 });
    expect(calls).toHaveLength(1);
    expect(calls[0].params).toEqual([true, true]);
    expect(calls[0].sql).toBe(
      `SELECT ${[...CATALOG_COLUMNS, 'mountType', 'tempMinC', 'tempMaxC'].map((c) => `"m"."${c}"`).join(', ')} ` +
        'FROM "mount" "m" INNER JOIN "supplier" "s" ON "s"."id" = "m"."supplierId" ' +
        'WHERE "m"."active" = $1 AND "s"."active" = $2 ORDER BY "m"."ratedLoadN", "m"."id"',
    );
  });

  it('keeps the rated-load window inclusive at both ends and returns CATALOG_COLUMNS tuples', async () => {
    const { reader } = readerOver(catalog);
    const rows = await reader.prefiltered({ minRatedLoadN: 2000, maxRatedLoadN: 6000 });
    expect(ids(rows)).toEqual([2, 3, 4, 5]);
    expect(rows[0]).toHaveLength(CATALOG_COLUMNS.length);
    expect(await reader.prefiltered({ minRatedLoadN: 2000.1, maxRatedLoadN: 3999 })).toEqual([]);
  });

  it('filters on ambient temperature (an unstated limit passes), mount types and suppliers', async () => {
    const { reader } = readerOver(catalog);
    expect(ids(await reader.prefiltered({ minRatedLoadN: 0, maxRatedLoadN: 1e9, ambientTempC: 35 }))).toEqual([1, 2, 3, 6]);
    expect(ids(await reader.prefiltered({ minRatedLoadN: 0, maxRatedLoadN: 1e9, ambientTempC: 45 }))).toEqual([1, 2, 3, 5, 6]);
    expect(ids(await reader.prefiltered({ minRatedLoadN: 0, maxRatedLoadN: 1e9, mountTypes: ['elastomer_pad'] }))).toEqual([3]);
    expect(ids(await reader.prefiltered({ minRatedLoadN: 0, maxRatedLoadN: 1e9, supplierIds: [1] }))).toEqual([1, 2, 4, 5, 6]);
  });

  it('reads the catalog again only when the revision moved, and once for concurrent selections', async () => {
    const { reader, calls, setRevision } = readerOver(catalog);
    const bounds = { minRatedLoadN: 0, maxRatedLoadN: 1e9 };
    await Promise.all([reader.prefiltered(bounds), reader.prefiltered(bounds), reader.prefiltered(bounds)]);
    expect(calls).toHaveLength(1);
    await reader.prefiltered(bounds);
    expect(calls).toHaveLength(1);
    catalog.push(mount(7, 3000));
    setRevision(2);
    expect(ids(await reader.prefiltered(bounds))).toContain(7);
    expect(calls).toHaveLength(2);
    catalog.pop();
  });
});
