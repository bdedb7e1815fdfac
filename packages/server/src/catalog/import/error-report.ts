import { stringify } from 'csv-stringify/sync';
import { guardCell } from './csv-cell.js';
import type { CellProblem } from './header-mapper.js';

/**
 * The rejected rows of a "valid rows only" import, as CSV: one line per rejected row with
 * `row` (the file's row), `column` (the columns with a problem), `message` (every problem), then
 * the row's original fields under the file's own header. Deleting the first three columns and
 * fixing the rows gives a file to import again. Cells are guarded against spreadsheet formulas.
 */
export class ErrorReport {
  private readonly chunks: string[] = [];
  private rows = 0;

  constructor(private readonly headerNames: readonly string[]) {
    this.chunks.push(stringify([['row', 'column', 'message', ...headerNames]]));
  }

  add(row: number, fields: readonly string[], problems: readonly CellProblem[]): void {
    const columns = [...new Set(problems.map((p) => p.column).filter(Boolean))].join('; ');
    const message = problems.map((p) => (p.column ? `${p.column}: ${p.message}` : p.message)).join('; ');
    const original = this.headerNames.map((_, index) => guardCell(fields[index] ?? ''));
    this.chunks.push(stringify([[String(row), guardCell(columns), guardCell(message), ...original]]));
    this.rows++;
  }

  get isEmpty(): boolean {
    return this.rows === 0;
  }

  toString(): string {
    return this.chunks.join('');
  }
}
