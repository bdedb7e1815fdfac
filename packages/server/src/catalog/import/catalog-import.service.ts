import { setImmediate as nextTurn } from 'node:timers/promises';
import { Injectable, Logger } from '@nestjs/common';
import { closest, distance } from 'fastest-levenshtein';
import { DataSource, type EntityManager } from 'typeorm';
import { CatalogRevisionService } from '../../catalog-revision/catalog-revision.service.js';
import { Supplier } from '../../suppliers/supplier.entity.js';
import { cleanSupplierName, supplierNameKey } from '../../suppliers/supplier-name.js';
import { CatalogImport, type ImportMode } from '../catalog-import.entity.js';
import { Mount } from '../mount.entity.js';
import { dampingModelOf } from '../mount-rules.js';
import type { MountValues } from './catalog-columns.js';
import { CatalogImportRejected } from './catalog-import-rejected.exception.js';
import { readCsvRecords } from './csv-record-reader.js';
import { ErrorReport } from './error-report.js';
import { mapHeader, type CellProblem, type HeaderMap } from './header-mapper.js';
import { CatalogFileError, type RowProblem } from './import-problem.js';
import {
  MAX_NEW_SUPPLIERS,
  MAX_REPORTED_ERRORS,
  PREVIEW_ROWS,
  emptyResult,
  type ImportPreviewRow,
  type ImportResult,
  type NewSupplier,
} from './import-result.js';
import { MountBatchWriter, type MountWrite } from './mount-batch-writer.js';
import { isEmptyRow, rowKeyParts, validateRow } from './row-validator.js';

export interface ImportRequest {
  /** The uploaded file on disk (the caller deletes it). */
  filePath: string;
  /** The name the client gave the file (recorded in the history). */
  fileName: string;
  userId: number;
  /** Validate and preview only; nothing is written or recorded. */
  dryRun: boolean;
  /** all_or_nothing: any invalid row refuses the file; skip_invalid: the valid rows are written. */
  mode: ImportMode;
}

/** A supplier named by the file: its id (null: does not exist, dry run) and its part numbers in the catalog. */
interface KnownSupplier {
  id: number | null;
  parts: ReadonlySet<string>;
  /** Not in the catalog before this file (listed in `newSuppliers`). */
  created: NewSupplier | null;
}

/**
 * An existing supplier name close enough to a new one to be a typo: at most 2 edits, or 1 in
 * 5 characters (Levenshtein distance on the name keys).
 */
export function similarSupplier(nameKey: string, existing: ReadonlyMap<string, string>): string | null {
  if (existing.size === 0) return null;
  const nearest = closest(nameKey, [...existing.keys()]);
  const edits = distance(nameKey, nearest);
  return edits <= Math.max(2, Math.floor(nameKey.length / 5)) ? (existing.get(nearest) ?? null) : null;
}

/** Rows validated between two turns of the event loop in a dry run. */
const ROWS_PER_TURN = 2000;

/** Raw supplier cells whose name key is remembered (a file names few suppliers, many times). */
const NAME_KEY_CACHE = 10_000;

/**
 * The catalog import engine (catalog/FORMAT.md). One streamed pass over the uploaded file
 * validates every row, collecting each problem as (row, column, message), and — unless it is a
 * dry run — upserts the valid rows by (supplier, part number) in batches, creating suppliers on
 * first sight, and records the import. Memory holds the (supplier, part number) keys for
 * duplicate detection, the part numbers of the suppliers named, the capped errors and the
 * preview, never the rows.
 *
 * A real import runs inside one transaction: a file refused in all-or-nothing mode (any invalid
 * row) and any failure part-way roll everything back, so the catalog is exactly as before.
 * (One pass rather than "validate, then read again to write": the file is then parsed once,
 * which keeps a 100,000-row import within the product's targets.)
 *
 * The pass is synchronous between its database statements, which on SQLite only await
 * microtasks: TypeORM shares one connection there, and no other request may run its queries
 * inside this transaction. A dry run yields to the event loop regularly instead.
 */
@Injectable()
export class CatalogImportService {
  private readonly logger = new Logger(CatalogImportService.name);

  constructor(
    private readonly dataSource: DataSource,
    private readonly writer: MountBatchWriter,
    private readonly revision: CatalogRevisionService,
  ) {}

