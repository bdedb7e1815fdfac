import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { jest } from '@jest/globals';
import { Logger } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { HealthService } from '../src/health/health.service.js';
import { createTestApp, makeTempDir, type TestApp } from './utils/create-test-app.js';
import { itPostgresOnly, itSqliteOnly } from './utils/test-database.js';

describe('application (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('GET /api/health is public and ok', async () => {
    const response = await t.http().get('/api/health').expect(200);
    expect(response.body).toEqual({ status: 'ok', demo: true });
  });

  it('answers unknown /api routes with a JSON 404', async () => {
    for (const [method, path] of [
      ['get', '/api/nope'],
      ['post', '/api/users/1/nope'],
      ['get', '/api'],
    ] as const) {
      const response = await t.http()[method](path);
      expect(response.status).toBe(404);
      expect(response.type).toBe('application/json');
      expect(response.body).toEqual({ statusCode: 404, message: expect.stringContaining('Cannot') });
    }
  });

  it('refuses a JSON body over 1 MB with 413', async () => {
    const token = await t.loginAs('viewer');
    const response = await t
      .http()
      .patch('/api/auth/me')
      .set('Authorization', `Bearer ${token}`)
      .send({ name: 'n'.repeat(1024 * 1024 + 10) });
    expect(response.status).toBe(413);
    expect(response.body).toEqual({ statusCode: 413, message: 'Request body is too large' });
  });

  it('sets security headers (helmet)', async () => {
    const response = await t.http().get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    expect(response.headers['x-powered-by']).toBeUndefined();
  });

  it('says how long the server took in a Server-Timing header', async () => {
    const response = await t.http().get('/api/health');
    expect(response.headers['server-timing']).toMatch(/^app;dur=\d+\.\d{2}$/);
  });

  it('compresses large responses', async () => {
    const response = await t.http().get('/api/docs-json').set('Accept-Encoding', 'gzip');
    expect(response.headers['content-encoding']).toBe('gzip');
  });

  it('serves a complete OpenAPI document at /api/docs-json and the UI at /api/docs', async () => {
    const response = await t.http().get('/api/docs-json').expect(200);
    const document = response.body;
    expect(document.components.securitySchemes.bearer).toMatchObject({ type: 'http', scheme: 'bearer' });
    expect(Object.keys(document.paths)).toEqual(
      expect.arrayContaining(['/api/auth/login', '/api/auth/me', '/api/auth/me/password', '/api/users', '/api/users/{id}', '/api/health']),
    );
    expect(Object.keys(document.components.schemas.CreateUserDto.properties).sort()).toEqual(
      ['email', 'name', 'password', 'role', 'unitSystem'].sort(),
    );
    // Named enums: one `Role` schema that every DTO refers to (typed once in the web).
    expect(document.components.schemas.UserDto.properties.role).toEqual({ allOf: [{ $ref: '#/components/schemas/Role' }] });
    expect(document.components.schemas.Role.enum).toEqual(['admin', 'catalog_manager', 'engineer', 'purchaser', 'viewer']);
    expect(document.paths['/api/auth/login'].post.responses['200'].content['application/json'].schema).toEqual({
      $ref: '#/components/schemas/LoginResponseDto',
    });
    const ui = await t.http().get('/api/docs').expect(200);
    expect(ui.type).toBe('text/html');
  });

  itSqliteOnly('reads SQLite PRAGMAs', 'opens SQLite in WAL mode with a busy timeout and foreign keys on', async () => {
    const dataSource = t.app.get(DataSource);
    expect(dataSource.options.type).toBe('better-sqlite3');
    expect(await dataSource.query('PRAGMA journal_mode')).toEqual([{ journal_mode: 'wal' }]);
    expect(await dataSource.query('PRAGMA busy_timeout')).toEqual([{ timeout: 5000 }]);
    expect(await dataSource.query('PRAGMA foreign_keys')).toEqual([{ foreign_keys: 1 }]);
  });

  itPostgresOnly('the PostgreSQL pass', 'runs on the PostgreSQL database that DATABASE_URL names, migrated', async () => {
    const dataSource = t.app.get(DataSource);
    expect(dataSource.options.type).toBe('postgres');
    const [{ name }] = await dataSource.query('SELECT current_database() AS name');
    expect(name).toMatch(/^tacet_t_[0-9a-f]+$/);
    expect(await dataSource.showMigrations()).toBe(false); // nothing pending
  });
});

describe('unexpected errors (e2e)', () => {
  it('answer 500 "Internal server error" without details, and log the stack', async () => {
    const t = await createTestApp({
      override: (builder) =>
        builder.overrideProvider(HealthService).useValue({
          check: async () => {
            throw new Error('connection string postgres://tacet:hunter2@db');
          },
        }),
    });
    const logged = jest.spyOn(Logger.prototype, 'error').mockImplementation(() => undefined);
    try {
      const response = await t.http().get('/api/health');
      expect(response.status).toBe(500);
      expect(response.body).toEqual({ statusCode: 500, message: 'Internal server error' });
      expect(response.text).not.toContain('hunter2');
      expect(logged).toHaveBeenCalledWith('GET /api/health failed', expect.stringContaining('hunter2'));
    } finally {
      logged.mockRestore();
      await t.close();
    }
  });

  it('GET /api/health answers 503 when the database is gone', async () => {
    const t = await createTestApp();
    const logged = jest.spyOn(Logger.prototype, 'error').mockImplementation(() => undefined);
    try {
      await t.app.get(DataSource).destroy();
      const response = await t.http().get('/api/health');
      expect(response.status).toBe(503);
      expect(response.body).toEqual({ statusCode: 503, message: 'Database unavailable' });
    } finally {
      logged.mockRestore();
      await t.close();
    }
  });
});

describe('web client (e2e)', () => {
  let t: TestApp;
  const root = makeTempDir();
  beforeAll(async () => {
    const webDist = join(root, 'dist');
    mkdirSync(join(webDist, 'assets'), { recursive: true });
    writeFileSync(join(webDist, 'index.html'), '<!doctype html><title>Tacet</title><div id="root"></div>');
    writeFileSync(join(webDist, 'assets', 'index-abc123.js'), 'console.log("tacet");');
    t = await createTestApp({ env: { TACET_WEB_DIST: webDist } });
  });
  afterAll(async () => {
    await t.close();
    rmSync(root, { recursive: true, force: true });
  });

  it('serves index.html at / and for deep links, never cached', async () => {
    for (const path of ['/', '/projects', '/projects/12/designs']) {
      const response = await t.http().get(path).expect(200);
      expect(response.type).toBe('text/html');
      expect(response.text).toContain('<title>Tacet</title>');
      expect(response.headers['cache-control']).toBe('no-cache');
    }
  });

  it('serves hashed assets with a long cache', async () => {
    const response = await t.http().get('/assets/index-abc123.js').expect(200);
    expect(response.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('leaves /api to the API: unknown API routes stay JSON 404s', async () => {
    await t.http().get('/api/health').expect(200);
    const response = await t.http().get('/api/projects-that-do-not-exist');
    expect(response.status).toBe(404);
    expect(response.type).toBe('application/json');
  });
});
