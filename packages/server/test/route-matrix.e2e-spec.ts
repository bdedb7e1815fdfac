import { ROLES, type Role } from '../src/common/roles.js';
import { NOT_IN_MATRIX, ROUTE_MATRIX, type Access, type Method, type RouteRule } from './route-matrix.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

type Caller = Role | 'anonymous';
type Outcome = 'allowed' | '401' | '403' | `unexpected ${number}`;

const CALLERS: Caller[] = ['anonymous', ...ROLES];

function expectedOutcome(access: Access, caller: Caller): Outcome {
  if (access === 'public') return 'allowed';
  if (caller === 'anonymous') return '401';
  if (access === 'signed-in') return 'allowed';
  return access.includes(caller) ? 'allowed' : '403';
}

function outcomeOf(status: number): Outcome {
  if (status === 401) return '401';
  if (status === 403) return '403';
  if (status >= 200 && status < 500 && status !== 429) return 'allowed';
  return `unexpected ${status}`;
}

const key = (method: string, path: string) => `${method.toUpperCase()} ${path}`;

/** Every route Express knows under /api, as "METHOD /path". */
function registeredApiRoutes(t: TestApp): string[] {
  const express = t.app.getHttpAdapter().getInstance() as {
    router: { stack: Array<{ route?: { path: string; methods: Record<string, boolean> } }> };
  };
  return express.router.stack
    .flatMap((layer) => (layer.route ? [layer.route] : []))
    .filter((route) => route.path.startsWith('/api') && !NOT_IN_MATRIX(route.path))
    .flatMap((route) =>
      Object.keys(route.methods)
        .filter((m) => m !== '_all')
        .map((m) => key(m, route.path)),
    );
}

describe('role × route matrix (e2e)', () => {
  let t: TestApp;
  const tokens = new Map<Caller, string | undefined>();

  beforeAll(async () => {
    t = await createTestApp();
    tokens.set('anonymous', undefined);
    for (const role of ROLES) tokens.set(role, await t.loginAs(role));
  });
  afterAll(() => t.close());

  it('lists every registered /api route, and only those', () => {
    const registered = [...new Set(registeredApiRoutes(t))].sort();
    const listed = ROUTE_MATRIX.map((rule) => key(rule.method, rule.path)).sort();
    expect(new Set(listed).size).toBe(listed.length);
    expect(registered).toEqual(listed);
  });

  it('gives each role exactly the access the matrix states', async () => {
    const send = (rule: RouteRule, token: string | undefined) => {
      const url = rule.path.replace(/:\w+/g, '999999');
      const method = rule.method.toLowerCase() as Lowercase<Method>;
      let request = t.http()[method](url);
      if (token) request = request.set('Authorization', `Bearer ${token}`);
      return rule.method === 'GET' || rule.method === 'DELETE' ? request : request.send(rule.body ?? {});
    };

    const expected: string[] = [];
    const actual: string[] = [];
    for (const rule of ROUTE_MATRIX) {
      for (const caller of CALLERS) {
        const response = await send(rule, tokens.get(caller));
        const label = `${key(rule.method, rule.path)} as ${caller}`;
        expected.push(`${label} → ${expectedOutcome(rule.access, caller)}`);
        actual.push(`${label} → ${outcomeOf(response.status)}`);
        if (response.status === 401 || response.status === 403) {
          expect(response.body).toEqual({ statusCode: response.status, message: expect.any(String) });
        }
      }
    }
    expect(actual).toEqual(expected);
  });
});
