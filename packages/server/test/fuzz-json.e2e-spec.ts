import fc from 'fast-check';
import type { Response } from 'supertest';
import { createFuzzTargets, type FuzzCaller, type FuzzTargets } from './factories/fuzz-targets.factory.js';
import { ROUTE_MATRIX, type Method } from './route-matrix.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { changedTables, dbFingerprint, type DbFingerprint } from './utils/db-fingerprint.js';
import {
  FUZZ_RUNS,
  HOSTILE_IDS,
  RAW_BODIES,
  fuzzParameters,
  fuzzTimeout,
  hostileKey,
  hostileQueryValue,
  mutationsOf,
  type RawBody,
} from './utils/hostile-input.js';

/**
 * Hostile input against every JSON route of the real app (routes from test/route-matrix.ts,
 * valid example requests from test/factories/fuzz-targets.factory.ts). For every request:
 * never a 5xx; a 4xx answers the JSON error shape `{statusCode, message}`; and a 4xx changed
 * nothing (a fingerprint of every table before and after). Fixed seed; TACET_FUZZ_RUNS and
 * TACET_FUZZ_SEED make longer or different runs (see test/utils/hostile-input.ts).
 */

const key = (method: string, path: string) => `${method} ${path}`;

/** Every route that takes a JSON body (the multipart import gets its own fuzz in fuzz-import.e2e-spec.ts too). */
const BODY_ROUTES = ROUTE_MATRIX.filter((rule) => ['POST', 'PUT', 'PATCH'].includes(rule.method)).map((rule) =>
  key(rule.method, rule.path),
);

/** Routes with a path parameter. */
const PARAM_ROUTES = ROUTE_MATRIX.filter((rule) => rule.path.includes(':'));

/** The paths of every number in a JSON value. */
function numberPaths(value: unknown, path: Array<string | number> = []): Array<Array<string | number>> {
  if (typeof value === 'number') return [path];
  if (typeof value !== 'object' || value === null) return [];
  return Object.entries(value).flatMap(([key, item]) => numberPaths(item, [...path, Array.isArray(value) ? Number(key) : key]));
}

/** A copy of `body` with the number at `path` replaced. */
function withNumberAt(body: unknown, path: Array<string | number>, value: number): unknown {
  const copy = JSON.parse(JSON.stringify(body));
  let node = copy;
  for (const key of path.slice(0, -1)) node = node[key];
  node[path[path.length - 1]] = value;
  return copy;
}

interface Sent {
  method: Method;
  url: string;
  describe: string;
}

