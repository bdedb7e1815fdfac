import { readCsvRecords } from '../catalog/import/csv-record-reader.js';
import { CatalogFileError, type RowProblem } from '../catalog/import/import-problem.js';

/** What a tap-test file holds: a measured FRF, or a raw hammer-and-accelerometer record. */
export const VERIFICATION_KINDS = ['frf', 'impact'] as const;
export type VerificationKind = (typeof VERIFICATION_KINDS)[number];

/** The FRF quantities (SI): receptance m/N, mobility m/s/N, accelerance m/s²/N. */
export const FRF_QUANTITIES = ['accelerance', 'mobility', 'receptance'] as const;
export type FrfQuantity = (typeof FRF_QUANTITIES)[number];

/** Column sets of the two kinds (PRODUCT.md "As-built verification"); names are matched case-insensitively. */
export const FRF_COLUMNS = {
  complex: ['frequency_hz', 'real', 'imag'],
  polar: ['frequency_hz', 'magnitude', 'phase_deg'],
} as const;
export const IMPACT_COLUMNS = ['time_s', 'force_n', 'acceleration_m_s2'] as const;

/** Fewest FRF lines and raw samples accepted. */
export const MIN_FRF_POINTS = 10;
export const MIN_IMPACT_SAMPLES = 64;
/** Most data rows read (a 10 MB file of short rows holds about this many). */
export const MAX_TAP_TEST_ROWS = 500_000;
/** Problems listed at most (the first ones; the file is refused anyway). */
export const MAX_TAP_TEST_PROBLEMS = 100;
/** A sample may sit this far (fraction of the step) from the constant-rate grid. */
const GRID_TOLERANCE = 0.1;

/** A parsed FRF file (SI, in the quantity the user named). */
export interface FrfFileData {
  kind: 'frf';
  frequencyHz: number[];
  re?: number[];
  im?: number[];
  magnitude?: number[];
  phaseDeg?: number[];
}

/** A parsed raw record. */
export interface ImpactFileData {
  kind: 'impact';
  sampleRateHz: number;
  timeS: number[];
  forceN: number[];
  accelerationMS2: number[];
}

export type TapTestFileData = FrfFileData | ImpactFileData;

/** The file cannot be used: every problem as (row, column, message); row 0 is the file as a whole. */
export class TapTestFileError extends Error {
  constructor(
    message: string,
    readonly problems: RowProblem[],
  ) {
    super(message);
    this.name = 'TapTestFileError';
  }
}

const PLAIN_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

const listOf = (names: readonly string[]) => names.join(', ');

/**
 * Reads a tap-test CSV streamed through csv-parse (the catalog import's reader, 64 KiB at a
 * time) and checks it row by row, collecting every problem as (row, column, message): the
 * header names one of the column sets, every cell is a plain number, frequencies and times
 * increase, magnitudes are not negative, a raw record is sampled at a constant rate, and there
 * are enough points. Throws {@link TapTestFileError} with the problems; nothing is kept then.
 * @param path the uploaded file
 * @param kind `frf` or `impact`
 */
export function readTapTestFile(path: string, kind: VerificationKind): TapTestFileData {
  const problems: RowProblem[] = [];
  const add = (problem: RowProblem) => {
    if (problems.length < MAX_TAP_TEST_PROBLEMS) problems.push(problem);
  };
  let names: string[] | null = null;
  let columns: readonly string[] = [];
  const values: number[][] = [];
  let lastRow = 0;
  try {
    for (const record of readCsvRecords(path)) {
      lastRow = record.row;
      const fields = record.fields.map((field) => field.trim());
      if (fields.every((field) => field === '')) continue;
      if (names === null) {
        names = fields.map((field) => field.toLowerCase());
        columns = headerProblems(names, kind, add);
        if (problems.length > 0) break;
        continue;
      }
      if (values.length >= MAX_TAP_TEST_ROWS) {
        add({ row: record.row, column: '', message: `the file has more than ${MAX_TAP_TEST_ROWS.toLocaleString('en-US')} data rows` });
        break;
      }
      if (fields.length > names.length) {
        add({ row: record.row, column: '', message: `the row has ${fields.length} fields; the header names ${names.length}` });
        continue;
      }
      const row: number[] = [];
      let ok = true;
      for (const column of columns) {
        const cell = fields[names.indexOf(column)] ?? '';
        if (cell === '') {
          add({ row: record.row, column, message: 'missing value' });
          ok = false;
        } else if (!PLAIN_NUMBER.test(cell) || !Number.isFinite(Number(cell))) {
          add({ row: record.row, column, message: `not a number: "${cell.slice(0, 40)}"` });
          ok = false;
        } else {
          row.push(Number(cell));
        }
      }
      if (ok) {
        row.push(record.row);
        values.push(row);
      }
    }
  } catch (error) {
    if (error instanceof CatalogFileError) {
      throw new TapTestFileError(error.message, error.problems.length ? error.problems : [{ row: 0, column: '', message: error.message }]);
    }
    throw error;
  }
  if (names === null) add({ row: 0, column: '', message: 'the file is empty' });
  if (problems.length > 0) throw new TapTestFileError(refusal(problems), problems);

  const data = kind === 'frf' ? frfData(columns, values, add) : impactData(values, add, lastRow);
  if (problems.length > 0 || !data) throw new TapTestFileError(refusal(problems), problems);
  return data;
}

