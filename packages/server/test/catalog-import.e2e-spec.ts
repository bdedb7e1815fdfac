import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { jest } from '@jest/globals';
import { Logger } from '@nestjs/common';
import { parse } from 'csv-parse/sync';
import { DataSource, type EntityManager } from 'typeorm';
import { MountBatchWriter, type MountWrite } from '../src/catalog/import/mount-batch-writer.js';
import { MAX_UPLOAD_BYTES } from '../src/catalog/import/upload.js';
import { SI_HEADER, csvOf, example, mountRow } from './factories/catalog.factory.js';
import { createTestApp, makeTempDir, type TestApp } from './utils/create-test-app.js';

/** A writer that fails on its n-th batch once armed (the crash-mid-import test). */
class FailingBatchWriter extends MountBatchWriter {
  override readonly batchRows = 2;
  failOnCall: number | null = null;
  calls = 0;

  override async upsert(manager: EntityManager, rows: readonly MountWrite[]): Promise<void> {
    if (this.failOnCall !== null && ++this.calls === this.failOnCall) throw new Error('simulated failure: disk full');
    return super.upsert(manager, rows);
  }
}

const uploadsLeft = () => readdirSync(tmpdir()).filter((name) => name.startsWith('tacet-upload-')).length;

describe('catalog import (e2e)', () => {
  let t: TestApp;
  let token: string;
  const writer = new FailingBatchWriter();
  const auth = () => ({ Authorization: `Bearer ${token}` });

  const upload = (content: string | Buffer, { name = 'catalog.csv', query = '' } = {}) =>
    t
      .http()
      .post(`/api/mounts/import${query ? `?${query}` : ''}`)
      .set(auth())
      .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), name);
  const uploadExample = (name: string, query = '') => upload(readFileSync(example(name)), { name, query });

  /** Every stored row of the catalog tables, to prove that nothing changed. */
  const snapshot = async () => {
    const db = t.app.get(DataSource);
    return {
      mounts: await db.query('SELECT * FROM "mount" ORDER BY "id"'),
      suppliers: await db.query('SELECT * FROM "supplier" ORDER BY "id"'),
      imports: await db.query('SELECT * FROM "catalog_import" ORDER BY "id"'),
    };
  };
  const findMount = async (partNumber: string) => {
    const response = await t.http().get('/api/mounts').query({ q: partNumber, includeRetired: true }).set(auth()).expect(200);
    return response.body.items.find((m: { partNumber: string }) => m.partNumber === partNumber);
  };

  beforeAll(async () => {
    t = await createTestApp({ override: (builder) => builder.overrideProvider(MountBatchWriter).useValue(writer) });
    token = await t.loginAs('catalog_manager');
  });
  afterAll(() => t.close());

  describe('a good file', () => {
    it('dry run previews every row and writes nothing', async () => {
      const before = await snapshot();
      const response = await uploadExample('good-si.csv', 'dryRun=true').expect(200);
      expect(response.body).toMatchObject({
        accepted: 6,
        rejected: 0,
        created: 6,
        updated: 0,
        errors: [],
        errorsTruncated: false,
        importId: null,
      });
      expect(response.body.preview).toHaveLength(6);
      expect(response.body.preview[0]).toEqual({
        row: 2,
        action: 'create',
        supplierName: 'Wrenfield Example Mounts',
        partNumber: 'WX-S1-01200',
        series: 'S1',
        mountType: 'open_spring',
        ratedLoadN: 1200,
        verticalStiffnessNPerM: 40_000,
        horizontalStiffnessNPerM: 36_000,
        dynamicStiffnessRatio: 1,
        dampingModel: 'viscous',
        dampingRatio: 0.008,
        lossFactor: null,
        maxDeflectionMm: 45,
        tempMinC: -40,
        tempMaxC: 120,
        heightMm: 110,
        restraintCapacityN: null,
        upliftCapacityN: null,
        unitPrice: 42.5,
        currency: 'USD',
        leadTimeDays: 21,
      });
      expect(response.body.preview[3]).toMatchObject({
        partNumber: 'OX-E1-00800',
        dampingModel: 'hysteretic',
        lossFactor: 0.15,
        dampingRatio: null,
      });
      expect(await snapshot()).toEqual(before);
    });

    it('imports, creating the suppliers, and records who imported what', async () => {
      const response = await uploadExample('good-si.csv').expect(200);
      expect(response.body).toMatchObject({ accepted: 6, rejected: 0, created: 6, updated: 0, importId: expect.any(Number) });
      expect(await findMount('OX-W1-01000')).toMatchObject({
        supplier: { name: 'Oxlow Example Springs' },
        mountType: 'wire_rope',
        verticalStiffnessNPerM: 90_000,
        lossFactor: 0.2,
        currency: 'EUR',
        active: true,
      });
      const suppliers = (await t.http().get('/api/suppliers').set(auth()).expect(200)).body;
      expect(suppliers.find((s: { name: string }) => s.name === 'Oxlow Example Springs')).toMatchObject({ mountCount: 3, active: true });

      const history = (await t.http().get('/api/mounts/imports').set(auth()).expect(200)).body;
      expect(history[0]).toEqual({
        id: response.body.importId,
        fileName: 'good-si.csv',
        createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
        user: { id: expect.any(Number), name: 'Cato Catalog' },
        mode: 'all_or_nothing',
        accepted: 6,
        rejected: 0,
        created: 6,
        updated: 0,
        hasErrorReport: false,
      });
      expect(Date.now() - Date.parse(history[0].createdAt)).toBeLessThan(60_000);
      const report = await t.http().get(`/api/mounts/imports/${response.body.importId}/errors.csv`).set(auth());
      expect(report.status).toBe(404);
      expect(report.body).toEqual({ statusCode: 404, message: 'This import has no error report' });
    });

    it('updates the mounts with the same supplier and part number (upsert), supplier names matched regardless of case', async () => {
      const changed = readFileSync(example('good-si.csv'), 'utf8').replace(
        'Wrenfield Example Mounts,WX-S1-01200,S1,open_spring,1200,40,36,1,0.008,,45,-40,120,110,42.5,USD,21',
        'wrenfield  EXAMPLE mounts,WX-S1-01200,S1,open_spring,1250,41,36,1,0.009,,45,-40,120,110,44,USD,25',
      );
      const dry = await upload(changed, { query: 'dryRun=true' }).expect(200);
      expect(dry.body).toMatchObject({ created: 0, updated: 6 });
      expect(dry.body.preview.every((row: { action: string }) => row.action === 'update')).toBe(true);

      const response = await upload(changed).expect(200);
      expect(response.body).toMatchObject({ accepted: 6, created: 0, updated: 6 });
      expect(await findMount('WX-S1-01200')).toMatchObject({
        supplier: { name: 'Wrenfield Example Mounts' },
        ratedLoadN: 1250,
        verticalStiffnessNPerM: 41_000,
        dampingRatio: 0.009,
        unitPrice: 44,
        leadTimeDays: 25,
      });
      const suppliers = (await t.http().get('/api/suppliers').set(auth())).body as Array<{ name: string }>;
      expect(suppliers.filter((s) => s.name.toLowerCase() === 'wrenfield example mounts')).toHaveLength(1);
    });

    it('reads US customary columns into the same SI figures (within the rounding of the file)', async () => {
      await uploadExample('good-si.csv').expect(200);
      const si = await Promise.all(['WX-S1-01200', 'WX-H1-03000', 'OX-E1-00800', 'OX-P1-00300'].map(findMount));
      const response = await uploadExample('good-us.csv').expect(200);
      expect(response.body).toMatchObject({ accepted: 6, created: 0, updated: 6 });
      for (const before of si) {
        const after = await findMount(before.partNumber);
        for (const field of ['ratedLoadN', 'verticalStiffnessNPerM', 'horizontalStiffnessNPerM', 'maxDeflectionMm']) {
          // good-us.csv holds the SI figures converted and rounded to 4 decimals.
          expect(Math.abs(after[field] - before[field]) / before[field]).toBeLessThan(1e-4);
        }
        expect(after.dampingRatio).toBe(before.dampingRatio);
        expect(after.lossFactor).toBe(before.lossFactor);
      }
    });

    it('converts US columns exactly (NIST SP 811: 1 lbf = 4.4482216152605 N; 1 lbf/in = 175.1268… N/m; 1 in = 25.4 mm)', async () => {
      const csv =
        'supplier,part_number,mount_type,rated_load_lbf,vertical_stiffness_lbf_per_in,horizontal_stiffness_lbf_per_in,loss_factor,max_deflection_in\n' +
        'Unit Example Supplier,UX-1,wire_rope,1,1,10,0.2,1\n';
      await upload(csv).expect(200);
      const mount = await findMount('UX-1');
      expect(mount.ratedLoadN).toBe(4.4482216152605);
      expect(mount.verticalStiffnessNPerM).toBe(175.126835246476); // 4.4482216152605 / 0.0254 to 15 significant digits (no binary noise)
      expect(mount.verticalStiffnessNPerM).toBeCloseTo(175.1268352464764, 10);
      expect(mount.horizontalStiffnessNPerM).toBeCloseTo(1751.268352464764, 9);
      expect(mount.maxDeflectionMm).toBe(25.4);
    });

    it('records a file name in UTF-8 as the browser sends it', async () => {
      const response = await upload(csvOf([mountRow()]), { name: 'Übersicht — Federn.csv' }).expect(200);
      const history = (await t.http().get('/api/mounts/imports').set(auth())).body;
      expect(history.find((i: { id: number }) => i.id === response.body.importId).fileName).toBe('Übersicht — Federn.csv');
    });

    it('reads a CRLF file with a byte-order mark, quoted commas and doubled quotes', async () => {
      const response = await uploadExample('crlf-bom.csv').expect(200);
      expect(response.body).toMatchObject({ accepted: 3, rejected: 0, created: 3 });
      expect(await findMount('OC-P1-"00400"')).toMatchObject({
        supplier: { name: 'Oxlow Example Springs, Ltd.' },
        series: 'P1, soft',
        ratedLoadN: 400,
        verticalStiffnessNPerM: 200_000,
        unitPrice: 5.25,
      });
      expect(await findMount('OC-P1-00250')).toMatchObject({ unitPrice: 4.1, currency: 'EUR' });
    });

    it('stores formula payloads as plain text', async () => {
      const response = await uploadExample('formula-injection.csv').expect(200);
      expect(response.body).toMatchObject({ accepted: 3, created: 3 });
      expect(await findMount("=cmd|' /C calc'!A0")).toMatchObject({
        series: '+SUM(A1:A9)',
        supplier: { name: 'Wrenfield Example Mounts' },
      });
      expect(await findMount('@HYPERLINK(0)')).toMatchObject({ series: '-S9' });
      expect(await findMount('WF-S1-02000')).toMatchObject({ supplier: { name: '=2+5' } });
    });
  });

  describe('invalid rows', () => {
    const expectedErrors = [
      { row: 4, column: 'rated_load_n', message: 'must be a positive number (got "-3")' },
      { row: 4, column: 'damping_ratio', message: 'must be a number greater than 0 and less than 1 (got "1.5")' },
      { row: 5, column: 'mount_type', message: expect.stringMatching(/^must be one of elastomer_pad, .* \(got "spring"\)$/) },
      { row: 5, column: 'loss_factor', message: 'give damping_ratio or loss_factor, not both' },
      { row: 6, column: 'damping_ratio', message: 'give damping_ratio or loss_factor' },
      { row: 6, column: 'temp_min_c', message: 'must be below temp_max_c' },
      { row: 7, column: 'unit_price', message: 'must be zero or a positive number (got "-1")' },
      { row: 7, column: 'currency', message: 'must be a three-letter currency code such as USD (got "US$")' },
      { row: 7, column: 'lead_time_days', message: 'must be a whole number from 0 to 730 (got "3.5")' },
      { row: 8, column: 'part_number', message: 'repeats row 2 (same supplier and part number)' },
      { row: 9, column: 'supplier', message: 'is required' },
      {
        row: 9,
        column: 'vertical_stiffness_n_per_mm',
        message: 'must be a plain number with "." as the decimal point and no thousands separators (got "12,5")',
      },
      { row: 10, column: 'part_number', message: 'is longer than 80 characters' },
      { row: 11, column: '', message: 'the row has 2 fields; the header has 17' },
    ];

    it('all-or-nothing: 422 listing every problem of every row, nothing written', async () => {
      const before = await snapshot();
      const response = await uploadExample('bad-rows.csv');
      expect(response.status).toBe(422);
      expect(response.body).toMatchObject({
        statusCode: 422,
        message: '8 rows have problems; nothing was imported',
        accepted: 3,
        rejected: 8,
        created: 3,
        updated: 0,
        errorsTruncated: false,
        importId: null,
      });
      expect(response.body.errors).toEqual(expectedErrors);
      expect(response.body.preview.map((row: { row: number }) => row.row)).toEqual([2, 3, 12]);
      expect(await snapshot()).toEqual(before);
    });

    it('a dry run answers as the import would (422) and writes nothing', async () => {
      const before = await snapshot();
      const response = await uploadExample('bad-rows.csv', 'dryRun=true');
      expect(response.status).toBe(422);
      expect(response.body.errors).toEqual(expectedErrors);
      const skipPreview = await uploadExample('bad-rows.csv', 'dryRun=true&onInvalid=skip').expect(200);
      expect(skipPreview.body).toMatchObject({ accepted: 3, rejected: 8, created: 3, importId: null });
      expect(await snapshot()).toEqual(before);
    });

    it('"valid rows only" writes the valid rows and keeps the rest as a downloadable error CSV', async () => {
      const response = await uploadExample('bad-rows.csv', 'onInvalid=skip').expect(200);
      expect(response.body).toMatchObject({ accepted: 3, rejected: 8, created: 3, updated: 0, importId: expect.any(Number) });
      expect(response.body.errors).toEqual(expectedErrors);
      expect(await findMount('WB-S1-01000')).toMatchObject({ ratedLoadN: 1000 });
      expect(await findMount('OB-P1-00400')).toMatchObject({ lossFactor: 0.22 });
      expect(await findMount('WB-S1-01300')).toBeUndefined();

      const history = (await t.http().get('/api/mounts/imports').set(auth())).body;
      expect(history[0]).toMatchObject({
        id: response.body.importId,
        mode: 'skip_invalid',
        accepted: 3,
        rejected: 8,
        hasErrorReport: true,
      });

      const report = await t.http().get(`/api/mounts/imports/${response.body.importId}/errors.csv`).set(auth()).expect(200);
      expect(report.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(report.headers['content-disposition']).toBe(`attachment; filename="import-${response.body.importId}-errors.csv"`);
      const lines: string[][] = parse(report.text, { bom: true, relax_column_count: true });
      // the file's own header (bad-rows.csv predates the restraint columns)
      const fileHeader = readFileSync(example('bad-rows.csv'), 'utf8').split(/\r?\n/)[0].split(',');
      expect(lines[0]).toEqual(['row', 'column', 'message', ...fileHeader]);
      expect(lines.slice(1).map((line) => line[0])).toEqual(['4', '5', '6', '7', '8', '9', '10', '11']);
      expect(lines[1].slice(0, 4)).toEqual([
        '4',
        'rated_load_n; damping_ratio',
        'rated_load_n: must be a positive number (got "-3"); damping_ratio: must be a number greater than 0 and less than 1 (got "1.5")',
        'Wrenfield Example Mounts',
      ]);
      expect(lines[1][3 + fileHeader.indexOf('rated_load_n')]).toBe('-3'); // numbers are never guarded
      expect(lines[6][3 + fileHeader.indexOf('vertical_stiffness_n_per_mm')]).toBe('12,5');
    });

    it('caps the reported problems at 1000 and says so', async () => {
      const rows = Array.from({ length: 1200 }, () => mountRow({ supplier: 'Capped Example Supplier', rated_load_n: 'heavy' }));
      const response = await upload(csvOf(rows));
      expect(response.status).toBe(422);
      expect(response.body).toMatchObject({ accepted: 0, rejected: 1200, errorsTruncated: true });
      expect(response.body.errors).toHaveLength(1000);
    });
  });

  describe('files that are not a catalog CSV (422, nothing written)', () => {
    it.each<[string, string | Buffer, string, string, unknown[]]>([
      ['a spreadsheet file name', 'supplier\n', 'prices.xlsx', 'The file must be a CSV file (.csv or .txt); prices.xlsx is not', []],
      [
        'binary junk',
        Buffer.from(Array.from({ length: 8192 }, (_, i) => (i * 131 + 7) % 256)),
        'junk.csv',
        'The file is not a UTF-8 text CSV',
        [],
      ],
      ['UTF-16 text', Buffer.from('\ufeffsupplier,part_number\n', 'utf16le'), 'utf16.csv', 'The file is not a UTF-8 text CSV', []],
      ['an empty file', '', 'empty.csv', 'The file is empty', []],
      ['blank lines only', '\n \n\n', 'blank.txt', 'The file is empty', []],
      ['a header without rows', `${SI_HEADER.join(',')}\n`, 'header.csv', 'The file has a header but no mount rows', []],
      [
        'a blank first line above the header',
        `\n${SI_HEADER.join(',')}\n`,
        'late-header.csv',
        'Row 1 must be the header',
        [{ row: 1, column: '', message: 'row 1 must be the header; it is empty' }],
      ],
      [
        'broken quoting',
        `${SI_HEADER.join(',')}\n"unclosed,field\n`,
        'quotes.csv',
        'The file is not valid CSV (row 2: a quoted field is not closed (a closing " is missing))',
        [{ row: 2, column: '', message: 'a quoted field is not closed (a closing " is missing)' }],
      ],
      [
        'a header of 10,000 columns',
        `${Array.from({ length: 10_000 }, (_, i) => `c${i}`).join(',')}\n1\n`,
        'wide.csv',
        'The header (row 1) does not match the catalog format',
        [{ row: 1, column: '', message: 'the header has 10000 columns; a catalog file has at most 64 (see the format description)' }],
      ],
    ])('refuses %s', async (_case, content, name, message, errors) => {
      const before = await snapshot();
      const response = await upload(content, { name });
      expect(response.status).toBe(422);
      expect(response.body).toMatchObject({ statusCode: 422, message, accepted: 0, rejected: 0, importId: null, preview: [] });
      expect(response.body.errors).toEqual(errors);
      expect(await snapshot()).toEqual(before);
    });

    it('names every missing required column on row 1', async () => {
      const response = await uploadExample('missing-columns.csv');
      expect(response.status).toBe(422);
      expect(response.body.message).toBe('The header (row 1) does not match the catalog format');
      expect(response.body.errors).toEqual([
        { row: 1, column: 'mount_type', message: 'missing column' },
        {
          row: 1,
          column: 'vertical_stiffness_n_per_mm',
          message: 'missing column: give vertical_stiffness_n_per_mm or vertical_stiffness_lbf_per_in',
        },
      ]);
    });

    it('reports a row of 10,000 fields as a row problem', async () => {
      const row = Array.from({ length: 10_000 }, (_, i) => (i === 0 ? 'Wide Example Supplier' : 'x')).join(',');
      const response = await upload(`${csvOf([mountRow()])}${row}\n`);
      expect(response.status).toBe(422);
      expect(response.body).toMatchObject({ accepted: 1, rejected: 1 });
      expect(response.body.errors).toEqual([
        { row: 3, column: '', message: `the row has 10000 fields; the header has ${SI_HEADER.length}` },
      ]);
    });

    it('refuses a file over 20 MB with 413', async () => {
      const before = await snapshot();
      const response = await upload(Buffer.alloc(MAX_UPLOAD_BYTES + 1024, 'a'), { name: 'huge.csv' });
      expect(response.status).toBe(413);
      expect(response.body).toEqual({ statusCode: 413, message: 'The file is larger than 20 MB' });
      expect(await snapshot()).toEqual(before);
    });

    it('asks for the file when none is attached, and refuses bad query parameters (400)', async () => {
      const none = await t.http().post('/api/mounts/import').set(auth()).send({});
      expect(none.status).toBe(400);
      expect(none.body).toEqual({ statusCode: 400, message: 'Attach the CSV file as the multipart field "file"' });

      const bad = await upload(csvOf([mountRow()]), { query: 'onInvalid=ignore&dryRun=maybe' });
      expect(bad.status).toBe(400);
      expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['dryRun', 'onInvalid']);
    });

    it('deletes every uploaded file afterwards, whatever the outcome', async () => {
      const before = uploadsLeft();
      await uploadExample('good-si.csv', 'dryRun=true').expect(200);
      await uploadExample('bad-rows.csv').expect(422);
      await upload(csvOf([mountRow()]), { query: 'dryRun=nope' }).expect(400);
      await upload('x', { name: 'x.pdf' }).expect(422);
      expect(uploadsLeft()).toBe(before);
    });
  });

  it('a failure part-way through the write leaves the catalog exactly as it was, with no import recorded', async () => {
    await uploadExample('good-si.csv').expect(200);
    const before = await snapshot();
    // Two updates of existing mounts, then new mounts of a new supplier: 7 rows, batches of 2.
    const rows = [
      mountRow({ supplier: 'Wrenfield Example Mounts', part_number: 'WX-S1-01200', unit_price: '99' }),
      mountRow({ supplier: 'Wrenfield Example Mounts', part_number: 'WX-S1-02400', unit_price: '99' }),
      ...Array.from({ length: 5 }, () => mountRow({ supplier: 'Crash Example Supplier' })),
    ];
    const logged = jest.spyOn(Logger.prototype, 'error').mockImplementation(() => undefined);
    writer.calls = 0;
    writer.failOnCall = 3;
    try {
      const response = await upload(csvOf(rows));
      expect(response.status).toBe(500);
      expect(response.body).toEqual({ statusCode: 500, message: 'Internal server error' });
      expect(writer.calls).toBe(3); // two batches were written before the failure
    } finally {
      writer.failOnCall = null;
      logged.mockRestore();
    }
    expect(await snapshot()).toEqual(before);

    // The same file goes through once the failure is gone.
    const retry = await upload(csvOf(rows)).expect(200);
    expect(retry.body).toMatchObject({ created: 5, updated: 2 });
  });
});

