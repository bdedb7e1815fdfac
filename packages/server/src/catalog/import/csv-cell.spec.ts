import { parse } from 'csv-parse/sync';
import { guardCell, guardFormula } from './csv-cell.js';
import { ErrorReport } from './error-report.js';

describe('guardFormula and guardCell (OWASP CSV injection: prefix a quote)', () => {
  it.each(["=cmd|' /C calc'!A0", '+SUM(A1:A2)', '-2+3', '@SUM(1)', '\tx', '\rx'])('guards %j', (text) => {
    expect(guardFormula(text)).toBe(`'${text}`);
  });

  it('leaves ordinary text alone', () => {
    expect(guardFormula('Quillmere Isolation')).toBe('Quillmere Isolation');
    expect(guardFormula('QM-S1=2')).toBe('QM-S1=2');
  });

  it('never guards plain numbers in cells of unknown kind, but guards anything else', () => {
    expect(guardCell('-40')).toBe('-40');
    expect(guardCell('+1.5e3')).toBe('+1.5e3');
    expect(guardCell('-4O')).toBe("'-4O");
  });
});

describe('ErrorReport', () => {
  it('writes one line per rejected row: row, columns, messages, then the original fields, guarded', () => {
    const report = new ErrorReport(['supplier', 'rated_load_n']);
    report.add(
      4,
      ['=evil()', '-3'],
      [
        { column: 'rated_load_n', message: 'must be a positive number (got "-3")' },
        { column: 'supplier', message: 'is longer than 120 characters' },
      ],
    );
    report.add(9, ['Short row'], [{ column: '', message: 'the row has 1 fields; the header has 2' }]);
    expect(parse(report.toString())).toEqual([
      ['row', 'column', 'message', 'supplier', 'rated_load_n'],
      [
        '4',
        'rated_load_n; supplier',
        'rated_load_n: must be a positive number (got "-3"); supplier: is longer than 120 characters',
        "'=evil()",
        '-3',
      ],
      ['9', '', 'the row has 1 fields; the header has 2', 'Short row', ''],
    ]);
    expect(report.isEmpty).toBe(false);
  });
});
