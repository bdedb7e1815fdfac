import fc from 'fast-check';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import type { Response } from 'supertest';
import { DataSource, Like } from 'typeorm';
import { Mount } from '../src/catalog/mount.entity.js';
import { SI_HEADER, csvOf, mountRow } from './factories/catalog.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { changedTables, dbFingerprint, type DbFingerprint } from './utils/db-fingerprint.js';
import {
  EDGE_NUMBERS,
  FORMULA_PAYLOADS,
  FUZZ_RUNS,
  NUMERIC_TEXT,
  UNICODE_SAMPLES,
  fuzzParameters,
  fuzzTimeout,
} from './utils/hostile-input.js';

/**
 * Hostile files against the catalog import (POST /api/mounts/import, catalog/FORMAT.md):
 * random bytes, and random CSV built from the real header with hostile cells, quoting, line
 * ends and byte-order marks, in every mode. For every upload: never a 5xx; a 4xx answers the
 * JSON error shape; a refused file or a dry run leaves every table exactly as before; and when
 * rows are written, each row the answer does not list as a problem is in the catalog with valid
 * values equal to its cells (read back through GET /api/mounts/:id), each listed one is not,
 * and the export guards every text cell that a spreadsheet would run as a formula.
 */

/** US customary factors (exact by definition: 1 lbf = 0.45359237 kg × 9.80665 m/s², 1 in = 25.4 mm). */
const N_PER_LBF = 0.45359237 * 9.80665;
const N_PER_M_PER_LBF_PER_IN = N_PER_LBF / 0.0254;
const MM_PER_IN = 25.4;

const MOUNT_TYPES = ['elastomer_pad', 'elastomer_mount', 'open_spring', 'housed_spring', 'restrained_spring', 'air_spring', 'wire_rope'];

/** The columns a generated file may carry, each with how its cell maps to the stored mount. */
type Kind = 'supplier' | 'part' | 'text' | 'type' | 'currency' | 'number';
interface Column {
  kind: Kind;
  /** The stored field, and the factor from the cell to it. */
  field?: string;
  factor?: number;
  /** Valid cells (as text). */
  valid: fc.Arbitrary<string>;
}

