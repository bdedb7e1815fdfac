import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { withoutBinaryNoise } from '@tacet/vibration';
import { DataSource } from 'typeorm';
import { Mount } from '../src/catalog/mount.entity.js';
import { SI_HEADER, csvOf, example, mountBody, mountRow } from './factories/catalog.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

interface MountJson {
  id: number;
  supplier: { id: number; name: string };
  partNumber: string;
  series: string | null;
  mountType: string;
  ratedLoadN: number;
  unitPrice: number | null;
  leadTimeDays: number | null;
  dampingModel: string;
  dampingRatio: number | null;
  lossFactor: number | null;
  active: boolean;
  updatedAt: string;
  [field: string]: unknown;
}

const MOUNT_KEYS = [
  'id',
  'supplier',
  'partNumber',
  'series',
  'mountType',
  'ratedLoadN',
  'verticalStiffnessNPerM',
  'horizontalStiffnessNPerM',
  'dynamicStiffnessRatio',
  'dampingModel',
  'dampingRatio',
  'lossFactor',
  'maxDeflectionMm',
  'tempMinC',
  'tempMaxC',
  'heightMm',
  'restraintCapacityN',
  'upliftCapacityN',
  'unitPrice',
  'currency',
  'leadTimeDays',
  'active',
  'createdAt',
  'updatedAt',
].sort();

