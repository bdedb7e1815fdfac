import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer as startBuiltServer, type TacetServer } from '../../tools/harness/server.mjs';

/** A server of its own, with a low limit. */
const startServer = (env: Record<string, string>) => startBuiltServer({ web: true, label: 'e2e', env });

// The "forgot password" routes share the sign-in limit (TACET_LOGIN_LIMIT_PER_MINUTE). The
// throttle runs only in the real server (jest loads a stub of @nestjs/throttler), so it is
// checked here over HTTP.
describe('password reset rate limit (real server)', () => {
  let server: TacetServer;
  beforeAll(async () => {
    server = await startServer({ TACET_LOGIN_LIMIT_PER_MINUTE: '3' });
  });
  afterAll(async () => {
    await server?.stop();
  });

  const post = (path: string, body: object) =>
    fetch(`${server.baseURL}/api/auth/${path}`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify(body),
    });

  it('answers 202 the same for any address until the limit, then 429', async () => {
    const answers: { status: number; body: unknown }[] = [];
    for (const email of ['engineer@tacet.test', 'nobody@example.test', 'viewer@tacet.test', 'engineer@tacet.test']) {
      const response = await post('password-reset', { email });
      answers.push({ status: response.status, body: await response.json() });
    }
    expect(answers.map((answer) => answer.status)).toEqual([202, 202, 202, 429]);
    expect(answers[1]!.body).toEqual(answers[0]!.body);
    expect(answers[3]!.body).toMatchObject({ statusCode: 429, message: expect.any(String) });
  });

  it('limits the confirmation too: used or unknown tokens answer 400, then 429', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++)
      statuses.push((await post('password-reset/confirm', { token: `guess-${i}`, password: 'long enough 12' })).status);
    expect(statuses).toEqual([400, 400, 400, 429]);
  });
});