const decimal = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((value) => String(value));
const COLUMNS: Record<string, Column> = {
  supplier: {
    kind: 'supplier',
    valid: fc.constantFrom(
      'Fuzzwell Mounts',
      '  fuzzwell   MOUNTS ',
      '=Formula Springs',
      '@Home Isolation',
      'Ωmega Mounts 🚀',
      'Zero\u200bWidth Mounts',
      'Ärger Lager',
    ),
  },
  part_number: { kind: 'part', valid: fc.constantFrom('') },
  series: { kind: 'text', field: 'series', valid: fc.constantFrom('', 'S1', '-S2', '+S3', '@S4', "'=S5", 'שלום', '"Q" series', 'a,b') },
  mount_type: { kind: 'type', field: 'mountType', valid: fc.constantFrom(...MOUNT_TYPES, 'OPEN_SPRING', ' Housed_Spring ') },
  rated_load_n: { kind: 'number', field: 'ratedLoadN', factor: 1, valid: decimal(1e-3, 1e6) },
  rated_load_lbf: { kind: 'number', field: 'ratedLoadN', factor: N_PER_LBF, valid: decimal(1e-3, 2e5) },
  vertical_stiffness_n_per_mm: { kind: 'number', field: 'verticalStiffnessNPerM', factor: 1000, valid: decimal(1e-3, 1e6) },
  vertical_stiffness_lbf_per_in: {
    kind: 'number',
    field: 'verticalStiffnessNPerM',
    factor: N_PER_M_PER_LBF_PER_IN,
    valid: decimal(1e-3, 1e6),
  },
  horizontal_stiffness_n_per_mm: {
    kind: 'number',
    field: 'horizontalStiffnessNPerM',
    factor: 1000,
    valid: fc.oneof(fc.constant(''), decimal(1e-3, 1e6)),
  },
  dynamic_stiffness_ratio: { kind: 'number', field: 'dynamicStiffnessRatio', factor: 1, valid: fc.oneof(fc.constant(''), decimal(1, 5)) },
  damping_ratio: { kind: 'number', field: 'dampingRatio', factor: 1, valid: decimal(1e-6, 0.999) },
  loss_factor: { kind: 'number', field: 'lossFactor', factor: 1, valid: decimal(1e-6, 2) },
  max_deflection_mm: { kind: 'number', field: 'maxDeflectionMm', factor: 1, valid: fc.oneof(fc.constant(''), decimal(0.01, 500)) },
  max_deflection_in: { kind: 'number', field: 'maxDeflectionMm', factor: MM_PER_IN, valid: fc.oneof(fc.constant(''), decimal(0.001, 20)) },
  temp_min_c: {
    kind: 'number',
    field: 'tempMinC',
    factor: 1,
    valid: fc.oneof(fc.constant(''), fc.integer({ min: -80, max: 0 }).map(String)),
  },
  temp_max_c: {
    kind: 'number',
    field: 'tempMaxC',
    factor: 1,
    valid: fc.oneof(fc.constant(''), fc.integer({ min: 1, max: 250 }).map(String)),
  },
  height_mm: { kind: 'number', field: 'heightMm', factor: 1, valid: fc.oneof(fc.constant(''), decimal(0.1, 2000)) },
  restraint_capacity_n: { kind: 'number', field: 'restraintCapacityN', factor: 1, valid: fc.oneof(fc.constant(''), decimal(1e-3, 1e6)) },
  restraint_capacity_lbf: {
    kind: 'number',
    field: 'restraintCapacityN',
    factor: N_PER_LBF,
    valid: fc.oneof(fc.constant(''), decimal(1e-3, 2e5)),
  },
  uplift_capacity_n: { kind: 'number', field: 'upliftCapacityN', factor: 1, valid: fc.oneof(fc.constant(''), decimal(1e-3, 1e6)) },
  uplift_capacity_lbf: {
    kind: 'number',
    field: 'upliftCapacityN',
    factor: N_PER_LBF,
    valid: fc.oneof(fc.constant(''), decimal(1e-3, 2e5)),
  },
  unit_price: { kind: 'number', field: 'unitPrice', factor: 1, valid: fc.oneof(fc.constant(''), decimal(0, 1e5), fc.constant('0')) },
  currency: { kind: 'currency', field: 'currency', valid: fc.constantFrom('', 'USD', 'eur', ' Gbp ') },
  lead_time_days: {
    kind: 'number',
    field: 'leadTimeDays',
    factor: 1,
    valid: fc.oneof(fc.constant(''), fc.integer({ min: 0, max: 730 }).map(String)),
  },
};

const SI_MINIMAL = ['supplier', 'part_number', 'mount_type', 'rated_load_n', 'vertical_stiffness_n_per_mm', 'damping_ratio'];
const US_SET = [
  'supplier',
  'part_number',
  'series',
  'mount_type',
  'rated_load_lbf',
  'vertical_stiffness_lbf_per_in',
  'loss_factor',
  'max_deflection_in',
  'restraint_capacity_lbf',
  'uplift_capacity_lbf',
];

/** Cells no valid row holds (or holds only by chance: any cell may still be accepted, the checks read it back). */
const hostileCell: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(...NUMERIC_TEXT),
  fc.constantFrom(...EDGE_NUMBERS.map(String), '1e308', '-1e308', '9'.repeat(400), '0.' + '0'.repeat(400) + '1', '-5', '0', '-0.0'),
  fc.constantFrom(...FORMULA_PAYLOADS),
  fc.constantFrom(...UNICODE_SAMPLES.filter((text) => !/\p{Surrogate}/u.test(text))),
  fc.constantFrom('"', '""', 'a"b', '"quoted"', 'multi\nline', 'cr\ronly', 'tab\there', ',', ' ', "'", "'=1", 'x'.repeat(200)),
  fc.string({ maxLength: 12 }),
);

/** A row: valid cells, then up to three replaced by hostile ones; and the damping column left empty. */
const rowOf = (header: string[]) =>
  fc.record({
    valid: fc.tuple(...header.map((name) => COLUMNS[name]?.valid ?? fc.constant('x'))),
    viscous: fc.boolean(),
    partPrefix: fc.oneof(
      { weight: 3, arbitrary: fc.constantFrom('FZ-', ' FZ-', 'fz/') },
      { weight: 2, arbitrary: fc.constantFrom(...FORMULA_PAYLOADS, "'=", "'@", '\u202e', '🚀', '"', 'a,', '\n', 'p'.repeat(90)) },
    ),
    hostile: fc.oneof(
      { weight: 2, arbitrary: fc.constant([] as Array<[number, string]>) },
      { weight: 1, arbitrary: fc.array(fc.tuple(fc.nat({ max: header.length - 1 }), hostileCell), { minLength: 1, maxLength: 3 }) },
    ),
    repeat: fc.integer({ min: 0, max: 7 }).map((n) => n === 0),
  });

