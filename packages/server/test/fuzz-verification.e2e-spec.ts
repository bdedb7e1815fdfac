import fc from 'fast-check';
import { linSpace, sdofFrf, viscousDamping } from '@tacet/vibration';
import type { Response } from 'supertest';
import { createDesign, createRfqCatalog, releaseDesign } from './factories/review.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { changedTables, dbFingerprint, type DbFingerprint } from './utils/db-fingerprint.js';
import {
  EDGE_NUMBERS,
  FORMULA_PAYLOADS,
  NUMERIC_TEXT,
  UNICODE_SAMPLES,
  fuzzParameters,
  fuzzTimeout,
  FUZZ_RUNS,
} from './utils/hostile-input.js';

/**
 * Hostile files and fields against the tap-test upload (POST /api/designs/:id/verifications):
 * random bytes, and CSV built from the real headers (PRODUCT.md "As-built verification") with
 * hostile cells, shuffled or upper-case names, odd line ends, and hostile multipart fields. For
 * every upload: never a 5xx; a 4xx answers the JSON error shape (with `errors` as (row,
 * column, message) on a 422) and changes nothing; a 201 adds exactly one measurement, which the
 * list then shows.
 */

const HEADERS = [
  ['frequency_hz', 'real', 'imag'],
  ['frequency_hz', 'magnitude', 'phase_deg'],
  ['time_s', 'force_n', 'acceleration_m_s2'],
];

/** A clean FRF of a 1000 kg system near the test design's 3.18 Hz, as rows of text. */
function cleanRows(header: string[]): string[][] {
  const f = linSpace(0.5, 12, 70);
  const c = sdofFrf({ massKg: 1000, stiffnessNPerM: 4.2e5, damping: viscousDamping(0.05) }, 'receptance', f);
  return Array.from(f, (fi, i) => {
    if (header[0] === 'time_s') return [String(i / 64), String(i === 3 ? 500 : 0), String(Math.sin(i))];
    return header[1] === 'real'
      ? [String(fi), String(c.re[i]), String(c.im[i])]
      : [String(fi), String(c.magnitude[i]), String(c.phaseDeg[i])];
  });
}

const hostileCell: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(...NUMERIC_TEXT),
  fc.constantFrom(...EDGE_NUMBERS.map(String), '1e308', '-1e308', '1e-320', '9'.repeat(400), '-5', '0', '-0.0', 'NaN', 'Infinity'),
  fc.constantFrom(...FORMULA_PAYLOADS),
  fc.constantFrom(...UNICODE_SAMPLES.filter((text) => !/\p{Surrogate}/u.test(text))),
  fc.constantFrom('"', '""', 'a"b', 'multi\nline', ',', ' ', ''),
  fc.string({ maxLength: 12 }),
);

const fieldValue = (valid: string[]) =>
  fc.oneof({ weight: 4, arbitrary: fc.constantFrom(...valid) }, { weight: 1, arbitrary: hostileCell });

/** `arbitrary` about once in `every` runs, null otherwise. */
const sometimes = <T>(arbitrary: fc.Arbitrary<T>, every: number): fc.Arbitrary<T | null> =>
  fc.oneof({ weight: every - 1, arbitrary: fc.constant(null) }, { weight: 1, arbitrary });

const fileArb = fc.record({
  header: fc.constantFrom(...HEADERS),
  shuffle: fc.boolean(),
  upper: fc.boolean(),
  extra: sometimes(fc.constantFrom('comment', 'frequency_hz', ' ', '=cmd'), 8),
  hostile: sometimes(fc.array(fc.tuple(fc.nat({ max: 69 }), fc.nat({ max: 2 }), hostileCell), { minLength: 1, maxLength: 3 }), 2),
  swap: sometimes(fc.nat({ max: 68 }), 6),
  truncate: sometimes(fc.integer({ min: 0, max: 69 }), 6),
  delimiter: fc.constantFrom('\n', '\r\n', '\r'),
  bom: fc.boolean(),
  /** null: the kind the header belongs to, and receptance for an FRF (the clean data are receptance). */
  kind: sometimes(fieldValue(['frf', 'impact']), 6),
  quantity: sometimes(fieldValue(['receptance', 'mobility', 'accelerance']), 4),
  tolerancePct: sometimes(fieldValue(['10', '5', '25']), 3),
});

type FileSpec = typeof fileArb extends fc.Arbitrary<infer T> ? T : never;

