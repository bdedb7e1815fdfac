import { AppConfig } from '../src/config/app-config.js';
import { DEMO_PASSWORD } from '../src/config/environment.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { decodePayload, nowSeconds, signHs256, unsignedToken } from './utils/tokens.js';

const LOGIN_FAILED = { statusCode: 401, message: 'Email or password is incorrect' };

describe('auth (e2e)', () => {
  let t: TestApp;
  let secret: string;
  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    t = await createTestApp();
    secret = t.app.get(AppConfig).jwtSecret;
  });
  afterAll(() => t.close());

  describe('POST /api/auth/login', () => {
    it('signs in a demo account (email case and spaces ignored) with a 12-hour token', async () => {
      const response = await t.http().post('/api/auth/login').send({ email: ' Engineer@Tacet.TEST', password: DEMO_PASSWORD });
      expect(response.status).toBe(200);
      expect(response.body.user).toEqual({
        id: expect.any(Number),
        email: 'engineer@tacet.test',
        name: 'Erin Engineer',
        role: 'engineer',
        unitSystem: 'SI',
        mustChangePassword: false,
      });
      const payload = decodePayload(response.body.accessToken);
      expect(payload).toMatchObject({ sub: response.body.user.id, role: 'engineer' });
      expect(Number(payload.exp) - Number(payload.iat)).toBe(12 * 3600);
    });

    it('gives the same 401 for a wrong password, an unknown email and a deactivated user', async () => {
      const admin = await t.loginAs('admin');
      const created = await t
        .http()
        .post('/api/users')
        .set(bearer(admin))
        .send({ email: 'leaver@example.test', name: 'Lee Leaver', role: 'viewer', password: 'leaver password' });
      expect(created.status).toBe(201);
      await t.http().delete(`/api/users/${created.body.id}`).set(bearer(admin)).expect(200);

      const attempts = [
        { email: 'engineer@tacet.test', password: 'not the password' },
        { email: 'nobody@tacet.test', password: DEMO_PASSWORD },
        { email: 'leaver@example.test', password: 'leaver password' },
      ];
      for (const attempt of attempts) {
        const response = await t.http().post('/api/auth/login').send(attempt);
        expect({ status: response.status, body: response.body }).toEqual({ status: 401, body: LOGIN_FAILED });
      }
    });

    it.each<[string, unknown, string[]]>([
      ['missing fields', {}, ['email', 'password']],
      ['an invalid email', { email: 'not-an-email', password: 'x' }, ['email']],
      ['wrong types', { email: 42, password: ['a'] }, ['email', 'password']],
      ['an over-long password', { email: 'a@tacet.test', password: 'p'.repeat(201) }, ['password']],
      ['an unknown field', { email: 'a@tacet.test', password: 'x', role: 'admin' }, ['role']],
    ])('answers 400 with errors[].field for %s', async (_case, body, fields) => {
      const response = await t
        .http()
        .post('/api/auth/login')
        .send(body as object);
      expect(response.status).toBe(400);
      expect(response.body).toMatchObject({ statusCode: 400, message: 'Validation failed' });
      expect([...new Set(response.body.errors.map((e: { field: string }) => e.field))].sort()).toEqual(fields);
    });

    it('answers 400 "Request body is not valid JSON" for a malformed body', async () => {
      const response = await t.http().post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": "admin@tacet.test",');
      expect(response.status).toBe(400);
      expect(response.body).toEqual({ statusCode: 400, message: 'Request body is not valid JSON' });
    });
  });

  describe('tokens', () => {
    let viewerId: number;
    beforeAll(async () => {
      const viewer = await t.loginAs('viewer');
      viewerId = Number(decodePayload(viewer).sub);
    });

    const meWith = (token: string) => t.http().get('/api/auth/me').set(bearer(token));

    it('accepts a token signed with the server secret (control for the cases below)', async () => {
      const token = signHs256({ sub: viewerId, role: 'viewer', iat: nowSeconds(), exp: nowSeconds() + 60 }, secret);
      await meWith(token).expect(200);
    });

    it.each<[string, () => string]>([
      ['no token', () => ''],
      ['a malformed token', () => 'not.a.jwt'],
      ['an expired token', () => signHs256({ sub: viewerId, role: 'viewer', iat: nowSeconds() - 7200, exp: nowSeconds() - 60 }, secret)],
      ['a token signed with another secret', () => signHs256({ sub: viewerId, role: 'viewer', exp: nowSeconds() + 60 }, 'f'.repeat(48))],
      ['an alg:none token', () => unsignedToken({ sub: viewerId, role: 'admin', exp: nowSeconds() + 60 })],
      ['a token for a user that does not exist', () => signHs256({ sub: 999999, role: 'admin', exp: nowSeconds() + 60 }, secret)],
      ['a token without a numeric subject', () => signHs256({ sub: 'admin', role: 'admin', exp: nowSeconds() + 60 }, secret)],
    ])('answers 401 JSON for %s', async (_case, makeToken) => {
      const token = makeToken();
      const response = await (token ? meWith(token) : t.http().get('/api/auth/me'));
      expect(response.status).toBe(401);
      expect(response.body).toEqual({ statusCode: 401, message: 'Sign-in required' });
    });

    it('takes the role from the database, not from the token', async () => {
      const token = signHs256({ sub: viewerId, role: 'admin', exp: nowSeconds() + 60 }, secret);
      const response = await t.http().get('/api/users').set(bearer(token));
      expect(response.status).toBe(403);
      expect(response.body).toEqual({ statusCode: 403, message: 'Your role does not allow this' });
    });
  });

  describe('own account', () => {
    it('GET /api/auth/me returns the user without the password hash', async () => {
      const token = await t.loginAs('purchaser');
      const response = await t.http().get('/api/auth/me').set(bearer(token)).expect(200);
      expect(response.body).toEqual({
        id: expect.any(Number),
        email: 'buyer@tacet.test',
        name: 'Bea Buyer',
        role: 'purchaser',
        unitSystem: 'SI',
        active: true,
        mustChangePassword: false,
        createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
        updatedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
      });
    });

    it('PATCH /api/auth/me changes name and unit preference, but not role, email or active', async () => {
      const token = await t.loginAs('catalog_manager');
      const updated = await t
        .http()
        .patch('/api/auth/me')
        .set(bearer(token))
        .send({ name: '  Cato C. Catalog ', unitSystem: 'US' })
        .expect(200);
      expect(updated.body).toMatchObject({ name: 'Cato C. Catalog', unitSystem: 'US', role: 'catalog_manager' });
      const me = await t.http().get('/api/auth/me').set(bearer(token)).expect(200);
      expect(me.body).toMatchObject({ name: 'Cato C. Catalog', unitSystem: 'US' });

      for (const body of [{ role: 'admin' }, { email: 'x@tacet.test' }, { active: false }, { unitSystem: 'imperial' }, { name: '' }]) {
        const response = await t.http().patch('/api/auth/me').set(bearer(token)).send(body);
        expect(response.status).toBe(400);
        expect(response.body.errors[0].field).toBe(Object.keys(body)[0]);
      }
    });

    it('POST /api/auth/me/password checks the current password and lets the new one sign in', async () => {
      const admin = await t.loginAs('admin');
      await t
        .http()
        .post('/api/users')
        .set(bearer(admin))
        .send({ email: 'mover@example.test', name: 'Mo Mover', role: 'engineer', password: 'first password' })
        .expect(201);
      const token = await t.login('mover@example.test', 'first password');
      const change = (body: object) => t.http().post('/api/auth/me/password').set(bearer(token)).send(body);

      const wrong = await change({ currentPassword: 'not it at all', newPassword: 'second password' });
      expect(wrong.body).toEqual({ statusCode: 400, message: 'Current password is incorrect' });

      const short = await change({ currentPassword: 'first password', newPassword: 'short' });
      expect(short.status).toBe(400);
      expect(short.body.errors).toEqual([{ field: 'newPassword', message: expect.stringContaining('10') }]);

      const tooLong = await change({ currentPassword: 'first password', newPassword: 'p'.repeat(201) });
      expect(tooLong.status).toBe(400);

      await change({ currentPassword: 'first password', newPassword: 'second password' }).expect(204);
      await t.http().post('/api/auth/login').send({ email: 'mover@example.test', password: 'first password' }).expect(401);
      await t.login('mover@example.test', 'second password');
    });
  });
});
