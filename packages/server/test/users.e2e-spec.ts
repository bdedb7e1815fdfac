import { createTestApp, type TestApp } from './utils/create-test-app.js';

describe('users (e2e)', () => {
  let t: TestApp;
  let admin: string;
  let adminId: number;
  const auth = () => ({ Authorization: `Bearer ${admin}` });
  let counter = 0;
  const newUser = (overrides: object = {}) => ({
    email: `person${++counter}@example.test`,
    name: `Person ${counter}`,
    role: 'engineer',
    password: 'a long password',
    ...overrides,
  });

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.loginAs('admin');
    adminId = (await t.http().get('/api/auth/me').set(auth())).body.id;
  });
  afterAll(() => t.close());

  it('GET /api/users lists every user sorted by email, without hashes', async () => {
    const response = await t.http().get('/api/users').set(auth()).expect(200);
    const emails = response.body.map((user: { email: string }) => user.email);
    expect(emails).toEqual([...emails].sort());
    expect(emails).toEqual(expect.arrayContaining(['admin@tacet.test', 'viewer@tacet.test', 'checker@tacet.test']));
    for (const user of response.body) {
      expect(Object.keys(user).sort()).toEqual(
        ['active', 'createdAt', 'email', 'id', 'mustChangePassword', 'name', 'role', 'unitSystem', 'updatedAt'].sort(),
      );
    }
  });

  it('POST /api/users creates a user (email normalised, SI by default) who can sign in', async () => {
    const response = await t
      .http()
      .post('/api/users')
      .set(auth())
      .send(newUser({ email: '  Nora.New@Example.TEST ', name: 'Nora New', role: 'purchaser' }))
      .expect(201);
    expect(response.body).toMatchObject({
      id: expect.any(Number),
      email: 'nora.new@example.test',
      name: 'Nora New',
      role: 'purchaser',
      unitSystem: 'SI',
      active: true,
    });
    await t.login('nora.new@example.test', 'a long password');
    const fetched = await t.http().get(`/api/users/${response.body.id}`).set(auth()).expect(200);
    expect(fetched.body).toEqual(response.body);
  });

  it('refuses a duplicate email, whatever its case, with 409', async () => {
    const response = await t
      .http()
      .post('/api/users')
      .set(auth())
      .send(newUser({ email: 'VIEWER@tacet.test' }));
    expect(response.status).toBe(409);
    expect(response.body).toEqual({ statusCode: 409, message: 'A user with this email already exists' });
  });

  it.each<[string, object, string]>([
    ['an invalid email', { email: 'nobody-at-example' }, 'email'],
    ['an unknown role', { role: 'superuser' }, 'role'],
    ['an unknown unit system', { unitSystem: 'imperial' }, 'unitSystem'],
    ['a short password', { password: 'short' }, 'password'],
    ['an over-long name', { name: 'n'.repeat(201) }, 'name'],
    ['an over-long email', { email: `${'e'.repeat(195)}@example.test` }, 'email'],
    ['a blank name', { name: '   ' }, 'name'],
    ['a number for the name', { name: 12 }, 'name'],
    ['an unknown field', { isAdmin: true }, 'isAdmin'],
    ['a field the server sets itself', { active: false }, 'active'],
  ])('POST /api/users answers 400 for %s', async (_case, overrides, field) => {
    const response = await t.http().post('/api/users').set(auth()).send(newUser(overrides));
    expect(response.status).toBe(400);
    expect(response.body.message).toBe('Validation failed');
    expect(response.body.errors.map((e: { field: string }) => e.field)).toContain(field);
  });

  it('PATCH /api/users/:id changes name, role, unit system and active', async () => {
    const created = (await t.http().post('/api/users').set(auth()).send(newUser()).expect(201)).body;
    const response = await t
      .http()
      .patch(`/api/users/${created.id}`)
      .set(auth())
      .send({ name: 'Renamed', role: 'viewer', unitSystem: 'US', active: false })
      .expect(200);
    expect(response.body).toMatchObject({
      id: created.id,
      email: created.email,
      name: 'Renamed',
      role: 'viewer',
      unitSystem: 'US',
      active: false,
    });

    for (const body of [
      { email: 'new@example.test' },
      { password: 'a long password' },
      { role: 'root' },
      { active: 'no' },
      // null is not "absent": these fields cannot be cleared (a 400, not a NOT NULL failure)
      { name: null },
      { role: null },
      { active: null },
      { unitSystem: null },
    ]) {
      const bad = await t.http().patch(`/api/users/${created.id}`).set(auth()).send(body);
      expect(bad.status).toBe(400);
      expect(bad.body.errors[0].field).toBe(Object.keys(body)[0]);
    }
  });

  it('does not let an admin deactivate themselves or drop their own admin role (409)', async () => {
    const deactivate = await t.http().patch(`/api/users/${adminId}`).set(auth()).send({ active: false });
    expect(deactivate.body).toEqual({ statusCode: 409, message: 'You cannot deactivate your own account' });
    const demote = await t.http().patch(`/api/users/${adminId}`).set(auth()).send({ role: 'viewer' });
    expect(demote.body).toEqual({ statusCode: 409, message: 'You cannot remove your own admin role' });
    const remove = await t.http().delete(`/api/users/${adminId}`).set(auth());
    expect(remove.status).toBe(409);
    const me = await t.http().get('/api/auth/me').set(auth()).expect(200);
    expect(me.body).toMatchObject({ role: 'admin', active: true });
  });

  it('DELETE /api/users/:id deactivates: the user stays listed, cannot sign in, and the old token stops working', async () => {
    const created = (await t.http().post('/api/users').set(auth()).send(newUser()).expect(201)).body;
    const token = await t.login(created.email, 'a long password');
    await t
      .http()
      .get('/api/auth/me')
      .set({ Authorization: `Bearer ${token}` })
      .expect(200);

    const response = await t.http().delete(`/api/users/${created.id}`).set(auth()).expect(200);
    expect(response.body).toMatchObject({ id: created.id, active: false });

    const listed = (await t.http().get('/api/users').set(auth())).body.find((u: { id: number }) => u.id === created.id);
    expect(listed).toMatchObject({ active: false });
    await t.http().post('/api/auth/login').send({ email: created.email, password: 'a long password' }).expect(401);
    const old = await t
      .http()
      .get('/api/auth/me')
      .set({ Authorization: `Bearer ${token}` });
    expect(old.status).toBe(401);

    // Reactivation restores access.
    await t.http().patch(`/api/users/${created.id}`).set(auth()).send({ active: true }).expect(200);
    await t
      .http()
      .get('/api/auth/me')
      .set({ Authorization: `Bearer ${token}` })
      .expect(200);
  });

  it('answers 404 for an unknown id and 400 for a non-numeric one', async () => {
    const missing = await t.http().get('/api/users/999999').set(auth());
    expect(missing.body).toEqual({ statusCode: 404, message: 'User not found' });
    await t.http().patch('/api/users/999999').set(auth()).send({}).expect(404);
    await t.http().delete('/api/users/999999').set(auth()).expect(404);
    const bad = await t.http().get('/api/users/abc').set(auth());
    expect(bad.status).toBe(400);
    expect(bad.body.statusCode).toBe(400);
  });

  it('a role change takes effect on the next request with the same token', async () => {
    const created = (
      await t
        .http()
        .post('/api/users')
        .set(auth())
        .send(newUser({ role: 'admin' }))
        .expect(201)
    ).body;
    const token = await t.login(created.email, 'a long password');
    await t
      .http()
      .get('/api/users')
      .set({ Authorization: `Bearer ${token}` })
      .expect(200);
    await t.http().patch(`/api/users/${created.id}`).set(auth()).send({ role: 'viewer' }).expect(200);
    await t
      .http()
      .get('/api/users')
      .set({ Authorization: `Bearer ${token}` })
      .expect(403);
  });
});