describe('catalog (e2e)', () => {
  let t: TestApp;
  let manager: string;
  let viewer: string;
  let supplierId: number;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const search = (query: Record<string, unknown>, token = viewer) => t.http().get('/api/mounts').query(query).set(as(token));
  const upload = (content: string | Buffer, query = '') =>
    t
      .http()
      .post(`/api/mounts/import${query}`)
      .set(as(manager))
      .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), 'catalog.csv');

  beforeAll(async () => {
    t = await createTestApp();
    manager = await t.loginAs('catalog_manager');
    viewer = await t.loginAs('viewer');
    const created = await t.http().post('/api/suppliers').set(as(manager)).send({ name: 'Api Example Supplier' }).expect(201);
    supplierId = created.body.id;
  });
  afterAll(() => t.close());

  describe('GET /api/mounts', () => {
    it('pages the demo catalog, sorted by supplier then part number by default', async () => {
      const response = await search({}).expect(200);
      expect(response.body.total).toBe(500);
      expect(response.body.items).toHaveLength(50);
      const first: MountJson = response.body.items[0];
      expect(Object.keys(first).sort()).toEqual(MOUNT_KEYS);
      expect(first.supplier.name).toBe('Brightholm Mounting');
      const keys = response.body.items.map((m: MountJson) => [m.supplier.name.toLowerCase(), m.partNumber]);
      expect(keys).toEqual([...keys].sort((a, b) => (a[0] === b[0] ? (a[1] < b[1] ? -1 : 1) : a[0] < b[0] ? -1 : 1)));

      const big = await search({ pageSize: 100 }).expect(200);
      const second = await search({ page: 2, pageSize: 50 }).expect(200);
      expect(second.body.items.map((m: MountJson) => m.id)).toEqual(big.body.items.slice(50).map((m: MountJson) => m.id));
      const last = await search({ page: 10, pageSize: 50 }).expect(200);
      expect(last.body.items).toHaveLength(50);
      expect((await search({ page: 11 }).expect(200)).body).toEqual({ items: [], total: 500 });
    });

    it('q matches part number, series and supplier name, case-insensitively; wildcards are literal', async () => {
      const byPart = await search({ q: 'qm-s1-0', pageSize: 500 }).expect(200);
      expect(byPart.body.total).toBeGreaterThan(0);
      expect(byPart.body.items.every((m: MountJson) => m.partNumber.toLowerCase().includes('qm-s1-0'))).toBe(true);
      const bySupplier = await search({ q: 'NORRWICK spring', pageSize: 500 }).expect(200);
      expect(bySupplier.body.total).toBeGreaterThan(0);
      expect(bySupplier.body.items.every((m: MountJson) => m.supplier.name === 'Norrwick Spring & Wire')).toBe(true);
      const { body: mount } = await t
        .http()
        .post('/api/mounts')
        .set(as(manager))
        .send(mountBody(supplierId, { partNumber: 'SER-1', series: 'Zetaline' }))
        .expect(201);
      const bySeries = await search({ q: 'ZETAL' }).expect(200);
      expect(bySeries.body.items.map((m: MountJson) => m.id)).toEqual([mount.id]);
      expect((await search({ q: '%' }).expect(200)).body.total).toBe(0);
      expect((await search({ q: '_' }).expect(200)).body.total).toBe(0);
    });

    it('filters by type (repeated or comma-separated), supplier and rated load range, with sort', async () => {
      const springs = await search({ type: 'open_spring,housed_spring', pageSize: 500 }).expect(200);
      const repeated = await t.http().get('/api/mounts?type=open_spring&type=housed_spring&pageSize=500').set(as(viewer)).expect(200);
      expect(repeated.body.total).toBe(springs.body.total);
      expect(new Set(springs.body.items.map((m: MountJson) => m.mountType))).toEqual(new Set(['open_spring', 'housed_spring']));

      const ranged = await search({ minLoadN: 2000, maxLoadN: 5000, sort: '-ratedLoadN', pageSize: 500 }).expect(200);
      const loads = ranged.body.items.map((m: MountJson) => m.ratedLoadN);
      expect(loads.every((load: number) => load >= 2000 && load <= 5000)).toBe(true);
      expect(loads).toEqual([...loads].sort((a, b) => b - a));

      const someSupplier = springs.body.items[0].supplier;
      const bySupplier = await search({
        supplierId: someSupplier.id,
        type: 'open_spring',
        q: 's1',
        minLoadN: 1000,
        sort: 'unitPrice',
      }).expect(200);
      expect(bySupplier.body.items.every((m: MountJson) => m.supplier.id === someSupplier.id && m.mountType === 'open_spring')).toBe(true);
      const prices = bySupplier.body.items.map((m: MountJson) => m.unitPrice);
      expect(prices).toEqual([...prices].sort((a, b) => a - b));
    });

    it('sorts empty values last in both directions', async () => {
      const created = await t
        .http()
        .post('/api/mounts')
        .set(as(manager))
        .send(mountBody(supplierId, { unitPrice: null }))
        .expect(201);
      for (const sort of ['unitPrice', '-unitPrice']) {
        const page = await search({ supplierId, sort, pageSize: 500 }).expect(200);
        expect(page.body.items.at(-1).id).toBe(created.body.id);
      }
    });

    it.each<[string, Record<string, unknown>, string]>([
      ['page 0', { page: 0 }, 'page'],
      ['a fractional page', { page: 1.5 }, 'page'],
      ['pageSize over 500', { pageSize: 501 }, 'pageSize'],
      ['an unknown type', { type: 'open_spring,spring' }, 'type'],
      ['an unknown sort field', { sort: 'colour' }, 'sort'],
      ['a sort with spaces', { sort: 'supplier, -ratedLoadN' }, 'sort'],
      ['a non-numeric load', { minLoadN: 'heavy' }, 'minLoadN'],
      ['a negative load', { maxLoadN: -1 }, 'maxLoadN'],
      ['a non-numeric supplier id', { supplierId: 'x' }, 'supplierId'],
      ['includeRetired not true/false', { includeRetired: 'yes' }, 'includeRetired'],
      ['an inverted load range', { minLoadN: 5000, maxLoadN: 1000 }, 'maxLoadN'],
      ['an unknown parameter', { colour: 'red' }, 'colour'],
    ])('answers 400 for %s', async (_case, query, field) => {
      const response = await search(query);
      expect(response.status).toBe(400);
      expect(response.body.message).toBe('Validation failed');
      expect(response.body.errors.map((e: { field: string }) => e.field)).toContain(field);
    });
  });

  describe('create, edit, retire', () => {
    it('POST creates a mount with defaults; GET returns it', async () => {
      const response = await t
        .http()
        .post('/api/mounts')
        .set(as(manager))
        .send(mountBody(supplierId, { partNumber: '  AX-1 ', currency: 'eur' }))
        .expect(201);
      expect(response.body).toMatchObject({
        supplier: { id: supplierId, name: 'Api Example Supplier' },
        partNumber: 'AX-1',
        mountType: 'housed_spring',
        dynamicStiffnessRatio: null, // not given: none stored (docs/engineering/selection.md §14)
        dampingModel: 'viscous',
        dampingRatio: 0.03,
        lossFactor: null,
        horizontalStiffnessNPerM: null,
        currency: 'EUR',
        active: true,
      });
      const fetched = await t.http().get(`/api/mounts/${response.body.id}`).set(as(viewer)).expect(200);
      expect(fetched.body).toEqual(response.body);
    });

    it('refuses a second mount with the same supplier and part number (409)', async () => {
      await t
        .http()
        .post('/api/mounts')
        .set(as(manager))
        .send(mountBody(supplierId, { partNumber: 'AX-DUP' }))
        .expect(201);
      const response = await t
        .http()
        .post('/api/mounts')
        .set(as(manager))
        .send(mountBody(supplierId, { partNumber: 'AX-DUP' }));
      expect(response.status).toBe(409);
      expect(response.body).toEqual({ statusCode: 409, message: 'This supplier already has a mount with part number AX-DUP' });
    });

    it.each<[string, object, string]>([
      ['both damping figures', { lossFactor: 0.2 }, 'lossFactor'],
      ['no damping figure', { dampingRatio: null }, 'dampingRatio'],
      ['a damping ratio of 1', { dampingRatio: 1 }, 'dampingRatio'],
      ['a loss factor over 2', { dampingRatio: null, lossFactor: 2.1 }, 'lossFactor'],
      ['a zero load', { ratedLoadN: 0 }, 'ratedLoadN'],
      ['a string load', { ratedLoadN: '2000' }, 'ratedLoadN'],
      ['an unknown mount type', { mountType: 'spring' }, 'mountType'],
      ['a dynamic ratio of 6', { dynamicStiffnessRatio: 6 }, 'dynamicStiffnessRatio'],
      ['min temperature above max', { tempMinC: 100, tempMaxC: 50 }, 'tempMinC'],
      ['a temperature of 300 °C', { tempMaxC: 300 }, 'tempMaxC'],
      ['a fractional lead time', { leadTimeDays: 1.5 }, 'leadTimeDays'],
      ['a bad currency', { currency: 'EURO' }, 'currency'],
      ['a negative price', { unitPrice: -1 }, 'unitPrice'],
      ['an over-long part number', { partNumber: 'P'.repeat(81) }, 'partNumber'],
      ['an unknown supplier', { supplierId: 999_999 }, 'supplierId'],
      ['a field the server sets', { active: false }, 'active'],
    ])('POST answers 400 for %s', async (_case, overrides, field) => {
      const response = await t.http().post('/api/mounts').set(as(manager)).send(mountBody(supplierId, overrides));
      expect(response.status).toBe(400);
      expect(response.body.errors.map((e: { field: string }) => e.field)).toContain(field);
    });

    it('PATCH changes fields, clears optional ones with null, and switches the damping model', async () => {
      const { body: mount } = await t
        .http()
        .post('/api/mounts')
        .set(as(manager))
        .send(mountBody(supplierId, { unitPrice: 10 }))
        .expect(201);
      const patched = await t
        .http()
        .patch(`/api/mounts/${mount.id}`)
        .set(as(manager))
        .send({ lossFactor: 0.18, unitPrice: null, series: null, ratedLoadN: 2100 })
        .expect(200);
      expect(patched.body).toMatchObject({
        dampingModel: 'hysteretic',
        lossFactor: 0.18,
        dampingRatio: null,
        unitPrice: null,
        series: null,
        ratedLoadN: 2100,
      });
      expect(Date.parse(patched.body.updatedAt)).toBeGreaterThanOrEqual(Date.parse(mount.updatedAt));

      for (const [body, field] of [
        [{ ratedLoadN: null }, 'ratedLoadN'],
        [{ dampingRatio: 0.02, lossFactor: 0.1 }, 'lossFactor'],
        [{ lossFactor: null }, 'dampingRatio'],
        [{ tempMinC: 50, tempMaxC: 40 }, 'tempMinC'],
        [{ partNumber: '' }, 'partNumber'],
      ] as const) {
        const bad = await t.http().patch(`/api/mounts/${mount.id}`).set(as(manager)).send(body);
        expect(bad.status).toBe(400);
        expect(bad.body.errors.map((e: { field: string }) => e.field)).toContain(field);
      }
      await t
        .http()
        .post('/api/mounts')
        .set(as(manager))
        .send(mountBody(supplierId, { partNumber: 'AX-TAKEN' }))
        .expect(201);
      const clash = await t.http().patch(`/api/mounts/${mount.id}`).set(as(manager)).send({ partNumber: 'AX-TAKEN' });
      expect(clash.status).toBe(409);
    });

    it('DELETE retires: hidden from searches unless asked for, restored with PATCH active:true', async () => {
      const { body: mount } = await t
        .http()
        .post('/api/mounts')
        .set(as(manager))
        .send(mountBody(supplierId, { partNumber: 'AX-RETIRE' }))
        .expect(201);
      const retired = await t.http().delete(`/api/mounts/${mount.id}`).set(as(manager)).expect(200);
      expect(retired.body).toMatchObject({ id: mount.id, active: false });
      expect((await search({ q: 'AX-RETIRE' })).body.total).toBe(0);
      expect((await search({ q: 'AX-RETIRE', includeRetired: true })).body.items[0]).toMatchObject({ id: mount.id, active: false });
      await t.http().get(`/api/mounts/${mount.id}`).set(as(viewer)).expect(200);
      await t.http().patch(`/api/mounts/${mount.id}`).set(as(manager)).send({ active: true }).expect(200);
      expect((await search({ q: 'AX-RETIRE' })).body.total).toBe(1);
    });

    it('answers 404 for an unknown id and 400 for a non-numeric one', async () => {
      expect((await t.http().get('/api/mounts/999999').set(as(viewer))).body).toEqual({ statusCode: 404, message: 'Mount not found' });
      await t.http().patch('/api/mounts/999999').set(as(manager)).send({}).expect(404);
      await t.http().delete('/api/mounts/999999').set(as(manager)).expect(404);
      await t.http().get('/api/mounts/abc').set(as(viewer)).expect(400);
    });

    it('lets a viewer read but not write (403)', async () => {
      await t.http().post('/api/mounts').set(as(viewer)).send(mountBody(supplierId)).expect(403);
      await t.http().get('/api/mounts/export.csv').set(as(viewer)).expect(200);
    });
  });

  it('documents every catalog route and shape in the OpenAPI document', async () => {
    const document = (await t.http().get('/api/docs-json').expect(200)).body;
    expect(Object.keys(document.paths)).toEqual(
      expect.arrayContaining([
        '/api/mounts',
        '/api/mounts/{id}',
        '/api/mounts/import',
        '/api/mounts/imports',
        '/api/mounts/imports/{id}/errors.csv',
        '/api/mounts/export.csv',
        '/api/suppliers',
        '/api/suppliers/{id}',
      ]),
    );
    const schemas = document.components.schemas;
    expect(Object.keys(schemas.MountDto.properties).sort()).toEqual(MOUNT_KEYS);
    expect(schemas.MountDto.properties.mountType).toMatchObject({ allOf: [{ $ref: '#/components/schemas/MountType' }] });
    expect(schemas.MountType.enum).toHaveLength(7);
    expect(Object.keys(schemas.ImportResultDto.properties).sort()).toEqual([
      'accepted',
      'created',
      'errors',
      'errorsTruncated',
      'importId',
      'newSuppliers',
      'preview',
      'rejected',
      'updated',
    ]);
    const importRoute = document.paths['/api/mounts/import'].post;
    expect(Object.keys(importRoute.requestBody.content)).toEqual(['multipart/form-data']);
    expect(importRoute.parameters.map((p: { name: string }) => p.name).sort()).toEqual(['dryRun', 'onInvalid']);
    expect(importRoute.responses['422'].content['application/json'].schema).toEqual({ $ref: '#/components/schemas/ImportRejectedDto' });
    const searchParams = document.paths['/api/mounts'].get.parameters.map((p: { name: string }) => p.name).sort();
    expect(searchParams).toEqual(['includeRetired', 'maxLoadN', 'minLoadN', 'page', 'pageSize', 'q', 'sort', 'supplierId', 'type']);
    expect(Object.keys(schemas.CreateMountDto.properties)).not.toContain('active');
    expect(schemas.CreateMountDto.required.sort()).toEqual([
      'mountType',
      'partNumber',
      'ratedLoadN',
      'supplierId',
      'verticalStiffnessNPerM',
    ]);
    expect(schemas.UpdateMountDto.required).toBeUndefined();
  });

  describe('GET /api/mounts/export.csv', () => {
    const exportCsv = async () => {
      const response = await t
        .http()
        .get('/api/mounts/export.csv')
        .set(as(viewer))
        .buffer(true)
        .parse((res, done) => {
          const chunks: Buffer[] = [];
          res.on('data', (chunk: Buffer) => chunks.push(chunk));
          res.on('end', () => done(null, Buffer.concat(chunks)));
        });
      expect(response.status).toBe(200);
      return { response, bytes: response.body as Buffer };
    };

    it('writes the active catalog in the import format, as an attachment', async () => {
      const { response, bytes } = await exportCsv();
      expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
      const today = new Date().toISOString().slice(0, 10);
      expect(response.headers['content-disposition']).toBe(`attachment; filename="tacet-catalog-${today}.csv"`);
      expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
      const rows: string[][] = parse(bytes, { bom: true });
      expect(rows[0]).toEqual([...SI_HEADER]);
      const active = (await search({ pageSize: 1 })).body.total;
      expect(rows.length - 1).toBe(active);
      const demo = rows.find((row) => row[1] === 'QM-P1-00160');
      expect(demo).toEqual([
        'Quillmere Isolation',
        'QM-P1-00160',
        'P1',
        'elastomer_pad',
        '160',
        '52.07',
        '20.01',
        '1.98',
        '',
        '0.248',
        '4.9',
        '-30',
        '80',
        '12',
        '',
        '',
        '4.27',
        'USD',
        '8',
      ]);
      // demo restrained springs carry (invented) restraint ratings
      const restrained = rows.find((row) => row[1] === 'QM-R1-05050');
      expect(restrained?.slice(14, 16)).toEqual(['6220', '4500']);
    });

    it('guards text against spreadsheet formulas, never numbers, and the import reads it back as the same text', async () => {
      await upload(readFileSync(example('formula-injection.csv'))).expect(200);
      const { bytes } = await exportCsv();
      const rows: string[][] = parse(bytes, { bom: true });
      const payload = rows.find((row) => row[1] === "'=cmd|' /C calc'!A0");
      expect(payload).toBeDefined();
      expect(payload?.[2]).toBe("'+SUM(A1:A9)");
      expect(payload?.[11]).toBe('-40'); // temp_min_c
      expect(rows.find((row) => row[1] === "'@HYPERLINK(0)")?.[2]).toBe("'-S9");
      expect(rows.find((row) => row[1] === 'WF-S1-02000')?.[0]).toBe("'=2+5");
      expect(rows.flat().filter((cell) => /^[=+@\t\r]/.test(cell) || /^-(?!\d)/.test(cell))).toEqual([]);
    });

    it('round-trips: export → dry run → 0 created, N updated, 0 errors; importing it changes no figure', async () => {
      // Mounts from US columns and from the API hold values that N/mm text must carry exactly.
      await upload(readFileSync(example('good-us.csv'))).expect(200);
      await upload(readFileSync(example('crlf-bom.csv'))).expect(200);
      const typed = await t
        .http()
        .post('/api/mounts')
        .set(as(manager))
        .send(mountBody(supplierId, { verticalStiffnessNPerM: 123_456.789_012_345_6, horizontalStiffnessNPerM: Math.PI * 1e4 }))
        .expect(201);
      const figures = async () =>
        (
          await t.app
            .get(DataSource)
            .createQueryBuilder()
            .select('*')
            .from(Mount, 'm')
            .where('m.active = :active', { active: true })
            .orderBy('m.id')
            .getRawMany()
        ).map(({ updatedAt: _updatedAt, ...rest }: Record<string, unknown>) => rest);
      const before = await figures();
      const { bytes } = await exportCsv();
      const rowCount = parse(bytes, { bom: true }).length - 1;

      const dry = await upload(bytes, '?dryRun=true').expect(200);
      expect(dry.body).toMatchObject({ accepted: rowCount, rejected: 0, created: 0, updated: rowCount, errors: [] });

      await upload(bytes).expect(200);
      // Numbers are written to 15 significant digits (FORMAT.md): a figure typed into the API with
      // more digits reads back equal to 15 digits; every other figure reads back exactly.
      const after = await figures();
      const fifteen = (value: unknown) => (typeof value === 'number' ? withoutBinaryNoise(value) : value);
      const typedAfter = after.find((m) => m.id === typed.body.id)!;
      const typedBefore = before.find((m) => m.id === typed.body.id)!;
      expect(Object.fromEntries(Object.entries(typedAfter).map(([k, v]) => [k, fifteen(v)]))).toEqual(
        Object.fromEntries(Object.entries(typedBefore).map(([k, v]) => [k, fifteen(v)])),
      );
      expect(typedAfter.verticalStiffnessNPerM).toBe(123_456.789_012_346);
      expect(after.filter((m) => m.id !== typed.body.id)).toEqual(before.filter((m) => m.id !== typed.body.id));
    });

    it('writes the columns of the reader’s units, or both; each export imports back to the same figures (round trip)', async () => {
      await upload(readFileSync(example('good-us.csv'))).expect(200);
      const download = async (query: string, token = viewer) =>
        (
          await t
            .http()
            .get(`/api/mounts/export.csv${query}`)
            .set(as(token))
            .buffer(true)
            .parse((res, done) => {
              const chunks: Buffer[] = [];
              res.on('data', (chunk: Buffer) => chunks.push(chunk));
              res.on('end', () => done(null, Buffer.concat(chunks)));
            })
            .expect(200)
        ).body as Buffer;
      const figures = async () =>
        (
          await t.app
            .get(DataSource)
            .getRepository(Mount)
            .find({ where: { active: true }, order: { id: 'ASC' } })
        ).map(({ updatedAt: _updatedAt, ...rest }) => rest);
      const before = await figures();

      const us = await download('?units=US');
      const usHeader: string[] = parse(us, { bom: true })[0];
      expect(usHeader).toEqual(
        expect.arrayContaining([
          'rated_load_lbf',
          'vertical_stiffness_lbf_per_in',
          'max_deflection_in',
          'temp_min_f',
          'temp_max_f',
          'height_in',
        ]),
      );
      expect(usHeader.filter((name) => /_(n|mm|c|n_per_mm)$/.test(name))).toEqual([]);
      // a US customary reader gets the same file without asking
      await t.http().patch('/api/auth/me').set(as(viewer)).send({ unitSystem: 'US' }).expect(200);
      expect(parse(await download(''), { bom: true })[0]).toEqual(usHeader);
      await t.http().patch('/api/auth/me').set(as(viewer)).send({ unitSystem: 'SI' }).expect(200);
      expect(us.toString('utf8')).not.toMatch(/\d\.\d{16,}|\d{17,}/); // no binary noise: at most 15 significant digits

      const rowCount = parse(us, { bom: true }).length - 1;
      expect((await upload(us, '?dryRun=true').expect(200)).body).toMatchObject({
        accepted: rowCount,
        created: 0,
        updated: rowCount,
        errors: [],
      });
      await upload(us).expect(200);
      // US customary figures read back to within the 15 digits written (conversions: NIST SP 811, exact factors)
      const afterUs = await figures();
      afterUs.forEach((mount, i) => {
        for (const [key, value] of Object.entries(mount)) {
          const was = (before[i] as Record<string, unknown>)[key];
          if (typeof value === 'number' && typeof was === 'number')
            expect(Math.abs(value - was)).toBeLessThanOrEqual(Math.abs(was) * 1e-13);
          else expect(value).toEqual(was);
        }
      });

      const both = await download('?units=both');
      const bothHeader: string[] = parse(both, { bom: true })[0];
      expect(bothHeader.slice(4, 6)).toEqual(['rated_load_n', 'rated_load_lbf']);
      expect(bothHeader).toEqual(expect.arrayContaining(['temp_min_c', 'temp_min_f', 'height_mm', 'height_in']));
      const stored = await figures();
      expect((await upload(both, '?dryRun=true').expect(200)).body).toMatchObject({ accepted: rowCount, updated: rowCount, errors: [] });
      await upload(both).expect(200);
      expect(await figures()).toEqual(stored); // both columns agree; the SI one is kept, exactly

      const refused = await t.http().get('/api/mounts/export.csv?units=metric').set(as(viewer)).expect(400);
      expect(JSON.stringify(refused.body)).toContain('Units must be SI, US or both');
    });

    it('round-trips the restraint ratings given in N and in lbf (exact factor 1 lbf = 4.4482216152605 N, NIST SP 811)', async () => {
      const header = ['supplier', 'part_number', 'mount_type', 'rated_load_n', 'vertical_stiffness_n_per_mm', 'damping_ratio'];
      await upload(
        csvOf(
          [
            {
              supplier: 'Restraint Example Supplier',
              part_number: 'RS-N',
              mount_type: 'restrained_spring',
              rated_load_n: '5000',
              vertical_stiffness_n_per_mm: '100',
              damping_ratio: '0.02',
              restraint_capacity_n: '9000.5',
              uplift_capacity_n: '4500',
            },
          ],
          [...header, 'restraint_capacity_n', 'uplift_capacity_n'],
        ),
      ).expect(200);
      await upload(
        csvOf(
          [
            {
              supplier: 'Restraint Example Supplier',
              part_number: 'RS-LBF',
              mount_type: 'restrained_spring',
              rated_load_n: '5000',
              vertical_stiffness_n_per_mm: '100',
              damping_ratio: '0.02',
              restraint_capacity_lbf: '2000',
              uplift_capacity_lbf: '1011.6',
            },
          ],
          [...header, 'restraint_capacity_lbf', 'uplift_capacity_lbf'],
        ),
      ).expect(200);
      const stored = async (part: string) => (await search({ q: part })).body.items.find((m: MountJson) => m.partNumber === part);
      expect(await stored('RS-N')).toMatchObject({ restraintCapacityN: 9000.5, upliftCapacityN: 4500 });
      expect(await stored('RS-LBF')).toMatchObject({
        restraintCapacityN: 2000 * 4.4482216152605,
        upliftCapacityN: 4499.82098599752, // 1011.6 × 4.4482216152605 to 15 significant digits (no binary noise)
      });

      // the export writes N; importing it back changes nothing, and an lbf file written from it reads back the same figures
      const rows: string[][] = parse((await exportCsv()).bytes, { bom: true });
      const column = (name: string) => rows[0].indexOf(name);
      const exported = (part: string) => rows.find((row) => row[1] === part) as string[];
      expect(exported('RS-N')[column('restraint_capacity_n')]).toBe('9000.5');
      expect(exported('RS-N')[column('uplift_capacity_n')]).toBe('4500');
      expect(Number(exported('RS-LBF')[column('restraint_capacity_n')])).toBe(2000 * 4.4482216152605);
      expect(exported('RS-LBF')[column('uplift_capacity_n')]).toBe('4499.82098599752');
      const mine = rows.filter((row) => row[0] === 'Restraint Example Supplier');
      const n = rows[0].map((name, i) => [name, i] as const);
      const si = csvOf(
        mine.map((row) => Object.fromEntries(n.map(([name, i]) => [name, row[i]]))),
        rows[0],
      );
      expect((await upload(si, '?dryRun=true').expect(200)).body).toMatchObject({ accepted: 2, created: 0, updated: 2, errors: [] });
      await upload(si).expect(200);
      expect(await stored('RS-LBF')).toMatchObject({
        restraintCapacityN: 2000 * 4.4482216152605,
        upliftCapacityN: 4499.82098599752, // 1011.6 × 4.4482216152605 to 15 significant digits (no binary noise)
      });
      const usHeader = rows[0].map((name) => name.replace(/^(restraint|uplift)_capacity_n$/, '$1_capacity_lbf'));
      const us = csvOf(
        mine.map((row) =>
          Object.fromEntries(
            usHeader.map((name, i) => [name, /_capacity_lbf$/.test(name) && row[i] ? String(Number(row[i]) / 4.4482216152605) : row[i]]),
          ),
        ),
        usHeader,
      );
      await upload(us).expect(200);
      for (const [part, restraint, uplift] of [
        ['RS-N', 9000.5, 4500],
        ['RS-LBF', 2000 * 4.4482216152605, 1011.6 * 4.4482216152605],
      ] as const) {
        const mount = await stored(part);
        expect(Math.abs(mount.restraintCapacityN / restraint - 1)).toBeLessThan(1e-14);
        expect(Math.abs(mount.upliftCapacityN / uplift - 1)).toBeLessThan(1e-14);
      }
    });

    it('leaves out retired mounts and the mounts of retired suppliers', async () => {
      const { body: supplier } = await t
        .http()
        .post('/api/suppliers')
        .set(as(manager))
        .send({ name: 'Retiring Example Supplier' })
        .expect(201);
      await upload(csvOf([mountRow({ supplier: 'Retiring Example Supplier', part_number: 'RX-1' })])).expect(200);
      const has = async (part: string) => parse((await exportCsv()).bytes, { bom: true }).some((row: string[]) => row[1] === part);
      expect(await has('RX-1')).toBe(true);
      await t.http().patch(`/api/suppliers/${supplier.id}`).set(as(manager)).send({ active: false }).expect(200);
      expect(await has('RX-1')).toBe(false);
      expect((await search({ q: 'RX-1' })).body.total).toBe(0);
      expect((await search({ q: 'RX-1', includeRetired: true })).body.total).toBe(1);
    });
  });
});