describe('demo catalog seeding (e2e)', () => {
  it('imports the 500 demo mounts once, as the admin, and a second boot on the same data adds nothing', async () => {
    const dataDir = makeTempDir();
    try {
      const first = await createTestApp({ dataDir });
      const admin = await first.loginAs('admin');
      const count = async (t: TestApp) =>
        (
          await t
            .http()
            .get('/api/mounts')
            .query({ pageSize: 1, includeRetired: true })
            .set({ Authorization: `Bearer ${admin}` })
        ).body.total;
      expect(await count(first)).toBe(500);
      const history = (
        await first
          .http()
          .get('/api/mounts/imports')
          .set({ Authorization: `Bearer ${admin}` })
      ).body;
      expect(history).toEqual([
        expect.objectContaining({ fileName: 'demo-mounts.csv', user: expect.objectContaining({ name: 'Ada Admin' }), created: 500 }),
      ]);
      const suppliers = (
        await first
          .http()
          .get('/api/suppliers')
          .set({ Authorization: `Bearer ${admin}` })
      ).body;
      expect(suppliers).toHaveLength(5);
      expect(suppliers.find((s: { name: string }) => s.name === 'Quillmere Isolation')).toMatchObject({
        contactEmail: 'quotes@quillmere.example',
        phone: '+1 555 0101',
      });
      expect(suppliers.reduce((sum: number, s: { mountCount: number }) => sum + s.mountCount, 0)).toBe(500);
      await first.close();

      const second = await createTestApp({ dataDir });
      try {
        expect(await count(second)).toBe(500);
        expect(
          (
            await second
              .http()
              .get('/api/mounts/imports')
              .set({ Authorization: `Bearer ${admin}` })
          ).body,
        ).toHaveLength(1);
        expect(
          (
            await second
              .http()
              .get('/api/suppliers')
              .set({ Authorization: `Bearer ${admin}` })
          ).body,
        ).toHaveLength(5);
      } finally {
        await second.close();
      }
    } finally {
      rmSync(dataDir, { recursive: true, force: true });
    }
  });

  it('reads the demo files from TACET_DEMO_CATALOG_DIR when set', async () => {
    const dir = makeTempDir();
    mkdirSync(dir, { recursive: true });
    writeFileSync(join(dir, 'demo-suppliers.csv'), 'name,contact_email,phone\nOther Example Supplier,desk@other.example,+1 555 0199\n');
    writeFileSync(
      join(dir, 'demo-mounts.csv'),
      csvOf([mountRow({ supplier: 'Other Example Supplier' }), mountRow({ supplier: 'Other Example Supplier' })]),
    );
    const previous = process.env.TACET_DEMO_CATALOG_DIR;
    process.env.TACET_DEMO_CATALOG_DIR = dir;
    let t: TestApp | undefined;
    try {
      t = await createTestApp();
      const token = await t.loginAs('viewer');
      const suppliers = (
        await t
          .http()
          .get('/api/suppliers')
          .set({ Authorization: `Bearer ${token}` })
      ).body;
      expect(suppliers).toEqual([
        expect.objectContaining({ name: 'Other Example Supplier', contactEmail: 'desk@other.example', mountCount: 2 }),
      ]);
    } finally {
      if (previous === undefined) delete process.env.TACET_DEMO_CATALOG_DIR;
      else process.env.TACET_DEMO_CATALOG_DIR = previous;
      await t?.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
