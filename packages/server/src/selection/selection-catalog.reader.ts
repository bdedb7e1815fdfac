import { Injectable } from '@nestjs/common';
import type BetterSqlite3 from 'better-sqlite3';
import { DataSource } from 'typeorm';
import { dampingModelOf } from '../catalog/mount-rules.js';
import { Mount } from '../catalog/mount.entity.js';
import { Supplier } from '../suppliers/supplier.entity.js';
import { CatalogRevisionService } from '../catalog-revision/catalog-revision.service.js';
import { CATALOG_COLUMNS, CATALOG_COLUMN_INDEX, DETAIL_COLUMNS, type CatalogTuple, type MountDetails } from './engine/catalog-tuple.js';
import type { PrefilterBounds } from './selection-problem.js';
import type { MountSnapshot } from './selection.types.js';

/** Prepared statements kept per SQL text (oldest dropped first). */
const STATEMENT_CACHE_SIZE = 32;

const num = (value: unknown): number | null => (value === null || value === undefined ? null : Number(value));

/** The active catalog in memory, by ascending rated load (see SelectionCatalogReader.snapshot). */
interface CatalogSnapshot {
  revision: number;
  /** CATALOG_COLUMNS tuples, as the selection engine reads them. */
  rows: CatalogTuple[];
  rated: Float64Array;
  /** NaN where the supplier states no limit. */
  tempMin: Float64Array;
  tempMax: Float64Array;
  mountType: string[];
  supplierId: Int32Array;
}