  /**
   * Imports one file. Returns what was done; throws CatalogImportRejected (422) when nothing
   * may be written: a file that is not a catalog CSV, or invalid rows in all-or-nothing mode
   * (a dry run answers the same way, reporting what the import would do).
   */
  async importFile(request: ImportRequest): Promise<ImportResult> {
    try {
      if (request.dryRun) {
        const preview = new ImportPass(this.writer, request, this.dataSource.manager, false);
        return this.refuseIfInvalid(request, await preview.run());
      }
      const result = await this.dataSource.transaction(async (manager) => {
        const pass = new ImportPass(this.writer, request, manager, true);
        const outcome = this.refuseIfInvalid(request, await pass.run()); // throwing rolls back
        await this.revision.bump(manager);
        const saved = await manager.save(
          manager.create(CatalogImport, {
            userId: request.userId,
            fileName: request.fileName.slice(0, 255),
            mode: request.mode,
            accepted: outcome.accepted,
            rejected: outcome.rejected,
            created: outcome.created,
            updated: outcome.updated,
            errorReport: pass.errorReport(),
          }),
        );
        return { ...outcome, importId: saved.id };
      });
      this.logger.log(
        `Import #${result.importId} of ${request.fileName}: ${result.created} created, ${result.updated} updated, ${result.rejected} rejected`,
      );
      await this.refreshStatistics();
      return result;
    } catch (error) {
      if (error instanceof CatalogFileError) throw new CatalogImportRejected(error.message, emptyResult(error.problems));
      throw error;
    }
  }

