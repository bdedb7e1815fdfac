import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { MAX_ROW_BYTES, readCsvRecords } from './csv-record-reader.js';
import { CatalogFileError, NOT_UTF8_TEXT } from './import-problem.js';

describe('readCsvRecords', () => {
  let dir: string;
  let n = 0;
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'tacet-reader-'));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  const fileWith = (content: string | Buffer): string => {
    const path = join(dir, `f${++n}.csv`);
    writeFileSync(path, content);
    return path;
  };
  const read = (content: string | Buffer) => [...readCsvRecords(fileWith(content))];
  const failure = (content: string | Buffer): CatalogFileError => {
    try {
      read(content);
    } catch (error) {
      if (error instanceof CatalogFileError) return error;
      throw error;
    }
    throw new Error('expected a CatalogFileError');
  };

  it('numbers records as spreadsheet rows: header 1, blank lines counted, quoted line breaks not', () => {
    expect(read('a,b\n1,2\n\n"x\ny",4\n5,6')).toEqual([
      { row: 1, fields: ['a', 'b'] },
      { row: 2, fields: ['1', '2'] },
      { row: 3, fields: [''] },
      { row: 4, fields: ['x\ny', '4'] },
      { row: 5, fields: ['5', '6'] },
    ]);
  });

  it('drops a UTF-8 byte-order mark, reads CRLF, quoted commas and doubled quotes (RFC 4180)', () => {
    expect(read('\ufeffname,part\r\n"Oxlow, Ltd.","OC-""1"""\r\n')).toEqual([
      { row: 1, fields: ['name', 'part'] },
      { row: 2, fields: ['Oxlow, Ltd.', 'OC-"1"'] },
    ]);
  });

  it('keeps multi-byte characters split across 64 KiB chunks intact', () => {
    const text = `name\n${'é'.repeat(70_000)}\n`;
    expect(read(text)[1].fields[0]).toBe('é'.repeat(70_000));
  });

  it('yields rows of any width (the validator judges them)', () => {
    expect(read(`a\n${','.repeat(9_999)}`)[1].fields).toHaveLength(10_000);
  });

  it('yields nothing for an empty file', () => {
    expect(read('')).toEqual([]);
  });

  it.each([
    ['invalid UTF-8', Buffer.from([0x61, 0x2c, 0x62, 0x0a, 0xc3, 0x28, 0x0a])],
    ['a NUL byte', Buffer.from('a,b\n1,\u00002\n')],
    ['UTF-16 text', Buffer.from('\ufeffa,b\n', 'utf16le')],
    ['a truncated multi-byte character at the end', Buffer.from([0x61, 0x0a, 0xe2, 0x82])],
    ['binary junk', Buffer.from(Array.from({ length: 4096 }, (_, i) => (i * 131 + 7) % 256))],
  ])('refuses %s as not UTF-8 text', (_case, content) => {
    const error = failure(content);
    expect(error.message).toBe(NOT_UTF8_TEXT);
  });

  it('locates broken CSV at the row being read', () => {
    expect(failure('a,b\n1,2\n"open,3\n')).toMatchObject({
      message: 'The file is not valid CSV (row 3: a quoted field is not closed (a closing " is missing))',
      problems: [{ row: 3, column: '', message: 'a quoted field is not closed (a closing " is missing)' }],
    });
    expect(failure('a,b\n1,"x"y\n').problems).toEqual([
      { row: 2, column: '', message: 'a " inside a field must be doubled ("") and the field quoted' },
    ]);
  });

  it(`stops at a row longer than ${MAX_ROW_BYTES} bytes`, () => {
    expect(failure(`a\n${'x'.repeat(MAX_ROW_BYTES + 10)}\n`).problems).toEqual([
      { row: 2, column: '', message: `the row is longer than ${MAX_ROW_BYTES} bytes` },
    ]);
  });
});
