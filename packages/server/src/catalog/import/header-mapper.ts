import { COLUMNS, KNOWN_COLUMN_NAMES, type ColumnSpec, type ColumnVariant, type MountField } from './catalog-columns.js';

/** A problem in one cell: the column as the file names it, and what is wrong. */
export interface CellProblem {
  column: string;
  message: string;
}

/** What the file's column at one position holds. */
export interface MappedColumn {
  spec: ColumnSpec;
  variant: ColumnVariant;
}

/** The header of one file, resolved against the format. */
export interface HeaderMap {
  /** Per position: the column read there, or null for a column without a name (must stay empty). */
  columns: ReadonlyArray<MappedColumn | null>;
  /** The header's names as written (trimmed), per position. */
  names: readonly string[];
  /** The header name that carries each field present in the file. */
  nameOf: Readonly<Partial<Record<MountField, string>>>;
}

/** More header columns than this is not a catalog file (the format has 24 names). */
export const MAX_HEADER_COLUMNS = 64;

const DAMPING_NAMES = ['damping_ratio', 'loss_factor'];

const VARIANTS = new Map<string, MappedColumn>(
  COLUMNS.flatMap((spec) => spec.variants.map((variant) => [variant.name, { spec, variant }] as const)),
);

const orList = (names: readonly string[]): string => names.join(' or ');

/**
 * Maps the header row (row 1) to the format's columns. Names are matched case-insensitively,
 * in any order. Reports unknown and repeated names and missing required columns; `header` is null
 * when there is any problem. Both units of one quantity may be given (the rows must agree:
 * row-validator.ts); `nameOf` names the first.
 */
export function mapHeader(fields: readonly string[]): { header: HeaderMap | null; problems: CellProblem[] } {
  if (fields.length > MAX_HEADER_COLUMNS) {
    return {
      header: null,
      problems: [
        {
          column: '',
          message: `the header has ${fields.length} columns; a catalog file has at most ${MAX_HEADER_COLUMNS} (see the format description)`,
        },
      ],
    };
  }
  const names = fields.map((field) => field.trim());
  if (names.length === 1 && names[0].includes(';')) {
    return {
      header: null,
      problems: [{ column: '', message: 'the columns seem to be separated by semicolons; separate them with commas' }],
    };
  }

  const problems: CellProblem[] = [];
  const columns: Array<MappedColumn | null> = [];
  const nameOf: Partial<Record<MountField, string>> = {};
  const positionOf = new Map<string, number>();
  names.forEach((name, index) => {
    const key = name.toLowerCase();
    if (key === '') {
      columns.push(null);
      return;
    }
    const mapped = VARIANTS.get(key);
    const earlier = positionOf.get(key);
    if (earlier !== undefined) {
      problems.push({ column: name, message: `appears twice in the header (columns ${earlier + 1} and ${index + 1})` });
    } else if (!mapped) {
      problems.push({ column: name, message: `unknown column; the known columns are ${KNOWN_COLUMN_NAMES.join(', ')}` });
    } else {
      nameOf[mapped.spec.field] ??= key;
    }
    positionOf.set(key, positionOf.get(key) ?? index);
    columns.push(mapped ?? null);
  });

  for (const spec of COLUMNS) {
    if (!spec.required || nameOf[spec.field] !== undefined) continue;
    const pair = spec.variants.map((v) => v.name);
    problems.push({
      column: pair[0],
      message: pair.length > 1 ? `missing column: give ${orList(pair)}` : 'missing column',
    });
  }
  if (nameOf.dampingRatio === undefined && nameOf.lossFactor === undefined) {
    problems.push({ column: DAMPING_NAMES[0], message: `missing column: give ${orList(DAMPING_NAMES)}` });
  }

  return problems.length > 0 ? { header: null, problems } : { header: { columns, names, nameOf }, problems };
}