  /**
   * Lets the query planner see the catalog as it now is (SQLite keeps no statistics until
   * asked; without them it takes a wide rated-load range for a selective one). Same statement
   * on PostgreSQL, where autovacuum would get there later.
   */
  private async refreshStatistics(): Promise<void> {
    try {
      await this.dataSource.query(`ANALYZE ${this.dataSource.driver.escape('mount')}`);
    } catch (error) {
      this.logger.warn(`Could not refresh the catalog statistics: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  private refuseIfInvalid(request: ImportRequest, result: ImportResult): ImportResult {
    if (request.mode === 'all_or_nothing' && result.rejected > 0) {
      const rows = result.rejected === 1 ? '1 row has' : `${result.rejected} rows have`;
      throw new CatalogImportRejected(`${rows} problems; nothing was imported`, result);
    }
    return result;
  }
}

/** One pass over one file (see CatalogImportService). */
class ImportPass {
  private header: HeaderMap | null = null;
  /** Where each (supplier, part number) first appears. */
  private readonly firstRowOf = new Map<string, number>();
  private readonly suppliers = new Map<string, KnownSupplier>();
  private readonly nameKeys = new Map<string, string>();
  private readonly batch: MountWrite[] = [];
  /** Names of the catalog's suppliers by name key, read once the file names a new supplier. */
  private existingNames: Map<string, string> | null = null;
  private report: ErrorReport | null = null;
  private readonly result: ImportResult = emptyResult();

  constructor(
    private readonly writer: MountBatchWriter,
    private readonly request: ImportRequest,
    private readonly manager: EntityManager,
    private readonly write: boolean,
  ) {}

  async run(): Promise<ImportResult> {
    let sawContent = false;
    let dataRows = 0;
    for (const record of readCsvRecords(this.request.filePath)) {
      if (record.row === 1) {
        if (isEmptyRow(record.fields)) continue;
        this.header = this.headerOf(record.fields);
        sawContent = true;
        continue;
      }
      if (isEmptyRow(record.fields)) continue;
      if (!this.header) {
        throw new CatalogFileError('Row 1 must be the header', [{ row: 1, column: '', message: 'row 1 must be the header; it is empty' }]);
      }
      dataRows++;
      await this.handle(record.row, record.fields, this.header);
      if (!this.write && dataRows % ROWS_PER_TURN === 0) await nextTurn();
    }
    if (!sawContent || !this.header) throw new CatalogFileError('The file is empty');
    if (dataRows === 0) throw new CatalogFileError('The file has a header but no mount rows');
    await this.flush();
    return this.result;
  }

  /** The error report of a "valid rows only" import with rejected rows. */
  errorReport(): string | null {
    return this.report && !this.report.isEmpty ? this.report.toString() : null;
  }

  private headerOf(fields: string[]): HeaderMap {
    const { header, problems } = mapHeader(fields);
    if (!header) {
      throw new CatalogFileError(
        'The header (row 1) does not match the catalog format',
        problems.map((problem) => ({ row: 1, ...problem })),
      );
    }
    if (this.write && this.request.mode === 'skip_invalid') {
      this.report = new ErrorReport(header.names);
    }
    return header;
  }

  private async handle(row: number, fields: string[], header: HeaderMap): Promise<void> {
    const { values, problems } = validateRow(fields, header);
    const parts = rowKeyParts(fields, header);
    const key = parts ? `${this.nameKey(parts.supplierName)}\u0000${parts.partNumber}` : null;
    if (key !== null) {
      const first = this.firstRowOf.get(key);
      if (first === undefined) this.firstRowOf.set(key, row);
      else {
        const column = header.nameOf.partNumber ?? 'part_number';
        problems.push({ column, message: `repeats row ${first} (same supplier and part number)` });
      }
    }
    if (problems.length > 0 || !values) {
      this.reject(row, fields, problems);
      return;
    }

    const result = this.result;
    result.accepted++;
    const supplier = await this.supplier(values.supplierName, row);
    if (supplier.created) supplier.created.rows++;
    const action = supplier.parts.has(values.partNumber) ? 'update' : 'create';
    if (action === 'update') result.updated++;
    else result.created++;
    if (result.preview.length < PREVIEW_ROWS) result.preview.push(previewRow(row, values, action));
    // In all-or-nothing mode, writing stops at the first invalid row (the transaction is rolled back).
    if (this.write && (this.request.mode === 'skip_invalid' || result.rejected === 0)) {
      this.batch.push({ supplierId: supplier.id as number, values });
      if (this.batch.length >= this.writer.batchRows) await this.flush();
    }
  }

  private reject(row: number, fields: string[], problems: CellProblem[]): void {
    const result = this.result;
    result.rejected++;
    for (const problem of problems) {
      if (result.errors.length < MAX_REPORTED_ERRORS) result.errors.push({ row, ...problem } satisfies RowProblem);
      else result.errorsTruncated = true;
    }
    this.report?.add(row, fields, problems);
    if (this.request.mode === 'all_or_nothing') this.batch.length = 0;
  }

  private async flush(): Promise<void> {
    if (this.batch.length === 0) return;
    await this.writer.upsert(this.manager, this.batch.splice(0));
  }

  private nameKey(name: string): string {
    let key = this.nameKeys.get(name);
    if (key === undefined) {
      if (this.nameKeys.size >= NAME_KEY_CACHE) this.nameKeys.clear();
      key = supplierNameKey(name);
      this.nameKeys.set(name, key);
    }
    return key;
  }

  /** The supplier a valid row names, created on first sight unless this is a dry run. */
  private async supplier(name: string, row: number): Promise<KnownSupplier> {
    const nameKey = this.nameKey(name);
    const known = this.suppliers.get(nameKey);
    if (known) return known;
    const manager = this.manager;
    let id = (await manager.findOne(Supplier, { select: { id: true }, where: { nameKey } }))?.id ?? null;
    let parts = new Set<string>();
    let created: NewSupplier | null = null;
    if (id === null) {
      if (!this.existingNames) {
        const all = await manager.find(Supplier, { select: { name: true, nameKey: true } });
        this.existingNames = new Map(all.map((supplier) => [supplier.nameKey, supplier.name]));
      }
      created = { name: cleanSupplierName(name), firstRow: row, rows: 0, similarTo: similarSupplier(nameKey, this.existingNames) };
      if (this.result.newSuppliers.length < MAX_NEW_SUPPLIERS) this.result.newSuppliers.push(created);
    }
    if (id !== null) {
      const rows: Array<{ partNumber: string }> = await manager
        .createQueryBuilder(Mount, 'm')
        .select('m.partNumber', 'partNumber')
        .where('m.supplierId = :id', { id })
        .getRawMany();
      parts = new Set(rows.map((r) => r.partNumber));
    } else if (this.write) {
      const inserted = await manager.insert(Supplier, { name: cleanSupplierName(name), nameKey, active: true });
      id = Number(inserted.identifiers[0].id);
    }
    const supplier = { id, parts, created };
    this.suppliers.set(nameKey, supplier);
    return supplier;
  }
}

function previewRow(row: number, values: MountValues, action: 'create' | 'update'): ImportPreviewRow {
  const { supplierName, ...rest } = values;
  return { row, supplierName: cleanSupplierName(supplierName), ...rest, dampingModel: dampingModelOf(values), action };
}