/** `arbitrary` about once in `every` runs, null otherwise. */
const sometimes = <T>(arbitrary: fc.Arbitrary<T>, every: number): fc.Arbitrary<T | null> =>
  fc.oneof({ weight: every - 1, arbitrary: fc.constant(null) }, { weight: 1, arbitrary });

const headerArb = fc
  .record({
    base: fc.constantFrom([...SI_HEADER] as string[], SI_MINIMAL, US_SET),
    shuffle: fc.boolean(),
    upper: fc.boolean(),
    extra: sometimes(fc.constantFrom('colour', 'supplier', 'rated_load_lbf', ' ', '=cmd', 'Part_Number'), 10),
    drop: sometimes(fc.nat(), 12),
  })
  .chain(({ base, shuffle, upper, extra, drop }) =>
    (shuffle ? fc.shuffledSubarray(base, { minLength: base.length, maxLength: base.length }) : fc.constant(base)).map((names) => {
      const header = [...names];
      if (drop !== null) header.splice(drop % header.length, 1);
      if (extra !== null) header.push(extra);
      return upper ? header.map((name) => name.toUpperCase()) : header;
    }),
  );

const fileArb = headerArb.chain((header) =>
  fc.record({
    header: fc.constant(header),
    rows: fc.array(rowOf(header.map((name) => name.toLowerCase().trim())), { minLength: 1, maxLength: 6 }),
    delimiter: fc.constantFrom('\n', '\r\n', '\r'),
    quoteAll: fc.boolean(),
    boms: fc.constantFrom(0, 0, 1, 2),
    blankLineAfter: sometimes(fc.nat({ max: 6 }), 4),
    corruption: sometimes(fc.constantFrom('unclosed quote', 'truncated', 'NUL byte', 'invalid UTF-8', 'UTF-16'), 8),
  }),
);

type FileSpec = typeof fileArb extends fc.Arbitrary<infer T> ? T : never;

/** One data row as written: its row number in the file, part-number token and cells by column. */
interface WrittenRow {
  row: number;
  token: string;
  cells: Record<string, string>;
}

let serial = 0;

/** The file's bytes and the rows it holds (row numbers as the format counts them). */
function build(spec: FileSpec): { bytes: Buffer; rows: WrittenRow[] } {
  const names = spec.header.map((name) => name.toLowerCase().trim());
  const written: WrittenRow[] = [];
  const lines: string[] = [stringify([spec.header], { record_delimiter: spec.delimiter, quoted: spec.quoteAll })];
  let row = 1;
  for (const generated of spec.rows) {
    const cells = [...generated.valid] as string[];
    const token = `FZ${process.pid}x${++serial}`;
    const both = names.includes('damping_ratio') && names.includes('loss_factor');
    names.forEach((name, index) => {
      if (name === 'part_number') cells[index] = `${generated.partPrefix}${token}`;
      // one damping cell per row when the file has both columns
      if (both && name === (generated.viscous ? 'loss_factor' : 'damping_ratio')) cells[index] = '';
    });
    for (const [index, value] of generated.hostile) if (names[index] !== 'part_number') cells[index] = value;
    const copies = generated.repeat ? 2 : 1;
    for (let copy = 0; copy < copies; copy++) {
      lines.push(stringify([cells], { record_delimiter: spec.delimiter, quoted: spec.quoteAll }));
      written.push({ row: ++row, token, cells: Object.fromEntries(names.map((name, index) => [name, cells[index]])) });
      if (spec.blankLineAfter === written.length) {
        lines.push(spec.delimiter);
        row++;
      }
    }
  }
  let text = '\ufeff'.repeat(spec.boms) + lines.join('');
  let bytes = Buffer.from(text, 'utf8');
  switch (spec.corruption) {
    case 'unclosed quote':
      text = `${text}"unclosed,field`;
      bytes = Buffer.from(text, 'utf8');
      break;
    case 'truncated':
      bytes = bytes.subarray(0, Math.max(1, Math.floor(bytes.length * 0.7)));
      break;
    case 'NUL byte':
      bytes = Buffer.concat([bytes, Buffer.from([0])]);
      break;
    case 'invalid UTF-8':
      bytes = Buffer.concat([bytes.subarray(0, bytes.length >> 1), Buffer.from([0xed, 0xa0, 0x80]), bytes.subarray(bytes.length >> 1)]);
      break;
    case 'UTF-16':
      bytes = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, 'utf16le')]);
      break;
  }
  return { bytes, rows: written };
}