/** Index of the first value ≥ x in an ascending array. */
function firstAtLeast(values: Float64Array, x: number): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (values[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Index of the first value > x in an ascending array. */
function firstAbove(values: Float64Array, x: number): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (values[mid] <= x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** `"m"."column"`: identifiers quoted the way SQLite and PostgreSQL both accept. */
const column = (name: string): string => `"m"."${name}"`;

/**
 * The selection's read access to the catalog, active mounts of active suppliers only.
 *
 * The hot path (the prefilter) runs over an in-memory snapshot of the active catalog with the
 * columns the ranking needs (CATALOG_COLUMNS, as arrays: no object per row), ordered by rated
 * load so that the load window is a binary search. The snapshot is labelled with the catalog
 * revision (CatalogRevisionService) and read again when another write — from this process or
 * any other on the same database — moved it. Reads go through a prepared statement: on SQLite
 * a better-sqlite3 statement in raw mode on TypeORM's own connection; on PostgreSQL the same
 * SQL through `DataSource.query`. Details (part number, type, temperature range) and supplier names are read afterwards for the few mounts whose modes are
 * computed or that are shown.
 */
@Injectable()
export class SelectionCatalogReader {
  private readonly statements = new Map<string, BetterSqlite3.Statement>();
  private cached: CatalogSnapshot | undefined;
  private loading: { revision: number; promise: Promise<CatalogSnapshot> } | undefined;

  constructor(
    private readonly dataSource: DataSource,
    private readonly revision: CatalogRevisionService,
  ) {}

  private get sqlite(): BetterSqlite3.Database | null {
    if (this.dataSource.options.type !== 'better-sqlite3') return null;
    return (this.dataSource.driver as unknown as { databaseConnection: BetterSqlite3.Database }).databaseConnection;
  }

  /** Runs a SELECT built by `build` (which receives the placeholder maker) and returns its rows as arrays. */
  private async tuples(build: (param: (value: unknown) => string) => string, extraColumns: string[] = []): Promise<CatalogTuple[]> {
    const params: unknown[] = [];
    const sqlite = this.sqlite;
    const param = (value: unknown): string => {
      params.push(typeof value === 'boolean' && sqlite ? Number(value) : value);
      return sqlite ? '?' : `$${params.length}`;
    };
    const names = [...CATALOG_COLUMNS, ...extraColumns];
    const where = build(param);
    const sql =
      `SELECT ${names.map(column).join(', ')} FROM "mount" "m" INNER JOIN "supplier" "s" ON "s"."id" = "m"."supplierId" ` +
      `WHERE ${where}`;
    if (sqlite) {
      let statement = this.statements.get(sql);
      if (!statement) {
        statement = sqlite.prepare(sql).raw(true);
        // the SQL varies only with the number of types / suppliers filtered on; keep the cache small
        if (this.statements.size >= STATEMENT_CACHE_SIZE) this.statements.delete(this.statements.keys().next().value!);
        this.statements.set(sql, statement);
      }
      return statement.all(...params) as CatalogTuple[];
    }
    const rows = (await this.dataSource.query(sql, params)) as Record<string, unknown>[];
    return rows.map((row) => names.map((name) => row[name]));
  }

  /**
   * The prefilter: rated load within the window that could suit at least one point, the
   * temperature range covering the ambient temperature (a range the supplier does not state
   * passes), and the allowed types and suppliers — over the in-memory snapshot of the catalog.
   */
  async prefiltered(bounds: PrefilterBounds): Promise<CatalogTuple[]> {
    const snapshot = await this.snapshot();
    const { rated, tempMin, tempMax, mountType, supplierId, rows } = snapshot;
    const types = bounds.mountTypes ? new Set<string>(bounds.mountTypes) : null;
    const suppliers = bounds.supplierIds ? new Set<number>(bounds.supplierIds) : null;
    const t = bounds.ambientTempC;
    const out: CatalogTuple[] = [];
    const end = firstAbove(rated, bounds.maxRatedLoadN);
    for (let i = firstAtLeast(rated, bounds.minRatedLoadN); i < end; i++) {
      if (t !== undefined && (tempMin[i] > t || tempMax[i] < t)) continue; // NaN (not stated) compares false: passes
      if (types && !types.has(mountType[i])) continue;
      if (suppliers && !suppliers.has(supplierId[i])) continue;
      out.push(rows[i]);
    }
    return out;
  }

  /**
   * Active mounts of active suppliers with the columns the prefilter and ranking read, by rated
   * load, kept in memory and read again when the catalog revision moved (one small query per
   * selection). Concurrent selections share one read.
   */
  private async snapshot(): Promise<CatalogSnapshot> {
    const revision = await this.revision.current();
    if (this.cached?.revision === revision) return this.cached;
    if (this.loading?.revision !== revision) {
      const loading = this.readSnapshot(revision);
      this.loading = { revision, promise: loading };
      loading.then(
        (snapshot) => {
          if (!this.cached || this.cached.revision < snapshot.revision) this.cached = snapshot;
          if (this.loading?.promise === loading) this.loading = undefined;
        },
        () => {
          if (this.loading?.promise === loading) this.loading = undefined;
        },
      );
    }
    return this.loading!.promise;
  }

  /** Reads the whole active catalog, ordered by rated load (read after `revision`: never older than it). */
  private async readSnapshot(revision: number): Promise<CatalogSnapshot> {
    const filterColumns = ['mountType', 'tempMinC', 'tempMaxC'];
    const tuples = await this.tuples(
      (param) => `${column('active')} = ${param(true)} AND "s"."active" = ${param(true)} ORDER BY ${column('ratedLoadN')}, ${column('id')}`,
      filterColumns,
    );
    const R = tuples.length;
    const snapshot: CatalogSnapshot = {
      revision,
      rows: new Array<CatalogTuple>(R),
      rated: new Float64Array(R),
      tempMin: new Float64Array(R),
      tempMax: new Float64Array(R),
      mountType: new Array<string>(R),
      supplierId: new Int32Array(R),
    };
    const at = CATALOG_COLUMNS.length;
    for (let i = 0; i < R; i++) {
      const tuple = tuples[i];
      snapshot.rows[i] = tuple.slice(0, at);
      snapshot.rated[i] = Number(tuple[CATALOG_COLUMN_INDEX.ratedLoadN]);
      snapshot.supplierId[i] = Number(tuple[CATALOG_COLUMN_INDEX.supplierId]);
      snapshot.mountType[i] = String(tuple[at]);
      snapshot.tempMin[i] = tuple[at + 1] === null ? Number.NaN : Number(tuple[at + 1]);
      snapshot.tempMax[i] = tuple[at + 2] === null ? Number.NaN : Number(tuple[at + 2]);
    }
    return snapshot;
  }

  /** Rows (with their details) of one active mount or one series, without the load / type filters: a choice made outside the list. */
  rowsOf(choice: { mountId: number } | { supplierId: number; series: string }): Promise<CatalogTuple[]> {
    return this.tuples(
      (param) => {
        const where = [`${column('active')} = ${param(true)}`, `"s"."active" = ${param(true)}`];
        if ('mountId' in choice) where.push(`${column('id')} = ${param(choice.mountId)}`);
        else where.push(`${column('supplierId')} = ${param(choice.supplierId)}`, `${column('series')} = ${param(choice.series)}`);
        return where.join(' AND ');
      },
      [...DETAIL_COLUMNS],
    );
  }

  async supplierNames(ids: readonly number[]): Promise<Map<number, string>> {
    if (ids.length === 0) return new Map();
    const rows = await this.dataSource
      .createQueryBuilder(Supplier, 's')
      .select('s.id', 'id')
      .addSelect('s.name', 'name')
      .where('s.id IN (:...ids)', { ids: [...new Set(ids)] })
      .getRawMany<{ id: number; name: string }>();
    return new Map(rows.map((row) => [Number(row.id), row.name]));
  }

  /** The detail fields (DETAIL_COLUMNS) of a few mounts, by id. */
  async details(ids: readonly number[]): Promise<Map<number, MountDetails>> {
    if (ids.length === 0) return new Map();
    const qb = this.dataSource.createQueryBuilder(Mount, 'm').select('m.id', 'id');
    for (const name of DETAIL_COLUMNS) qb.addSelect(`m.${name}`, name);
    const rows = await qb.where('m.id IN (:...ids)', { ids: [...new Set(ids)] }).getRawMany<MountDetails & { id: number }>();
    return new Map(
      rows.map(({ id, ...details }) => [
        Number(id),
        {
          ...details,
          tempMinC: num(details.tempMinC),
          tempMaxC: num(details.tempMaxC),
        },
      ]),
    );
  }

  /** The catalog data of mounts as of now, for a design's snapshot. */
  async snapshots(ids: readonly number[]): Promise<MountSnapshot[]> {
    if (ids.length === 0) return [];
    const mounts = await this.dataSource
      .getRepository(Mount)
      .createQueryBuilder('m')
      .innerJoinAndSelect('m.supplier', 's')
      .where('m.id IN (:...ids)', { ids: [...new Set(ids)] })
      .orderBy('m.id')
      .getMany();
    return mounts.map((m) => ({
      id: m.id,
      supplier: { id: m.supplier.id, name: m.supplier.name },
      partNumber: m.partNumber,
      series: m.series,
      mountType: m.mountType,
      ratedLoadN: Number(m.ratedLoadN),
      verticalStiffnessNPerM: Number(m.verticalStiffnessNPerM),
      horizontalStiffnessNPerM: num(m.horizontalStiffnessNPerM),
      dynamicStiffnessRatio: num(m.dynamicStiffnessRatio),
      dampingModel: dampingModelOf(m),
      dampingRatio: num(m.dampingRatio),
      lossFactor: num(m.lossFactor),
      maxDeflectionMm: num(m.maxDeflectionMm),
      tempMinC: num(m.tempMinC),
      tempMaxC: num(m.tempMaxC),
      heightMm: num(m.heightMm),
      restraintCapacityN: num(m.restraintCapacityN),
      upliftCapacityN: num(m.upliftCapacityN),
      unitPrice: num(m.unitPrice),
      currency: m.currency,
      leadTimeDays: num(m.leadTimeDays),
      updatedAt: new Date(m.updatedAt).toISOString(),
    }));
  }

  /** Whether the catalog holds any active mount (the demo seed skips choosing otherwise). */
  async hasActiveMounts(): Promise<boolean> {
    return (await this.dataSource.getRepository(Mount).countBy({ active: true })) > 0;
  }
}