describe('hostile JSON input (e2e)', () => {
  let t: TestApp;
  let targets: FuzzTargets;
  /** The database as the last request left it. */
  let last: DbFingerprint;

  const request = (method: Method, url: string, as: FuzzCaller) => {
    let call = t.http()[method.toLowerCase() as Lowercase<Method>](url);
    const token = targets.tokens[as];
    if (token) call = call.set('Authorization', `Bearer ${token}`);
    return call;
  };

  const shown = (value: unknown): string => {
    const text =
      typeof value === 'string' ? value : Buffer.isBuffer(value) ? `<${value.length} bytes>` : (JSON.stringify(value) ?? String(value));
    return text.length > 300 ? `${text.slice(0, 300)}… (${text.length} characters)` : text;
  };

  /** The invariants of every answer (see the file comment); throws with the request described. */
  const check = async (sent: Sent, response: Response): Promise<void> => {
    const what = `${sent.method} ${shown(sent.url)} with ${sent.describe} → ${response.status} ${shown(response.text)}`;
    if (response.status >= 500) throw new Error(`5xx: ${what}`);
    if (response.status >= 400) {
      const body = response.body as { statusCode?: unknown; message?: unknown };
      if (
        !/^application\/json/.test(String(response.headers['content-type'])) ||
        body.statusCode !== response.status ||
        typeof body.message !== 'string'
      ) {
        throw new Error(`4xx without the JSON error shape: ${what}`);
      }
    }
    const now = await dbFingerprint(t);
    if (response.status >= 400) {
      const changed = changedTables(last, now);
      if (changed.length > 0) throw new Error(`a refused request changed ${changed.join(', ')}: ${what}`);
    }
    last = now;
  };

  const sendJson = async (method: Method, url: string, as: FuzzCaller, body: unknown): Promise<void> => {
    const text = JSON.stringify(body) ?? '';
    const response = await request(method, url, as).set('Content-Type', 'application/json').send(text);
    await check({ method, url, describe: `body ${shown(text)}` }, response);
  };

  const sendRaw = async (method: Method, url: string, as: FuzzCaller, raw: RawBody): Promise<void> => {
    let call = request(method, url, as);
    if (raw.contentType) call = call.set('Content-Type', raw.contentType);
    if (raw.contentEncoding) call = call.set('Content-Encoding', raw.contentEncoding);
    await check({ method, url, describe: raw.name }, await call.send(raw.body));
  };

  beforeAll(async () => {
    t = await createTestApp();
    targets = await createFuzzTargets(t);
    last = await dbFingerprint(t);
  }, 120_000);
  afterAll(() => t?.close());

  it('has a valid example request for every route that takes a body or query parameters', async () => {
    expect(BODY_ROUTES.filter((route) => !(route in targets.bodies))).toEqual([]);
    expect(Object.keys(targets.bodies).filter((route) => !BODY_ROUTES.includes(route))).toEqual([]);

    const document = (await t.http().get('/api/docs-json').expect(200)).body as {
      paths: Record<string, Record<string, { parameters?: Array<{ in: string }> }>>;
    };
    const withQuery = Object.entries(document.paths).flatMap(([path, operations]) =>
      Object.entries(operations)
        .filter(([, operation]) => operation.parameters?.some((parameter) => parameter.in === 'query'))
        .map(([method]) => key(method.toUpperCase(), path.replace(/\{(\w+)\}/g, ':$1'))),
    );
    expect(withQuery.sort()).toEqual(Object.keys(targets.queries).sort());
  });

  it(
    'sends each example request successfully (so the mutations start from a body the route accepts)',
    async () => {
      const refused: string[] = [];
      for (const [route, target] of Object.entries(targets.bodies)) {
        if (route === 'POST /api/mounts/import' || route === 'POST /api/designs/:id/verifications') continue; // multipart: fuzz-import / fuzz-verification
        const method = route.split(' ')[0] as Method;
        const response = await request(method, target.url, target.as).send((await target.body()) as object);
        // 409: the example was sent before (e.g. the same new user, a transition already made)
        if (response.status >= 400 && response.status !== 409) refused.push(`${route} → ${response.status} ${response.text}`);
        await check({ method, url: target.url, describe: 'the example body' }, response);
      }
      expect(refused).toEqual([]);
    },
    fuzzTimeout(30),
  );

  describe.each(BODY_ROUTES)('%s', (route) => {
    const method = route.split(' ')[0] as Method;

    it(
      'answers malformed, pathological and mistyped bodies with a 4xx JSON error and changes nothing',
      async () => {
        const target = targets.bodies[route];
        for (const raw of RAW_BODIES) await sendRaw(method, target.url, target.as, raw);
      },
      fuzzTimeout(RAW_BODIES.length),
    );

    it(
      'answers mutations of a valid body without a 5xx, and a refused one changes nothing',
      async () => {
        const target = targets.bodies[route];
        const seed = await target.body();
        await fc.assert(
          fc.asyncProperty(mutationsOf(seed), async (body) => sendJson(method, target.url, target.as, body)),
          fuzzParameters(target.runsFactor),
        );
      },
      fuzzTimeout(FUZZ_RUNS * 3),
    );
  });

  it(
    'answers every number of every example body set to 2^31, 2^53 + 2 or 1e308 without a 5xx (ids and counts are 32-bit columns)',
    async () => {
      const failures: string[] = [];
      for (const [route, target] of Object.entries(targets.bodies)) {
        const method = route.split(' ')[0] as Method;
        const seed = await target.body();
        for (const path of numberPaths(seed)) {
          for (const value of [2 ** 31, Number.MAX_SAFE_INTEGER + 2, 1e308]) {
            try {
              await sendJson(method, target.url, target.as, withNumberAt(seed, path, value));
            } catch (error) {
              failures.push(`${path.join('.')} = ${value}: ${(error as Error).message.slice(0, 160)}`);
              last = await dbFingerprint(t);
            }
          }
        }
      }
      expect(failures).toEqual([]);
    },
    fuzzTimeout(400),
  );

  describe.each(['GET /api/mounts', 'POST /api/mounts/import'])('query of %s', (route) => {
    const method = route.split(' ')[0] as Method;

    it(
      'answers hostile query strings without a 5xx, and a refused one changes nothing',
      async () => {
        const target = targets.queries[route];
        const names = Object.keys(target.query);
        const entry = fc.oneof(
          fc.tuple(fc.constantFrom(...names), hostileQueryValue),
          fc.tuple(
            fc.constantFrom(...names).map((name) => `${name}[a]`),
            hostileQueryValue,
          ),
          fc.tuple(hostileKey, hostileQueryValue),
        );
        const queries = fc.record({
          keep: fc.subarray(names),
          extra: fc.array(entry, { minLength: 1, maxLength: 4 }),
        });
        await fc.assert(
          fc.asyncProperty(queries, async ({ keep, extra }) => {
            const pairs = [...keep.map((name) => [name, target.query[name]] as const), ...extra];
            const search = pairs.map(([name, value]) => `${encodeURIComponent(name)}=${encodeURIComponent(value)}`).join('&');
            const url = `${target.url}?${search}`;
            await check({ method, url, describe: 'no body' }, await request(method, url, target.as));
          }),
          fuzzParameters(2),
        );
      },
      fuzzTimeout(FUZZ_RUNS * 6),
    );

    it('answers raw, undecodable and prototype-polluting query strings without a 5xx', async () => {
      const target = targets.queries[route];
      const raw = [
        ...['page', 'pageSize', 'minLoadN', 'supplierId', 'dryRun'].flatMap((name) =>
          ['1e308', '-1e308', '9007199254740993', '1e-400', 'NaN'].map((value) => `${name}=${value}`),
        ),
        '%ff',
        '%',
        'q=%E0%A4%A',
        '__proto__[isAdmin]=1',
        'constructor[prototype][x]=1',
        'page=1&page=2',
        'a=1&'.repeat(2000),
        '=&=&',
        '&&&',
        'q',
      ];
      for (const search of raw) {
        const url = `${target.url}?${search}`;
        await check({ method, url, describe: 'no body' }, await request(method, url, target.as));
      }
    });
  });

  it(
    'answers hostile path parameters on every route without a 5xx, and a refused one changes nothing',
    async () => {
      for (const rule of PARAM_ROUTES) {
        const example = targets.bodies[key(rule.method, rule.path)];
        const body = example ? await example.body() : undefined;
        for (const id of HOSTILE_IDS) {
          const url = rule.path.replace(/:\w+/g, id);
          const call = request(rule.method, url, 'admin');
          const response = await (body === undefined ? call : call.send(body as object));
          await check({ method: rule.method, url, describe: body === undefined ? 'no body' : 'the example body' }, response);
        }
      }
    },
    fuzzTimeout(PARAM_ROUTES.length * HOSTILE_IDS.length),
  );

  it('leaves Object.prototype untouched after all of the above', () => {
    const probe = {} as Record<string, unknown>;
    expect([probe.isAdmin, probe.role, probe.x]).toEqual([undefined, undefined, undefined]);
  });
});