function refusal(problems: RowProblem[]): string {
  const first = problems[0];
  const where = first.row > 0 ? `row ${first.row}${first.column ? `, ${first.column}` : ''}: ` : '';
  const more = problems.length > 1 ? ` (and ${problems.length - 1} more problem${problems.length > 2 ? 's' : ''})` : '';
  return `The file cannot be used: ${where}${first.message}${more}`;
}

/** Checks the header; returns the columns read, in the order values are kept. */
function headerProblems(names: string[], kind: VerificationKind, add: (p: RowProblem) => void): readonly string[] {
  const seen = new Set<string>();
  for (const name of names) {
    if (name !== '' && seen.has(name)) add({ row: 1, column: name, message: 'appears twice in the header' });
    seen.add(name);
  }
  if (names.length === 1 && names[0].includes(';')) {
    add({ row: 1, column: '', message: 'the columns seem to be separated by semicolons; separate them with commas' });
    return [];
  }
  if (kind === 'impact') {
    for (const name of names) {
      if (name !== '' && !(IMPACT_COLUMNS as readonly string[]).includes(name)) {
        add({ row: 1, column: name, message: `unknown column; a raw record has the columns ${listOf(IMPACT_COLUMNS)}` });
      }
    }
    for (const column of IMPACT_COLUMNS) if (!seen.has(column)) add({ row: 1, column, message: 'missing column' });
    return IMPACT_COLUMNS;
  }
  const known = new Set<string>([...FRF_COLUMNS.complex, ...FRF_COLUMNS.polar]);
  for (const name of names) {
    if (name !== '' && !known.has(name)) {
      add({
        row: 1,
        column: name,
        message: `unknown column; an FRF file has the columns ${listOf(FRF_COLUMNS.complex)} or ${listOf(FRF_COLUMNS.polar)}`,
      });
    }
  }
  const complex = seen.has('real') || seen.has('imag');
  const polar = seen.has('magnitude') || seen.has('phase_deg');
  if (complex && polar) {
    add({ row: 1, column: '', message: `give ${listOf(FRF_COLUMNS.complex)} or ${listOf(FRF_COLUMNS.polar)}, not both` });
    return [];
  }
  const set = polar ? FRF_COLUMNS.polar : FRF_COLUMNS.complex;
  for (const column of set) {
    if (!seen.has(column)) {
      add({
        row: 1,
        column,
        message:
          complex || polar ? 'missing column' : `missing column: give ${listOf(FRF_COLUMNS.complex)} or ${listOf(FRF_COLUMNS.polar)}`,
      });
    }
  }
  return set;
}

function frfData(columns: readonly string[], rows: number[][], add: (p: RowProblem) => void): FrfFileData | null {
  const polar = columns.includes('magnitude');
  for (let i = 0; i < rows.length; i++) {
    const [f, a] = rows[i];
    const row = rows[i][3];
    if (f < 0) add({ row, column: 'frequency_hz', message: `must not be negative (got ${f})` });
    if (i > 0 && !(f > rows[i - 1][0])) {
      add({ row, column: 'frequency_hz', message: `frequencies must increase: ${f} Hz follows ${rows[i - 1][0]} Hz` });
    }
    if (polar && a < 0) add({ row, column: 'magnitude', message: `must not be negative (got ${a})` });
  }
  if (rows.length < MIN_FRF_POINTS) {
    add({ row: 0, column: '', message: `the file has ${rows.length} frequency lines; at least ${MIN_FRF_POINTS} are needed` });
  }
  const pick = (j: number) => rows.map((r) => r[j]);
  return polar
    ? { kind: 'frf', frequencyHz: pick(0), magnitude: pick(1), phaseDeg: pick(2) }
    : { kind: 'frf', frequencyHz: pick(0), re: pick(1), im: pick(2) };
}

function impactData(rows: number[][], add: (p: RowProblem) => void, lastRow: number): ImpactFileData | null {
  for (let i = 1; i < rows.length; i++) {
    if (!(rows[i][0] > rows[i - 1][0])) {
      add({ row: rows[i][3], column: 'time_s', message: `times must increase: ${rows[i][0]} s follows ${rows[i - 1][0]} s` });
    }
  }
  if (rows.length < MIN_IMPACT_SAMPLES) {
    add({ row: 0, column: '', message: `the record has ${rows.length} samples; at least ${MIN_IMPACT_SAMPLES} are needed` });
    return null;
  }
  const n = rows.length;
  const t0 = rows[0][0];
  const step = (rows[n - 1][0] - t0) / (n - 1);
  if (!(step > 0)) return null;
  let uneven = 0;
  for (let i = 0; i < n; i++) {
    const expected = t0 + i * step;
    if (Math.abs(rows[i][0] - expected) > GRID_TOLERANCE * step) {
      uneven++;
      if (uneven <= 10) {
        add({
          row: rows[i][3],
          column: 'time_s',
          message: `uneven sampling: at a constant rate of ${(1 / step).toPrecision(6)} samples/s this sample would be at ${expected.toPrecision(8)} s, not ${rows[i][0]} s`,
        });
      }
    }
  }
  if (uneven > 10) {
    add({
      row: 0,
      column: 'time_s',
      message: `${uneven} samples in all are off the constant-rate grid (rows up to ${lastRow}); resample the record at a constant rate`,
    });
  }
  return {
    kind: 'impact',
    sampleRateHz: 1 / step,
    timeS: rows.map((r) => r[0]),
    forceN: rows.map((r) => r[1]),
    accelerationMS2: rows.map((r) => r[2]),
  };
}
