import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer as startBuiltServer, type TacetServer } from '../../tools/harness/server.mjs';

/** A server of its own (the shared one allows many sign-ins), web client included. */
const startServer = (env: Record<string, string>) => startBuiltServer({ web: true, label: 'e2e', env });

// The login throttle runs only in the real server (jest loads a stub of @nestjs/throttler,
// see packages/server/test/stubs), so it is checked here over HTTP.
describe('login rate limit (real server)', () => {
  let server: TacetServer;
  beforeAll(async () => {
    server = await startServer({ TACET_LOGIN_LIMIT_PER_MINUTE: '5' });
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('answers 429 JSON after the configured number of attempts per minute', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 7; i++) {
      const res = await fetch(`${server.baseURL}/api/auth/login`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email: 'engineer@tacet.test', password: 'wrong-password' }),
      });
      statuses.push(res.status);
      if (res.status === 429) {
        const body = (await res.json()) as { statusCode: number; message: unknown };
        expect(body.statusCode).toBe(429);
        expect(typeof body.message).toBe('string');
      }
    }
    expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
    expect(statuses.slice(5)).toEqual([429, 429]);
  });

  it('sends the usual security headers', async () => {
    const res = await fetch(`${server.baseURL}/api/health`);
    expect(res.headers.get('x-content-type-options')).toBe('nosniff');
    expect(res.headers.get('content-security-policy')).toBeTruthy();
    expect(res.headers.get('x-powered-by')).toBeNull();
  });

  it('serves the single-page app for deep links and JSON 404 under /api', async () => {
    const page = await fetch(`${server.baseURL}/projects`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('<div id="root"');
    const api = await fetch(`${server.baseURL}/api/no-such-route`);
    expect(api.status).toBe(404);
    expect(((await api.json()) as { statusCode: number }).statusCode).toBe(404);
  });
});

// Behind load balancers every connection comes from a balancer: with TACET_TRUST_PROXY the
// limit counts per client address from X-Forwarded-For; without it the header is ignored, so a
// client cannot dodge the limit by inventing addresses.
describe('login rate limit behind a load balancer (real server)', () => {
  const attempt = (server: TacetServer, forwardedFor: string) =>
    fetch(`${server.baseURL}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-forwarded-for': forwardedFor },
      body: JSON.stringify({ email: 'engineer@tacet.test', password: 'wrong-password' }),
    }).then((res) => res.status);
  const servers: TacetServer[] = [];
  afterAll(async () => {
    for (const server of servers) await server.stop();
  });

  it('with TACET_TRUST_PROXY=1 counts each client address on its own', async () => {
    const server = await startServer({ TACET_LOGIN_LIMIT_PER_MINUTE: '2', TACET_TRUST_PROXY: '1' });
    servers.push(server);
    const first = [await attempt(server, '203.0.113.7'), await attempt(server, '203.0.113.7'), await attempt(server, '203.0.113.7')];
    expect(first).toEqual([401, 401, 429]);
    expect(await attempt(server, '203.0.113.8')).toBe(401); // another client behind the same balancer
  });

  it('without it ignores X-Forwarded-For', async () => {
    const server = await startServer({ TACET_LOGIN_LIMIT_PER_MINUTE: '2' });
    servers.push(server);
    const statuses = [await attempt(server, '203.0.113.7'), await attempt(server, '203.0.113.8'), await attempt(server, '203.0.113.9')];
    expect(statuses).toEqual([401, 401, 429]);
  });
});