function build(spec: FileSpec): Buffer {
  const order = spec.shuffle ? [2, 0, 1] : [0, 1, 2];
  const header = order.map((i) => spec.header[i]);
  if (spec.extra !== null) header.push(spec.extra);
  const rows = cleanRows(spec.header);
  for (const [row, column, cell] of spec.hostile ?? []) rows[row][column] = cell;
  if (spec.swap !== null) [rows[spec.swap], rows[spec.swap + 1]] = [rows[spec.swap + 1], rows[spec.swap]];
  const kept = spec.truncate === null ? rows : rows.slice(0, spec.truncate);
  const quote = (cell: string) => (/[",\r\n]/.test(cell) ? `"${cell.replace(/"/g, '""')}"` : cell);
  const lines = [
    (spec.upper ? header.map((h) => h.toUpperCase()) : header).map(quote).join(','),
    ...kept.map((row) => [...order.map((i) => row[i]), ...(spec.extra !== null ? [''] : [])].map(quote).join(',')),
  ];
  return Buffer.from(`${spec.bom ? '\ufeff' : ''}${lines.join(spec.delimiter)}${spec.delimiter}`, 'utf8');
}

describe('hostile tap-test uploads (e2e)', () => {
  let t: TestApp;
  let token: string;
  let designId: number;
  let last: DbFingerprint;

  beforeAll(async () => {
    t = await createTestApp();
    token = await t.loginAs('engineer');
    const checker = await t.login('checker@tacet.test', 'tacet-demo');
    const catalog = await createRfqCatalog(t, await t.loginAs('catalog_manager'), null);
    const design = await createDesign(t, token, catalog);
    await releaseDesign(t, design.id, token, checker);
    designId = design.id;
    last = await dbFingerprint(t);
  }, 120_000);
  afterAll(() => t?.close());

  const count = async () =>
    (await t.http().get(`/api/designs/${designId}/verifications`).set('Authorization', `Bearer ${token}`)).body.length as number;

  /** The invariants of every answer (see the file comment). */
  const check = async (response: Response, what: string, before: number): Promise<void> => {
    const detail = `${what} → ${response.status} ${response.text.slice(0, 300)}`;
    if (response.status >= 500) throw new Error(`5xx: ${detail}`);
    const now = await dbFingerprint(t);
    if (response.status >= 400) {
      const body = response.body as { statusCode?: unknown; message?: unknown; errors?: unknown };
      if (body.statusCode !== response.status || typeof body.message !== 'string')
        throw new Error(`4xx without the JSON error shape: ${detail}`);
      if (response.status === 422) {
        const errors = body.errors as Array<Record<string, unknown>>;
        if (
          !Array.isArray(errors) ||
          errors.some((e) => typeof e.row !== 'number' || typeof e.column !== 'string' || typeof e.message !== 'string')
        ) {
          throw new Error(`422 without (row, column, message) problems: ${detail}`);
        }
      }
      const changed = changedTables(last, now);
      if (changed.length > 0) throw new Error(`a refused upload changed ${changed.join(', ')}: ${detail}`);
    } else {
      expect(response.status).toBe(201);
      expect(await count()).toBe(before + 1);
      expect(changedTables(last, now)).toEqual(['design_verification']);
    }
    last = now;
  };

  const send = (bytes: Buffer, fields: Record<string, string | null>) => {
    let request = t.http().post(`/api/designs/${designId}/verifications`).set('Authorization', `Bearer ${token}`);
    for (const [name, value] of Object.entries(fields)) if (value !== null) request = request.field(name, value);
    return request.attach('file', bytes, 'fuzz.csv');
  };

  it(
    'answers random bytes without a 5xx and stores nothing',
    async () => {
      await fc.assert(
        fc.asyncProperty(fc.uint8Array({ maxLength: 3000 }), fc.constantFrom('frf', 'impact'), async (bytes, kind) => {
          const before = await count();
          await check(
            await send(Buffer.from(bytes), { kind, quantity: kind === 'frf' ? 'receptance' : null }),
            `${bytes.length} random bytes`,
            before,
          );
        }),
        fuzzParameters(),
      );
    },
    fuzzTimeout(FUZZ_RUNS * 3),
  );

  it(
    'answers hostile CSV and fields without a 5xx; a refused one stores nothing, an accepted one exactly one measurement',
    async () => {
      await fc.assert(
        fc.asyncProperty(fileArb, async (spec) => {
          const before = await count();
          const own = spec.header[0] === 'time_s' ? 'impact' : 'frf';
          const fields = {
            kind: spec.kind ?? own,
            quantity: spec.quantity ?? (own === 'frf' ? 'receptance' : null),
            tolerancePct: spec.tolerancePct,
          };
          await check(await send(build(spec), fields), `a file ${JSON.stringify(spec).slice(0, 200)}`, before);
        }),
        fuzzParameters(3),
      );
    },
    fuzzTimeout(FUZZ_RUNS * 9),
  );
});
