import { Readable } from 'node:stream';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { stringify } from 'csv-stringify/sync';
import type { Repository } from 'typeorm';
import { exportColumns, type ExportUnits, type MountField } from './import/catalog-columns.js';
import { guardFormula } from './import/csv-cell.js';
import { Mount } from './mount.entity.js';

/** Mounts read per query while streaming the export. */
const PAGE_ROWS = 1000;

/** The cells of a mount in the export's columns, as the import format writes them. */
function cellsOf(mount: Mount, columns: ReturnType<typeof exportColumns>): string[] {
  return columns.map(({ spec: column, variant }) => {
    const value = column.field === 'supplierName' ? mount.supplier.name : mount[column.field as Exclude<MountField, 'supplierName'>];
    if (value === null || value === undefined) return '';
    if (column.rule.kind === 'text') return guardFormula(String(value));
    if (column.rule.kind !== 'number') return String(value);
    return variant.write(value as number);
  });
}

/**
 * The active catalog (active mounts of active suppliers) as CSV in the import format: the SI
 * columns, the US customary ones or both (`units`), both damping columns with one filled per row,
 * text guarded against spreadsheet formulas, numbers without binary noise (at most 15 significant
 * digits) that import back to the same stored values. UTF-8 with a
 * byte-order mark (so spreadsheets read the text right; the import accepts it).
 */
@Injectable()
export class CatalogExportService {
  constructor(@InjectRepository(Mount) private readonly mounts: Repository<Mount>) {}

  fileName(today = new Date()): string {
    return `tacet-catalog-${today.toISOString().slice(0, 10)}.csv`;
  }

  /** Streams the CSV page by page (keyset on supplier name and part number). */
  stream(units: ExportUnits = 'SI'): Readable {
    return Readable.from(this.chunks(exportColumns(units)));
  }

  private async *chunks(columns: ReturnType<typeof exportColumns>): AsyncGenerator<string> {
    yield stringify([columns.map(({ variant }) => variant.name)], { bom: true });
    let after: { nameKey: string; partNumber: string } | null = null;
    for (;;) {
      const builder = this.mounts
        .createQueryBuilder('m')
        .innerJoinAndSelect('m.supplier', 's')
        .where('m.active = :active', { active: true })
        .andWhere('s.active = :active');
      if (after) {
        builder.andWhere('(s.nameKey > :nameKey OR (s.nameKey = :nameKey AND m.partNumber > :partNumber))', after);
      }
      const page = await builder.orderBy('s.nameKey', 'ASC').addOrderBy('m.partNumber', 'ASC').limit(PAGE_ROWS).getMany();
      if (page.length === 0) return;
      yield stringify(page.map((mount) => cellsOf(mount, columns)));
      const last = page[page.length - 1];
      after = { nameKey: last.supplier.nameKey, partNumber: last.partNumber };
      if (page.length < PAGE_ROWS) return;
    }
  }
}
