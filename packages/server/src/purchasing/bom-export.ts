import { stringify } from 'csv-stringify/sync';
import { exportNumber } from '@tacet/vibration';
import ExcelJS from 'exceljs';
import { cautionLines } from '@tacet/vibration';
import type { BomLine } from '../selection/selection.types.js';

/** Column names of the BOM CSV (our own; documented in the contract and DEVELOPERS.md). */
export const BOM_CSV_COLUMNS = [
  'supplier',
  'part_number',
  'quantity',
  'mount_points',
  'unit_price',
  'extended_price',
  'currency',
  'lead_time_days',
] as const;

/** What a BOM export names and shows besides its lines. */
export interface BomHeading {
  projectName: string;
  designName: string;
  revision: number;
  /** Not released: the export is marked DRAFT. */
  draft: boolean;
  /** The caution lines the file ends with (the glossary's; a design's by default). */
  cautions?: readonly string[];
}

export const DRAFT_MARK = 'DRAFT - not released; do not order from this bill of materials';

/** A file name made only of letters, digits, dot, dash and underscore: `<project>-<design>-rev<n>-<suffix>`. */
export function exportFileName(heading: Pick<BomHeading, 'projectName' | 'designName' | 'revision'>, suffix: string): string {
  const safe = (text: string) =>
    text
      .normalize('NFKD')
      .replace(/[^A-Za-z0-9._-]+/g, '-')
      .replace(/-{2,}/g, '-')
      .replace(/^[-.]+|[-.]+$/g, '')
      .slice(0, 60) || 'design';
  return `${safe(heading.projectName)}-${safe(heading.designName)}-rev${heading.revision}-${suffix}`;
}

/** Totals of a BOM per currency (lines without a price are left out of the amount and counted). */
export interface BomTotal {
  currency: string;
  quantity: number;
  amount: number;
  unpricedLines: number;
}

export function bomTotals(lines: readonly BomLine[]): BomTotal[] {
  const totals = new Map<string, BomTotal>();
  for (const line of lines) {
    const total = totals.get(line.currency) ?? { currency: line.currency, quantity: 0, amount: 0, unpricedLines: 0 };
    total.quantity += line.quantity;
    if (line.extendedPrice === null) total.unpricedLines += 1;
    else total.amount = Math.round((total.amount + line.extendedPrice) * 100) / 100;
    totals.set(line.currency, total);
  }
  return [...totals.values()];
}

/**
 * The BOM as CSV: a header of BOM_CSV_COLUMNS, one row per line. Text that a spreadsheet would
 * read as a formula (= + - @, tab, CR) is prefixed with a quote (csv-stringify `escape_formulas`).
 * A draft gets one marking line before the header; the cautions (one cell each) follow the lines.
 * Numbers are written without binary noise (exportNumber).
 */
export function bomCsv(lines: readonly BomLine[], draft: boolean, cautions: readonly string[] = cautionLines('design')): string {
  const rows = lines.map((line) => [
    line.supplier.name,
    line.partNumber,
    line.quantity,
    line.mountPoints.join(' '),
    line.unitPrice === null ? '' : exportNumber(line.unitPrice),
    line.extendedPrice === null ? '' : exportNumber(line.extendedPrice),
    line.currency,
    line.leadTimeDays ?? '',
  ]);
  const body = stringify(rows, { header: true, columns: [...BOM_CSV_COLUMNS], escape_formulas: true });
  return `${draft ? stringify([[DRAFT_MARK]]) : ''}${body}${cautionRows(cautions)}`;
}

/** The cautions as one-cell CSV rows. */
function cautionRows(cautions: readonly string[]): string {
  return cautions.length
    ? stringify(
        cautions.map((caution) => [caution]),
        { escape_formulas: true },
      )
    : '';
}

/** The cautions under a sheet's table, after an empty row. */
function addCautionRows(sheet: ExcelJS.Worksheet, cautions: readonly string[]): void {
  if (cautions.length === 0) return;
  sheet.addRow([]);
  for (const caution of cautions) sheet.addRow([caution]).font = { italic: true };
}

