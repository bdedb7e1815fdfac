import { createTestApp, type TestApp } from './utils/create-test-app.js';

describe('suppliers (e2e)', () => {
  let t: TestApp;
  let manager: string;
  let viewer: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    t = await createTestApp();
    manager = await t.loginAs('catalog_manager');
    viewer = await t.loginAs('viewer');
  });
  afterAll(() => t.close());

  it('GET /api/suppliers lists the demo suppliers sorted by name, with their active mount counts', async () => {
    const response = await t.http().get('/api/suppliers').set(as(viewer)).expect(200);
    const names = response.body.map((s: { name: string }) => s.name);
    expect(names.slice(0, 5)).toEqual([
      'Brightholm Mounting',
      'Calderfen Resilient Works',
      'Norrwick Spring & Wire',
      'Quillmere Isolation',
      'Tamberlin Elastics',
    ]);
    expect(Object.keys(response.body[0]).sort()).toEqual(
      ['active', 'contactEmail', 'createdAt', 'id', 'mountCount', 'name', 'notes', 'phone', 'updatedAt'].sort(),
    );
    expect(response.body.reduce((sum: number, s: { mountCount: number }) => sum + s.mountCount, 0)).toBe(500);
    expect(response.body[2]).toMatchObject({ contactEmail: 'orders@norrwick.example', phone: '+1 555 0103', notes: null, active: true });
  });

  it('POST creates a supplier (trimmed, spaces collapsed) that GET returns', async () => {
    const response = await t
      .http()
      .post('/api/suppliers')
      .set(as(manager))
      .send({
        name: '  Fenwood   Example Mounts ',
        contactEmail: ' rfq@fenwood.example ',
        phone: '+44 20 7946 0000',
        notes: 'Ships from Leeds',
      })
      .expect(201);
    expect(response.body).toMatchObject({
      name: 'Fenwood Example Mounts',
      contactEmail: 'rfq@fenwood.example',
      phone: '+44 20 7946 0000',
      notes: 'Ships from Leeds',
      active: true,
      mountCount: 0,
    });
    const fetched = await t.http().get(`/api/suppliers/${response.body.id}`).set(as(viewer)).expect(200);
    expect(fetched.body).toEqual(response.body);
  });

  it('refuses a duplicate name, whatever its case and spacing (409)', async () => {
    const response = await t.http().post('/api/suppliers').set(as(manager)).send({ name: 'quillmere  ISOLATION' });
    expect(response.status).toBe(409);
    expect(response.body).toEqual({ statusCode: 409, message: 'A supplier with this name already exists' });
  });

  it.each<[string, object, string]>([
    ['no name', {}, 'name'],
    ['a blank name', { name: '   ' }, 'name'],
    ['an over-long name', { name: 'n'.repeat(121) }, 'name'],
    ['a bad email', { name: 'Mailless Example', contactEmail: 'not-an-email' }, 'contactEmail'],
    ['a bad phone', { name: 'Phoneless Example', phone: 'call <script>' }, 'phone'],
    ['over-long notes', { name: 'Notes Example', notes: 'x'.repeat(2001) }, 'notes'],
    ['an unknown field', { name: 'Field Example', website: 'x' }, 'website'],
  ])('POST answers 400 for %s', async (_case, body, field) => {
    const response = await t.http().post('/api/suppliers').set(as(manager)).send(body);
    expect(response.status).toBe(400);
    expect(response.body.errors.map((e: { field: string }) => e.field)).toContain(field);
  });

  it('PATCH renames, clears contact details with null, retires and restores', async () => {
    const { body: supplier } = await t
      .http()
      .post('/api/suppliers')
      .set(as(manager))
      .send({ name: 'Patchable Example', contactEmail: 'a@patchable.example', phone: '+1 555 0100' })
      .expect(201);
    const patched = await t
      .http()
      .patch(`/api/suppliers/${supplier.id}`)
      .set(as(manager))
      .send({ name: 'Patched Example', contactEmail: null, phone: '' })
      .expect(200);
    expect(patched.body).toMatchObject({ name: 'Patched Example', contactEmail: null, phone: null });

    const clash = await t.http().patch(`/api/suppliers/${supplier.id}`).set(as(manager)).send({ name: 'Tamberlin Elastics' });
    expect(clash.status).toBe(409);
    const own = await t.http().patch(`/api/suppliers/${supplier.id}`).set(as(manager)).send({ name: 'PATCHED example' }).expect(200);
    expect(own.body.name).toBe('PATCHED example');

    await t.http().patch(`/api/suppliers/${supplier.id}`).set(as(manager)).send({ active: false }).expect(200);
    expect((await t.http().get(`/api/suppliers/${supplier.id}`).set(as(viewer))).body.active).toBe(false);
    await t.http().patch(`/api/suppliers/${supplier.id}`).set(as(manager)).send({ active: true }).expect(200);

    for (const body of [{ name: null }, { active: 'no' }, { active: null }]) {
      const bad = await t.http().patch(`/api/suppliers/${supplier.id}`).set(as(manager)).send(body);
      expect(bad.status).toBe(400);
    }
  });

  it('answers 404 for an unknown id, 400 for a non-numeric one, and 403 to a viewer writing', async () => {
    expect((await t.http().get('/api/suppliers/999999').set(as(viewer))).body).toEqual({ statusCode: 404, message: 'Supplier not found' });
    await t.http().patch('/api/suppliers/999999').set(as(manager)).send({}).expect(404);
    await t.http().get('/api/suppliers/abc').set(as(viewer)).expect(400);
    await t.http().post('/api/suppliers').set(as(viewer)).send({ name: 'Viewer Example' }).expect(403);
  });
});
