/** One problem of an import: the file's row (header = 1), the column as named in the file, what is wrong. */
export interface RowProblem {
  row: number;
  column: string;
  message: string;
}

/**
 * The file as a whole cannot be imported (not UTF-8 text, empty, broken CSV, bad header).
 * `problems` locate it where that is possible.
 */
export class CatalogFileError extends Error {
  constructor(
    message: string,
    readonly problems: RowProblem[] = [],
  ) {
    super(message);
    this.name = 'CatalogFileError';
  }
}

export const NOT_UTF8_TEXT = 'The file is not a UTF-8 text CSV';