/** Headers of the XLSX sheet, with units. */
export const BOM_XLSX_HEADERS = [
  'Supplier',
  'Part number',
  'Quantity (pcs)',
  'Mount points',
  'Unit price',
  'Extended price',
  'Currency',
  'Lead time (days)',
] as const;

/** The BOM as an XLSX workbook: a title row, a header row with units, the lines, a totals row per currency. */
export async function bomXlsx(lines: readonly BomLine[], heading: BomHeading): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Tacet';
  const sheet = workbook.addWorksheet('Bill of materials');
  const title = `${heading.projectName} — ${heading.designName} — rev ${heading.revision}${heading.draft ? ` — ${DRAFT_MARK}` : ''}`;
  sheet.addRow([title]).font = { bold: true, size: 13, color: heading.draft ? { argb: 'FFC00000' } : undefined };
  const header = sheet.addRow([...BOM_XLSX_HEADERS]);
  header.font = { bold: true };
  for (const line of lines) {
    sheet.addRow([
      line.supplier.name,
      line.partNumber,
      line.quantity,
      line.mountPoints.join(' '),
      line.unitPrice,
      line.extendedPrice,
      line.currency,
      line.leadTimeDays,
    ]);
  }
  for (const total of bomTotals(lines)) {
    const row = sheet.addRow([`Total (${total.currency})`, null, total.quantity, null, null, total.amount, total.currency, null]);
    row.font = { bold: true };
  }
  addCautionRows(sheet, heading.cautions ?? cautionLines('design'));
  sheet.getColumn(5).numFmt = '#,##0.00';
  sheet.getColumn(6).numFmt = '#,##0.00';
  [28, 18, 14, 18, 12, 14, 10, 16].forEach((width, index) => (sheet.getColumn(index + 1).width = width));
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

/** One line of a request for quotation as the supplier sees it: no price of ours. */
export interface QuoteLine {
  supplierName: string;
  partNumber: string;
  quantityPerMachine: number;
  /** Per machine × the machines of the request. */
  quantity: number;
  mountPoints: readonly string[];
}

/** Columns of the BOM for quoting sent to a supplier (our own): part, quantity, placement — never a price. */
export const QUOTE_CSV_COLUMNS = ['supplier', 'part_number', 'quantity', 'quantity_per_machine', 'machines', 'mount_points'] as const;

/** The list for quoting as CSV; it ends with the cautions a supplier gets. */
export function quoteBomCsv(lines: readonly QuoteLine[], machineCount: number): string {
  const rows = lines.map((line) => [
    line.supplierName,
    line.partNumber,
    line.quantity,
    line.quantityPerMachine,
    machineCount,
    line.mountPoints.join(' '),
  ]);
  return `${stringify(rows, { header: true, columns: [...QUOTE_CSV_COLUMNS], escape_formulas: true })}${cautionRows(cautionLines('supplier'))}`;
}

export async function quoteBomXlsx(lines: readonly QuoteLine[], heading: BomHeading, machineCount: number): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Tacet';
  const sheet = workbook.addWorksheet('Request for quotation');
  const machines = machineCount === 1 ? 'one machine' : `${machineCount} identical machines`;
  sheet.addRow([`${heading.projectName} — ${heading.designName} — rev ${heading.revision} — for ${machines}`]).font = {
    bold: true,
    size: 13,
  };
  sheet.addRow(['Supplier', 'Part number', 'Quantity (pcs)', 'Per machine (pcs)', 'Machines', 'Mount points (each machine)']).font = {
    bold: true,
  };
  for (const line of lines) {
    sheet.addRow([line.supplierName, line.partNumber, line.quantity, line.quantityPerMachine, machineCount, line.mountPoints.join(' ')]);
  }
  addCautionRows(sheet, cautionLines('supplier'));
  [28, 18, 14, 16, 10, 28].forEach((width, index) => (sheet.getColumn(index + 1).width = width));
  return Buffer.from(await workbook.xlsx.writeBuffer());
}
