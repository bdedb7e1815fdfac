import { closeSync, openSync, readSync } from 'node:fs';
import { CsvError, Parser, type Options } from 'csv-parse';
import { CatalogFileError, NOT_UTF8_TEXT } from './import-problem.js';

/** One parsed record and its row in the file (the header is row 1; blank lines count). */
export interface CsvRecord {
  row: number;
  fields: string[];
}

/** A single row longer than this (in bytes) stops the import. */
export const MAX_ROW_BYTES = 1_000_000;

const CHUNK_BYTES = 64 * 1024;

/** csv-parse's engine behind its stream class (the one its sync and web-stream entry points share). */
interface CsvEngine {
  parse(chunk: Buffer | undefined, end: boolean, push: (record: string[]) => void, close: () => void): Error | undefined;
}

const PARSE_OPTIONS: Options = {
  bom: true,
  // Field counts are checked per row by the validator, with a clear message.
  relax_column_count: true,
  // Blank lines are yielded so that row numbers match the file's; the caller skips them.
  skip_empty_lines: false,
  max_record_size: MAX_ROW_BYTES,
};

function describeCsvError(error: CsvError): string {
  switch (error.code) {
    case 'CSV_QUOTE_NOT_CLOSED':
      return 'a quoted field is not closed (a closing " is missing)';
    case 'CSV_INVALID_CLOSING_QUOTE':
    case 'CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE':
      return 'a " inside a field must be doubled ("") and the field quoted';
    case 'CSV_MAX_RECORD_SIZE':
      return `the row is longer than ${MAX_ROW_BYTES} bytes`;
    default:
      return 'the row is not valid CSV';
  }
}

/**
 * Reads a CSV file record by record through csv-parse, in 64 KiB chunks, so memory does not
 * grow with the file. Synchronous on purpose: the import's write pass runs inside one
 * transaction, and on SQLite the single shared connection must not serve other requests in
 * between (see CatalogImportService). Throws CatalogFileError for a file that is not UTF-8
 * text (invalid UTF-8 or NUL bytes) or not valid CSV.
 */
export function* readCsvRecords(path: string): Generator<CsvRecord> {
  const engine = (new Parser(PARSE_OPTIONS) as unknown as { api: CsvEngine }).api;
  const decoder = new TextDecoder('utf-8', { fatal: true });
  const buffer = Buffer.allocUnsafe(CHUNK_BYTES);
  const pending: string[][] = [];
  const push = (record: string[]) => pending.push(record);
  const close = () => undefined;
  let row = 0;

  function* feed(chunk: Buffer | undefined): Generator<CsvRecord> {
    const error = engine.parse(chunk, chunk === undefined, push, close);
    for (const fields of pending.splice(0)) yield { row: ++row, fields };
    if (error) {
      const message = error instanceof CsvError ? describeCsvError(error) : 'the row is not valid CSV';
      throw new CatalogFileError(`The file is not valid CSV (row ${row + 1}: ${message})`, [{ row: row + 1, column: '', message }]);
    }
  }

  const fd = openSync(path, 'r');
  try {
    for (;;) {
      const bytes = readSync(fd, buffer, 0, CHUNK_BYTES, null);
      if (bytes === 0) break;
      const chunk = Buffer.from(buffer.subarray(0, bytes));
      if (chunk.includes(0)) throw new CatalogFileError(NOT_UTF8_TEXT);
      try {
        decoder.decode(chunk, { stream: true });
      } catch {
        throw new CatalogFileError(NOT_UTF8_TEXT);
      }
      yield* feed(chunk);
    }
    try {
      decoder.decode();
    } catch {
      throw new CatalogFileError(NOT_UTF8_TEXT);
    }
    yield* feed(undefined);
  } finally {
    closeSync(fd);
  }
}
