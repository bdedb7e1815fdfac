import { describe, expect, it } from '@jest/globals';
import { parse } from 'csv-parse/sync';
import ExcelJS from 'exceljs';
import type { BomLine } from '../selection/selection.types.js';
import { cautionLines } from '@tacet/vibration';
import { BOM_CSV_COLUMNS, DRAFT_MARK, bomCsv, bomTotals, bomXlsx, exportFileName, quoteBomCsv } from './bom-export.js';

const line = (fields: Partial<BomLine>): BomLine => ({
  supplier: { id: 1, name: 'Invented Springs' },
  partNumber: 'IS-100',
  mountId: 1,
  quantity: 2,
  mountPoints: ['A', 'B'],
  unitPrice: 10.25,
  extendedPrice: 20.5,
  currency: 'USD',
  leadTimeDays: 14,
  ...fields,
});

describe('BOM exports', () => {
  it('CSV: header, one row per line, numbers as written', () => {
    const rows = parse(
      bomCsv(
        [
          line({}),
          line({ partNumber: 'IS-200', quantity: 1, mountPoints: ['C'], unitPrice: null, extendedPrice: null, leadTimeDays: null }),
        ],
        false,
      ),
      { relax_column_count: true },
    ) as string[][];
    expect(rows[0]).toEqual([...BOM_CSV_COLUMNS]);
    expect(rows[1]).toEqual(['Invented Springs', 'IS-100', '2', 'A B', '10.25', '20.5', 'USD', '14']);
    expect(rows[2]).toEqual(['Invented Springs', 'IS-200', '1', 'C', '', '', 'USD', '']);
    expect(rows.slice(3)).toEqual(cautionLines('design').map((caution) => [caution]));
  });

  it('CSV and XLSX end with the cautions of the design, the seismic one when the design asks for it', async () => {
    const withRestraint = cautionLines('design', { restraint: true });
    const rows = parse(bomCsv([line({})], false, withRestraint), { relax_column_count: true }) as string[][];
    expect(rows.slice(2).map((row) => row[0])).toEqual(withRestraint);
    expect(withRestraint.join(' ')).toMatch(/does not size anchorage/);
    const book = new ExcelJS.Workbook();
    const xlsx = await bomXlsx([line({})], { projectName: 'P', designName: 'D', revision: 1, draft: false, cautions: withRestraint });
    await book.xlsx.load(xlsx as unknown as ArrayBuffer);
    const texts = book.worksheets[0].getColumn(1).values.filter((v): v is string => typeof v === 'string');
    expect(texts).toEqual(expect.arrayContaining(withRestraint));
    const quote = parse(quoteBomCsv([{ supplierName: 'S', partNumber: 'P', quantity: 2, quantityPerMachine: 1, mountPoints: ['A'] }], 2), {
      relax_column_count: true,
    }) as string[][];
    expect(quote.slice(2).map((row) => row[0])).toEqual(cautionLines('supplier'));
  });

  it('CSV: numbers without binary noise (a price converted or summed in floating point)', () => {
    const [, row] = parse(bomCsv([line({ unitPrice: 0.1 + 0.2, extendedPrice: 3 * 1.1 })], false), {
      relax_column_count: true,
    }) as string[][];
    expect(String(0.1 + 0.2)).toBe('0.30000000000000004');
    expect(row.slice(4, 6)).toEqual(['0.3', '3.3']);
  });

  it('CSV: text a spreadsheet would run as a formula is neutralised (OWASP CSV injection)', () => {
    const hostile = bomCsv([line({ supplier: { id: 1, name: '=HYPERLINK("http://x")' }, partNumber: '+1-2', mountPoints: ['@A'] })], false);
    const [, row] = parse(hostile, { relax_column_count: true }) as string[][];
    expect(row[0]).toBe(`'=HYPERLINK("http://x")`);
    expect(row[1]).toBe(`'+1-2`);
    expect(row[3]).toBe(`'@A`);
    for (const cell of row) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
  });

  it('CSV: a draft starts with a DRAFT line before the header', () => {
    const rows = parse(bomCsv([line({})], true), { relax_column_count: true }) as string[][];
    expect(rows[0]).toEqual([DRAFT_MARK]);
    expect(rows[1]).toEqual([...BOM_CSV_COLUMNS]);
  });

  it('totals per currency, unpriced lines counted apart', () => {
    expect(bomTotals([line({}), line({ quantity: 3, extendedPrice: 30.75 }), line({ extendedPrice: null, unitPrice: null })])).toEqual([
      { currency: 'USD', quantity: 7, amount: 51.25, unpricedLines: 1 },
    ]);
    expect(bomTotals([line({}), line({ currency: 'EUR' })]).map((t) => t.currency)).toEqual(['USD', 'EUR']);
  });

  it('file names keep letters, digits, dot, dash and underscore only', () => {
    expect(exportFileName({ projectName: 'North "Loop"/Plant', designName: 'P-2 skid; rm -rf', revision: 3 }, 'bom.csv')).toBe(
      'North-Loop-Plant-P-2-skid-rm-rf-rev3-bom.csv',
    );
    expect(exportFileName({ projectName: '../..', designName: 'Ünïcode', revision: 1 }, 'bom.xlsx')).toMatch(/^[A-Za-z0-9._-]+$/);
  });

  it('XLSX read back with exceljs: title, header with units, lines, totals', async () => {
    const buffer = await bomXlsx([line({}), line({ partNumber: 'IS-200', quantity: 1, unitPrice: 5, extendedPrice: 5 })], {
      projectName: 'Plant',
      designName: 'Skid',
      revision: 2,
      draft: false,
    });
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(buffer as unknown as ArrayBuffer);
    const sheet = workbook.worksheets[0];
    expect(String(sheet.getCell('A1').value)).toBe('Plant — Skid — rev 2');
    expect(sheet.getRow(2).values).toEqual([
      undefined,
      'Supplier',
      'Part number',
      'Quantity (pcs)',
      'Mount points',
      'Unit price',
      'Extended price',
      'Currency',
      'Lead time (days)',
    ]);
    expect(sheet.getCell('B3').value).toBe('IS-100');
    expect(sheet.getCell('F3').value).toBe(20.5);
    expect(sheet.getCell('A5').value).toBe('Total (USD)');
    expect(sheet.getCell('C5').value).toBe(3);
    expect(sheet.getCell('F5').value).toBe(25.5);
  });
});
