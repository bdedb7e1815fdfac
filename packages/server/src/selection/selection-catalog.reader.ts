import { Injectable } from '@nestjs/common';
import type BetterSqlite3 from 'better-sqlite3';
import { DataSource } from 'typeorm';
import { dampingModelOf } from '../catalog/mount-rules.js';
import { Mount } from '../catalog/mount.entity.js';
import { Supplier } from '../suppliers/supplier.entity.js';
import { CATALOG_COLUMNS, DETAIL_COLUMNS, type CatalogTuple, type MountDetails } from './selection-engine.js';
import type { PrefilterBounds } from './selection-problem.js';
import type { MountSnapshot } from './selection.types.js';

/** Prepared statements kept per SQL text (oldest dropped first). */
const STATEMENT_CACHE_SIZE = 32;

const num = (value: unknown): number | null => (value === null || value === undefined ? null : Number(value));

/** `"m"."column"`: identifiers quoted the way SQLite and PostgreSQL both accept. */
const column = (name: string): string => `"m"."${name}"`;

/**
 * The selection's read access to the catalog, active mounts of active suppliers only.
 *
 * The hot query (the SQL prefilter) reads only the columns the ranking needs
 * (CATALOG_COLUMNS), as arrays, through a prepared statement: on SQLite a better-sqlite3
 * statement in raw mode on TypeORM's own connection (no entity, no object per row); on
 * PostgreSQL the same SQL through `DataSource.query`. Details (part number, type, horizontal
 * stiffness, temperature range) and supplier names are read afterwards for the few mounts
 * whose modes are computed or that are shown.
 */
@Injectable()
export class SelectionCatalogReader {
  private readonly statements = new Map<string, BetterSqlite3.Statement>();

  constructor(private readonly dataSource: DataSource) {}

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
   * The SQL prefilter: rated load within the window that could suit at least one point, the
   * temperature range covering the ambient temperature (a range the supplier does not state
   * passes), and the allowed types and suppliers.
   */
  prefiltered(bounds: PrefilterBounds): Promise<CatalogTuple[]> {
    return this.tuples((param) => {
      const where = [
        `${column('active')} = ${param(true)}`,
        `"s"."active" = ${param(true)}`,
        `${column('ratedLoadN')} >= ${param(bounds.minRatedLoadN)}`,
        `${column('ratedLoadN')} <= ${param(bounds.maxRatedLoadN)}`,
      ];
      if (bounds.ambientTempC !== undefined) {
        const t = bounds.ambientTempC;
        where.push(`(${column('tempMinC')} IS NULL OR ${column('tempMinC')} <= ${param(t)})`);
        where.push(`(${column('tempMaxC')} IS NULL OR ${column('tempMaxC')} >= ${param(t)})`);
      }
      if (bounds.mountTypes) where.push(`${column('mountType')} IN (${bounds.mountTypes.map(param).join(', ')})`);
      if (bounds.supplierIds) where.push(`${column('supplierId')} IN (${bounds.supplierIds.map(param).join(', ')})`);
      return where.join(' AND ');
    });
  }

  /** Rows (with their details) of one active mount or one series, without the load / type filters: a choice made outside the list. */
  rowsOf(choice: { mountId: number } | { supplierId: number; series: string }): Promise<CatalogTuple[]> {
    return this.tuples((param) => {
      const where = [`${column('active')} = ${param(true)}`, `"s"."active" = ${param(true)}`];
      if ('mountId' in choice) where.push(`${column('id')} = ${param(choice.mountId)}`);
      else where.push(`${column('supplierId')} = ${param(choice.supplierId)}`, `${column('series')} = ${param(choice.series)}`);
      return where.join(' AND ');
    }, [...DETAIL_COLUMNS]);
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
          horizontalStiffnessNPerM: num(details.horizontalStiffnessNPerM),
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
      dynamicStiffnessRatio: Number(m.dynamicStiffnessRatio),
      dampingModel: dampingModelOf(m),
      dampingRatio: num(m.dampingRatio),
      lossFactor: num(m.lossFactor),
      maxDeflectionMm: num(m.maxDeflectionMm),
      tempMinC: num(m.tempMinC),
      tempMaxC: num(m.tempMaxC),
      heightMm: num(m.heightMm),
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
