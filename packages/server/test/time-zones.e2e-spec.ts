import { readFileSync } from 'node:fs';
import { example } from './factories/catalog.factory.js';
import { createDesign, createRfqCatalog, releaseDesign } from './factories/review.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

/**
 * Times are instants whatever the time zones around the server. The PostgreSQL pass runs the
 * API process in a zone ahead of UTC (TZ=Asia/Kolkata, +05:30, no daylight saving; set by
 * tools/run-tests.mjs) against a cluster whose own time zone is behind UTC (America/St_Johns,
 * tools/pg/test-postgres.mjs); the SQLite pass runs in the machine's zone. Stamps the database
 * makes (`now()`) and dates the server writes must both come back as the instant they stand for.
 */
/** Slack for the stamp of "now": far below the hours of offset this test is about. */
const SLACK_MS = 60_000;

describe('time zones (e2e)', () => {
  let t: TestApp;
  const tokens: Record<string, string> = {};
  const as = (who: string) => ({ Authorization: `Bearer ${tokens[who]}` });

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ['admin', 'engineer', 'purchaser', 'catalog_manager'] as const) tokens[role] = await t.loginAs(role);
    tokens.checker = await t.login('checker@tacet.test', 'tacet-demo');
  });
  afterAll(() => t.close());

  const expectNow = (iso: string, before: number, after: number) => {
    const at = Date.parse(iso);
    expect(iso).toMatch(/Z$/);
    expect(at).toBeGreaterThanOrEqual(before - SLACK_MS);
    expect(at).toBeLessThanOrEqual(after + SLACK_MS);
  };

  it('stamps a new project and a catalog import with the current instant', async () => {
    const before = Date.now();
    const project = await t.http().post('/api/projects').set(as('engineer')).send({ name: 'Time zone check' }).expect(201);
    await t
      .http()
      .post('/api/mounts/import')
      .set(as('catalog_manager'))
      .attach('file', readFileSync(example('good-si.csv')), 'good-si.csv')
      .expect(200);
    const after = Date.now();
    expectNow(project.body.createdAt, before, after);
    expectNow(project.body.updatedAt, before, after);
    const [latest] = (await t.http().get('/api/mounts/imports').set(as('catalog_manager')).expect(200)).body;
    expect(latest.fileName).toBe('good-si.csv');
    expectNow(latest.createdAt, before, after);
  });

  it('gives back a quote date as it was sent', async () => {
    const catalog = await createRfqCatalog(t, tokens.catalog_manager, 'quotes@zones-test.invalid');
    const design = await createDesign(t, tokens.engineer, catalog);
    await releaseDesign(t, design.id, tokens.engineer, tokens.checker);
    const rfq = await t
      .http()
      .post(`/api/designs/${design.id}/rfqs`)
      .set(as('purchaser'))
      .send({ supplierId: catalog.supplier.id })
      .expect(201);
    const quotedAt = '2026-01-15T23:45:00.000Z'; // a different calendar day in Kolkata and in St. John's
    const quoted = await t
      .http()
      .patch(`/api/rfqs/${rfq.body.id}`)
      .set(as('purchaser'))
      .send({ status: 'quoted', lines: [{ lineId: rfq.body.lines[0].id, unitPrice: 25 }], quotedAt })
      .expect(200);
    expect(quoted.body.quotedAt).toBe(quotedAt);
    const list = await t.http().get(`/api/designs/${design.id}/rfqs`).set(as('purchaser')).expect(200);
    expect(list.body.find((r: { id: number }) => r.id === rfq.body.id).quotedAt).toBe(quotedAt);
  });
});