type Mode = 'refuse' | 'skip' | 'dry-run' | 'dry-run skip';
const QUERY: Record<Mode, string> = {
  refuse: '',
  skip: '?onInvalid=skip',
  'dry-run': '?dryRun=true',
  'dry-run skip': '?dryRun=true&onInvalid=skip',
};
const modeArb = fc.constantFrom<Mode>('refuse', 'skip', 'skip', 'skip', 'dry-run', 'dry-run skip');

/** A text cell as stored: trimmed, the export's `'` guard before a formula character removed. */
const storedText = (cell: string): string => cell.trim().replace(/^'(?=[=+\-@\t\r])/, '');
const supplierKey = (name: string): string => name.normalize('NFC').trim().replace(/\s+/g, ' ').toLowerCase();
// eslint-disable-next-line no-control-regex -- the pattern is there to find control characters
const CONTROL = /[\u0000-\u0008\u000A-\u001F\u007F]/;
/** What a spreadsheet runs as a formula when a cell starts with it (OWASP "CSV injection"). */
const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

const close = (actual: number, expected: number): boolean => Math.abs(actual - expected) <= 1e-9 * Math.max(Math.abs(expected), 1e-300);

/** The problems of one stored mount against FORMAT.md and against the cells it came from ([] when it is right). */
function mountProblems(mount: Record<string, unknown>, cells: Record<string, string>): string[] {
  const problems: string[] = [];
  const number = (field: string) => mount[field] as number | null;
  const positive = (field: string, required: boolean) => {
    const value = number(field);
    if (value === null ? required : !(Number.isFinite(value) && value > 0)) problems.push(`${field} = ${value}`);
  };
  positive('ratedLoadN', true);
  positive('verticalStiffnessNPerM', true);
  positive('horizontalStiffnessNPerM', false);
  positive('maxDeflectionMm', false);
  positive('heightMm', false);
  positive('restraintCapacityN', false);
  positive('upliftCapacityN', false);
  const ratio = number('dynamicStiffnessRatio');
  // optional: an empty cell stores none (FORMAT.md)
  if (ratio === null ? (cells.dynamic_stiffness_ratio ?? '').trim() !== '' : !(ratio >= 1 && ratio <= 5)) {
    problems.push(`dynamicStiffnessRatio = ${ratio}`);
  }
  const zeta = number('dampingRatio');
  const eta = number('lossFactor');
  if ((zeta === null) === (eta === null)) problems.push(`dampingRatio ${zeta} / lossFactor ${eta}: exactly one`);
  if (zeta !== null && !(zeta > 0 && zeta < 1)) problems.push(`dampingRatio = ${zeta}`);
  if (eta !== null && !(eta > 0 && eta <= 2)) problems.push(`lossFactor = ${eta}`);
  const [tMin, tMax] = [number('tempMinC'), number('tempMaxC')];
  for (const [field, value] of [
    ['tempMinC', tMin],
    ['tempMaxC', tMax],
  ] as const) {
    if (value !== null && !(value >= -80 && value <= 250)) problems.push(`${field} = ${value}`);
  }
  if (tMin !== null && tMax !== null && !(tMin < tMax)) problems.push(`tempMinC ${tMin} not below tempMaxC ${tMax}`);
  const price = number('unitPrice');
  if (price !== null && !(Number.isFinite(price) && price >= 0)) problems.push(`unitPrice = ${price}`);
  const lead = number('leadTimeDays');
  if (lead !== null && !(Number.isInteger(lead) && lead >= 0 && lead <= 730)) problems.push(`leadTimeDays = ${lead}`);
  if (!/^[A-Z]{3}$/.test(String(mount.currency))) problems.push(`currency = ${mount.currency}`);
  if (!MOUNT_TYPES.includes(String(mount.mountType))) problems.push(`mountType = ${mount.mountType}`);
  const supplier = (mount.supplier as { name: string }).name;
  for (const [field, text, max] of [
    ['partNumber', mount.partNumber, 80],
    ['series', mount.series, 80],
    ['supplier', supplier, 120],
  ] as const) {
    if (text === null) continue;
    if (typeof text !== 'string' || CONTROL.test(text) || text.length > max || (field !== 'series' && text.trim() === '')) {
      problems.push(`${field} = ${JSON.stringify(text)}`);
    }
  }

  // …and it is what the row said
  for (const [name, cell] of Object.entries(cells)) {
    const column = COLUMNS[name];
    if (!column?.field) continue;
    const stored = mount[column.field];
    if (column.kind === 'number') {
      if (cell.trim() === '') continue;
      if (typeof stored !== 'number' || !close(stored, Number(cell.trim()) * (column.factor ?? 1)))
        problems.push(`${name} "${cell}" stored as ${stored}`);
    } else if (column.kind === 'text') {
      const expected = storedText(cell) || null;
      if (stored !== expected) problems.push(`${name} "${cell}" stored as ${JSON.stringify(stored)}`);
    } else if (column.kind === 'type' && stored !== cell.trim().toLowerCase()) {
      problems.push(`${name} "${cell}" stored as ${stored}`);
    } else if (column.kind === 'currency' && stored !== (cell.trim().toUpperCase() || 'USD')) {
      problems.push(`${name} "${cell}" stored as ${stored}`);
    }
  }
  if (cells.supplier !== undefined && supplierKey(supplier) !== supplierKey(storedText(cells.supplier))) {
    problems.push(`supplier "${cells.supplier}" stored as "${supplier}"`);
  }
  return problems;
}

describe('hostile catalog files (e2e)', () => {
  let t: TestApp;
  let token: string;
  let last: DbFingerprint;
  /** What the random-CSV property got to check (so that it cannot pass by checking nothing). */
  const seen = { files: 0, written: 0, rowsReadBack: 0, formulaRowsReadBack: 0, refusedRows: 0 };
  const auth = () => ({ Authorization: `Bearer ${token}` });

  const upload = (bytes: Buffer, query = '', filename = 'catalog.csv', contentType = 'text/csv') =>
    t.http().post(`/api/mounts/import${query}`).set(auth()).attach('file', bytes, { filename, contentType });

  const shown = (text: string): string => (text.length > 400 ? `${text.slice(0, 400)}… (${text.length} characters)` : text);

  /** Never a 5xx; the JSON error shape; nothing changed by a refusal or a dry run. Returns the answer's body. */
  const check = async (what: string, response: Response, dryRun: boolean) => {
    const described = `${what} → ${response.status} ${shown(response.text)}`;
    if (response.status >= 500) throw new Error(`5xx: ${described}`);
    const body = response.body as { statusCode?: unknown; message?: unknown };
    if (response.status >= 400 && (body.statusCode !== response.status || typeof body.message !== 'string')) {
      throw new Error(`4xx without the JSON error shape: ${described}`);
    }
    const now = await dbFingerprint(t);
    const changed = changedTables(last, now);
    if ((response.status >= 400 || dryRun) && changed.length > 0) {
      throw new Error(`${response.status >= 400 ? 'a refused file' : 'a dry run'} changed ${changed.join(', ')}: ${described}`);
    }
    last = now;
  };

  /** The export as rows of cells (header first). */
  const exportRows = async (): Promise<string[][]> => {
    const response = await t.http().get('/api/mounts/export.csv').set(auth()).buffer(true);
    if (response.status !== 200) throw new Error(`export: ${response.status}`);
    return parse(response.text, { bom: true, relax_column_count: true }) as string[][];
  };

  /** After rows were written: listed rows are not in the catalog, the others are, valid and as written; the export guards formulas. */
  const checkWritten = async (
    rows: WrittenRow[] | null,
    result: { errors: Array<{ row: number }>; accepted: number; rejected: number },
    what: string,
  ) => {
    const exported = await exportRows();
    for (const cells of exported.slice(1)) {
      const unguarded = cells.filter((cell) => FORMULA_START.test(cell) && !PLAIN_NUMBER.test(cell));
      if (unguarded.length > 0) throw new Error(`the export holds cells a spreadsheet would run: ${JSON.stringify(unguarded)}`);
    }
    if (!rows) return;
    const refused = new Set(result.errors.map((error) => error.row));
    const accepted = rows.filter((row) => !refused.has(row.row));
    if (accepted.length !== result.accepted || rows.length - accepted.length !== result.rejected) {
      throw new Error(
        `counts: ${accepted.length} rows without problems, ${rows.length - accepted.length} with, answered ${JSON.stringify(result)}: ${what}`,
      );
    }
    const mounts = t.app.get(DataSource).getRepository(Mount);
    const acceptedTokens = new Set(accepted.map((row) => row.token));
    const exportedParts = new Set(exported.map((cells) => cells[1]));
    for (const row of rows) {
      const found = await mounts.find({ select: { id: true }, where: { partNumber: Like(`%${row.token}`) } });
      if (refused.has(row.row)) {
        seen.refusedRows++;
        if (!acceptedTokens.has(row.token) && found.length > 0) throw new Error(`row ${row.row} was refused but written: ${what}`);
        continue;
      }
      if (found.length !== 1) throw new Error(`row ${row.row} (${row.token}) was accepted but ${found.length} mounts hold it: ${what}`);
      const mount = await t.http().get(`/api/mounts/${found[0].id}`).set(auth());
      const problems = mountProblems(mount.body, row.cells);
      if (problems.length > 0) throw new Error(`row ${row.row} stored wrong: ${problems.join('; ')}: ${what}`);
      const partNumber = mount.body.partNumber as string;
      seen.rowsReadBack++;
      if (FORMULA_START.test(partNumber)) seen.formulaRowsReadBack++;
      const expectedCell = FORMULA_START.test(partNumber) ? `'${partNumber}` : partNumber;
      if (!exportedParts.has(expectedCell))
        throw new Error(`row ${row.row}: the export has no part_number cell ${JSON.stringify(expectedCell)}: ${what}`);
    }
  };

  beforeAll(async () => {
    t = await createTestApp();
    token = await t.loginAs('catalog_manager');
    last = await dbFingerprint(t);
  }, 120_000);
  afterAll(() => t?.close());

  it(
    'random CSV from the real header: never a 5xx, all or nothing by mode, accepted rows valid and guarded in the export',
    async () => {
      await fc.assert(
        fc.asyncProperty(fileArb, modeArb, async (spec, mode) => {
          const { bytes, rows } = build(spec);
          const what = `${mode} import of ${JSON.stringify(bytes.toString('utf8'))}`;
          const response = await upload(bytes, QUERY[mode]);
          await check(what, response, mode.startsWith('dry-run'));
          seen.files++;
          if (response.status === 200 && !mode.startsWith('dry-run')) seen.written++;
          // (a cut-off file holds fewer rows than were generated: only the export is checked then)
          if (response.status === 200 && !mode.startsWith('dry-run'))
            await checkWritten(spec.corruption ? null : rows, response.body, what);
          if (response.status === 200 && mode === 'refuse' && response.body.rejected !== 0)
            throw new Error(`refuse mode wrote a file with problems: ${what}`);
        }),
        fuzzParameters(6),
      );
      expect(seen.rowsReadBack).toBeGreaterThan(0);
      expect(seen.formulaRowsReadBack).toBeGreaterThan(0);
      expect(seen.refusedRows).toBeGreaterThan(0);
    },
    fuzzTimeout(FUZZ_RUNS * 6 * 3),
  );

  it(
    'random bytes, bare or after the real header: never a 5xx, and nothing written unless the rows are valid',
    async () => {
      const header = Buffer.from(`${SI_HEADER.join(',')}\n`);
      const files = fc.record({
        bytes: fc.uint8Array({ maxLength: 2000 }),
        withHeader: fc.boolean(),
        mode: modeArb,
      });
      await fc.assert(
        fc.asyncProperty(files, async ({ bytes, withHeader, mode }) => {
          const content = withHeader ? Buffer.concat([header, Buffer.from(bytes)]) : Buffer.from(bytes);
          await check(`${mode} import of ${content.length} random bytes`, await upload(content, QUERY[mode]), mode.startsWith('dry-run'));
        }),
        fuzzParameters(2),
      );
    },
    fuzzTimeout(FUZZ_RUNS * 2),
  );

  it('takes .csv and .txt files whatever their content type, and refuses any other name with 422, writing nothing', async () => {
    const names: Array<[string, boolean]> = [
      ['catalog.csv', true],
      ['CATALOG.CSV', true],
      ['list.TxT', true],
      ['../../../etc/cron.d/evil.csv', true],
      ['ç📄 \u202eftp.csv', true],
      [`${'n'.repeat(300)}.csv`, true],
      ['catalog.xlsx', false],
      ['catalog.csv.exe', false],
      ['catalog', false],
      ['.csv.', false],
      ['catalog.csv%00.exe', false],
    ];
    const types = [
      'text/csv',
      'application/octet-stream',
      'image/png',
      'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
    ];
    for (const [index, [name, acceptable]] of names.entries()) {
      const contentType = types[index % types.length];
      const row = mountRow({ supplier: 'Fuzz Name Mounts' });
      const response = await upload(Buffer.from(csvOf([row])), '', name, contentType);
      await check(`import named ${name} (${contentType})`, response, false);
      expect({ name, status: response.status }).toEqual({ name, status: acceptable ? 200 : 422 });
    }
  });

  it(
    'refuses what is not one multipart CSV upload with a 4xx, writing nothing',
    async () => {
      const csv = csvOf([mountRow()]);
      const attempts: Array<[string, () => Promise<Response>]> = [
        ['the CSV as the raw body', async () => t.http().post('/api/mounts/import').set(auth()).set('Content-Type', 'text/csv').send(csv)],
        ['JSON', async () => t.http().post('/api/mounts/import').set(auth()).send({ file: csv })],
        [
          'multipart without a boundary',
          async () => t.http().post('/api/mounts/import').set(auth()).set('Content-Type', 'multipart/form-data').send(csv),
        ],
        [
          'cut-off multipart',
          async () =>
            t
              .http()
              .post('/api/mounts/import')
              .set(auth())
              .set('Content-Type', 'multipart/form-data; boundary=b')
              .send(`--b\r\nContent-Disposition: form-data; name="file"; filename="c.csv"\r\n\r\n${csv}`),
        ],
        [
          'the file in another field',
          async () => t.http().post('/api/mounts/import').set(auth()).attach('upload', Buffer.from(csv), 'c.csv'),
        ],
        [
          'two files',
          async () =>
            t
              .http()
              .post('/api/mounts/import')
              .set(auth())
              .attach('file', Buffer.from(csv), 'a.csv')
              .attach('file', Buffer.from(csv), 'b.csv'),
        ],
        [
          'eleven extra fields',
          async () => {
            let call = t.http().post('/api/mounts/import').set(auth());
            for (let i = 0; i < 11; i++) call = call.field(`f${i}`, 'x');
            return call.attach('file', Buffer.from(csv), 'c.csv');
          },
        ],
        ['an empty file', async () => upload(Buffer.alloc(0))],
        ['only byte-order marks and blank lines', async () => upload(Buffer.from('\ufeff\ufeff\n\r\n\n'))],
        ['a header and no rows', async () => upload(Buffer.from(`${SI_HEADER.join(',')}\r\n`))],
        [
          '65 columns',
          async () => upload(Buffer.from(`${[...SI_HEADER, ...Array.from({ length: 48 }, (_, i) => `extra_${i}`)].join(',')}\nx\n`)),
        ],
        ['a field over 1 MB', async () => upload(Buffer.from(`${SI_HEADER.join(',')}\n"${'x'.repeat(1_000_100)}"\n`))],
        [
          '1,200 invalid rows (problems capped)',
          async () =>
            upload(Buffer.from(csvOf(Array.from({ length: 1200 }, () => mountRow({ rated_load_n: '-1', damping_ratio: 'NaN' }))))),
        ],
        [
          'a valid row after 1,200 invalid ones',
          async () => upload(Buffer.from(csvOf([...Array.from({ length: 1200 }, () => mountRow({ rated_load_n: 'x' })), mountRow()]))),
        ],
      ];
      for (const [what, attempt] of attempts) {
        const response = await attempt();
        await check(what, response, false);
        expect({ what, refused: response.status >= 400 && response.status < 500 }).toEqual({ what, refused: true });
      }
    },
    fuzzTimeout(20),
  );
});
