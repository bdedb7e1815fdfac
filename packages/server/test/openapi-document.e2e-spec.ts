import type { OpenAPIObject } from '@nestjs/swagger';
import { createOpenApiDocument } from '../src/app.factory.js';
import { createDesign, createRfqCatalog, releaseDesign, type TestCatalog, type TestDesign } from './factories/review.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { conformanceProblems, responseSchema, untypedAnswers, weakSchemaProblems } from './utils/openapi-conformance.js';

/**
 * The OpenAPI document is the contract the web's types are generated from (tools/api-types):
 * it must type every answer precisely, and the server's real answers must match it.
 */
describe('OpenAPI document (e2e)', () => {
  let t: TestApp;
  let document: OpenAPIObject;
  const tokens: Record<string, string> = {};
  let catalog: TestCatalog;
  let draft: TestDesign;
  let released: TestDesign;
  let mountId: number;

  beforeAll(async () => {
    t = await createTestApp();
    document = createOpenApiDocument(t.app);
    for (const role of ['admin', 'engineer', 'purchaser', 'catalog_manager'] as const) tokens[role] = await t.loginAs(role);
    tokens.checker = await t.login('checker@tacet.test', 'tacet-demo');
    catalog = await createRfqCatalog(t, tokens.catalog_manager, 'quotes@contract-test.invalid');
    mountId = catalog.mountId;
    draft = await createDesign(t, tokens.engineer, catalog);
    released = await createDesign(t, tokens.engineer, catalog);
    await releaseDesign(t, released.id, tokens.engineer, tokens.checker);
  });

  afterAll(() => t.close());

  /** Calls the route and checks its answer against the contract's schema for that status. */
  async function expectConforming(
    who: string,
    method: 'get' | 'post',
    template: string,
    path = template,
    body?: object,
    status = method === 'post' ? 201 : 200,
  ): Promise<unknown> {
    const request = t
      .http()
      [method](path)
      .set({ Authorization: `Bearer ${tokens[who]}` });
    const response = body ? await request.send(body) : await request;
    expect({ path, status: response.status }).toEqual({ path, status });
    expect(conformanceProblems(document, responseSchema(document, method, template, status), response.body)).toEqual([]);
    return response.body;
  }

  it('declares a typed body for every successful answer that has one', () => {
    expect(untypedAnswers(document)).toEqual([]);
  });

  it('types every schema, property, parameter and body, and names every enum', () => {
    expect(weakSchemaProblems(document)).toEqual([]);
  });

  it('documents the error body once, as ApiErrorDto', () => {
    const schemas = document.components?.schemas ?? {};
    expect(schemas.ApiErrorDto).toMatchObject({ required: ['statusCode', 'message'] });
    expect(Object.keys(schemas)).toEqual(expect.arrayContaining(['MountType', 'DesignStatus', 'RfqStatus', 'Role']));
  });

  it('finds departures from a schema (the checker itself)', () => {
    const schema = responseSchema(document, 'get', '/api/mounts/{id}', 200);
    expect(conformanceProblems(document, schema, { id: 1 })).toContain('$.partNumber: required, but missing');
    const problems = conformanceProblems(document, { $ref: '#/components/schemas/SupplierRefDto' }, { id: null, name: 'x', extra: 1 });
    expect(problems).toEqual(['$.id: null, but not nullable in the contract', '$.extra: not in the contract']);

    const weak = {
      openapi: '3.0.0',
      info: { title: 'weak', version: '0' },
      paths: {
        '/a': { get: { responses: { 200: { description: 'no body declared' } } } },
        '/b': { delete: { responses: { 204: { description: 'no body' } } } },
      },
      components: {
        schemas: {
          Weak: {
            type: 'object',
            properties: { kind: { type: 'string', enum: ['x', 'y'] }, bag: { type: 'object' }, list: { type: 'array' }, any: {} },
          },
        },
      },
    } as unknown as OpenAPIObject;
    expect(untypedAnswers(weak)).toEqual(['GET /a 200']);
    expect(weakSchemaProblems(weak)).toEqual([
      'Weak.kind: inline enum (x, y); give it an enumName',
      'Weak.bag: an object with no properties',
      'Weak.list: an array with no item type',
      'Weak.any: no type',
    ]);
  });

  it('matches the answers about people and sign-in', async () => {
    await expectConforming('admin', 'get', '/api/users');
    await expectConforming('engineer', 'get', '/api/auth/me');
    const login = await t.http().post('/api/auth/login').send({ email: 'viewer@tacet.test', password: 'tacet-demo' });
    expect(conformanceProblems(document, responseSchema(document, 'post', '/api/auth/login', 200), login.body)).toEqual([]);
  });

  it('matches the answers about suppliers, mounts and imports', async () => {
    await expectConforming('engineer', 'get', '/api/suppliers');
    await expectConforming('engineer', 'get', '/api/mounts', '/api/mounts?pageSize=50&includeRetired=true');
    await expectConforming('engineer', 'get', '/api/mounts/{id}', `/api/mounts/${mountId}`);
    await expectConforming('catalog_manager', 'get', '/api/mounts/imports');
  });

  it('matches the answers about projects, designs, selection and review', async () => {
    const projects = (await expectConforming('engineer', 'get', '/api/projects')) as { id: number }[];
    for (const project of projects.slice(0, 3)) {
      const designs = (await expectConforming('engineer', 'get', '/api/projects/{id}/designs', `/api/projects/${project.id}/designs`)) as {
        id: number;
      }[];
      for (const listed of designs.slice(0, 3)) await expectConforming('engineer', 'get', '/api/designs/{id}', `/api/designs/${listed.id}`);
    }
    const path = `/api/designs/${draft.id}/selection`;
    await expectConforming('engineer', 'post', '/api/designs/{id}/selection', path, { limit: 5 }, 200);
    await expectConforming(
      'engineer',
      'post',
      '/api/selection',
      '/api/selection',
      {
        limit: 5,
        components: [{ name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 } }],
        mountPoints: [
          { label: 'A', x: 0.8, y: 0.45, z: 0 },
          { label: 'B', x: 0.8, y: -0.45, z: 0 },
          { label: 'C', x: -0.8, y: 0.45, z: 0 },
          { label: 'D', x: -0.8, y: -0.45, z: 0 },
        ],
        disturbingFrequenciesHz: [24.67, 49.33],
        criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1, supplierIds: [catalog.supplier.id] },
      },
      200,
    );
    await expectConforming('engineer', 'get', '/api/designs/{id}/history', `/api/designs/${released.id}/history`);
  });

  it('matches the answers about purchasing and the outbox', async () => {
    const rfqs = `/api/designs/${released.id}/rfqs`;
    await expectConforming('purchaser', 'post', '/api/designs/{id}/rfqs', rfqs, { supplierId: catalog.supplier.id });
    await expectConforming('purchaser', 'get', '/api/designs/{id}/rfqs', rfqs);
    await expectConforming('purchaser', 'get', '/api/purchasing/designs');
    const outbox = (await expectConforming('admin', 'get', '/api/outbox')) as { id: number }[];
    expect(outbox.length).toBeGreaterThan(0);
    await expectConforming('admin', 'get', '/api/outbox/{id}', `/api/outbox/${outbox[0].id}`);
  });
});
