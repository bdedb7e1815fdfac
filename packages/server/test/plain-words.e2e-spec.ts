import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import PDFDocument from 'pdfkit';
import { identifiersIn } from '@tacet/vibration';
import { createFuzzTargets, type FuzzCaller, type FuzzTargets } from './factories/fuzz-targets.factory.js';
import { ROUTE_MATRIX, type Method } from './route-matrix.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

/**
 * What people read is in words (PRODUCT.md "One voice"): no API message and no line of the
 * calculation report may carry an identifier — camel case (`massKg`), a snake-case code
 * (`open_spring`, `in_review`) or an indexed path (`components[0]`). The field path belongs in
 * `field`, never in the message.
 */

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Wrong versions of a valid body: each leaf of the wrong kind or out of range, each list emptied, an unknown field. */
function badVersionsOf(body: Json): Array<{ describe: string; body: Json }> {
  const out: Array<{ describe: string; body: Json }> = [];
  const withAt = (path: Array<string | number>, value: Json): Json => {
    const copy = JSON.parse(JSON.stringify(body)) as Json;
    let node = copy as Record<string | number, Json>;
    for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, Json>;
    node[path[path.length - 1]] = value;
    return copy;
  };
  const walk = (value: Json, path: Array<string | number>) => {
    const at = path.join('.');
    if (typeof value === 'number') {
      out.push({ describe: `${at} = -1`, body: withAt(path, -1) }, { describe: `${at} = "one"`, body: withAt(path, 'one') });
    } else if (typeof value === 'string' || typeof value === 'boolean') {
      out.push({ describe: `${at} = 7`, body: withAt(path, 7) });
    } else if (Array.isArray(value)) {
      if (path.length) out.push({ describe: `${at} = []`, body: withAt(path, []) }, { describe: `${at} = "x"`, body: withAt(path, 'x') });
      value.forEach((item, index) => walk(item, [...path, index]));
    } else if (value && typeof value === 'object') {
      if (path.length) out.push({ describe: `${at} = "x"`, body: withAt(path, 'x') });
      for (const [key, item] of Object.entries(value)) walk(item, [...path, key]);
    }
  };
  if (body && typeof body === 'object' && !Array.isArray(body))
    out.push({ describe: 'an unknown field', body: { ...body, surpriseField: 1 } });
  walk(body, []);
  return out;
}

/** At most `n` items spread evenly over the list. */
const spread = <T>(items: T[], n: number): T[] =>
  items.length <= n ? items : Array.from({ length: n }, (_, i) => items[Math.floor((i * items.length) / n)]);

const messagesOf = (body: unknown): string[] => {
  const b = body as { message?: unknown; errors?: Array<{ message?: unknown }> };
  return [
    ...(typeof b?.message === 'string' ? [b.message] : Array.isArray(b?.message) ? (b.message as string[]) : []),
    ...(b?.errors ?? []).map((e) => e?.message).filter((m): m is string => typeof m === 'string'),
  ];
};

describe('messages and the report in words (e2e)', () => {
  let t: TestApp;
  let targets: FuzzTargets;

  beforeAll(async () => {
    t = await createTestApp();
    targets = await createFuzzTargets(t);
  }, 120_000);
  afterAll(() => t.close());

  const send = (method: Method, url: string, as: FuzzCaller, body: Json) => {
    let call = t.http()[method.toLowerCase() as Lowercase<Method>](url);
    const token = targets.tokens[as];
    if (token) call = call.set('Authorization', `Bearer ${token}`);
    return call.send(body as object);
  };

  it('every refusal of a wrong body says what is wrong in words, with the path in `field`', async () => {
    const offending: string[] = [];
    let refusals = 0;
    for (const rule of ROUTE_MATRIX.filter((r) => ['POST', 'PUT', 'PATCH'].includes(r.method))) {
      const target = targets.bodies[`${rule.method} ${rule.path}`];
      if (!target) continue;
      const valid = (await target.body()) as Json;
      for (const bad of spread(badVersionsOf(valid), 24)) {
        const response = await send(rule.method, target.url, target.as, bad.body);
        if (response.status < 400 || response.status >= 500) continue;
        refusals++;
        for (const message of messagesOf(response.body)) {
          const found = identifiersIn(message);
          if (found.length) offending.push(`${rule.method} ${rule.path} with ${bad.describe} → "${message}" (${found.join(', ')})`);
        }
        for (const error of (response.body as { errors?: Array<{ field?: unknown }> }).errors ?? [])
          expect(typeof error.field).toBe('string');
      }
    }
    expect(refusals).toBeGreaterThan(100);
    expect(offending).toEqual([]);
  }, 300_000);

  it('a status move that is not allowed is named in words', async () => {
    const admin = await t.loginAs('admin');
    const projects = (await t.http().get('/api/projects').set('Authorization', `Bearer ${admin}`)).body as Array<{ id: number }>;
    const designs = (await t.http().get(`/api/projects/${projects[0].id}/designs`).set('Authorization', `Bearer ${admin}`)).body as Array<{
      id: number;
      status: string;
    }>;
    const released = designs.find((d) => d.status === 'released')!;
    const response = await t
      .http()
      .post(`/api/designs/${released.id}/transitions`)
      .set('Authorization', `Bearer ${admin}`)
      .send({ to: 'in_review' });
    expect(response.status).toBe(409);
    expect(response.body.message).toBe('A design cannot go from released to in check');
  });

  it('the calculation report of the demo design has no identifier in its text', async () => {
    const written: string[] = [];
    const proto = PDFDocument.prototype as unknown as { text: (...args: unknown[]) => unknown };
    const original = proto.text;
    proto.text = function (this: unknown, ...args: unknown[]) {
      if (typeof args[0] === 'string') written.push(args[0]);
      return original.apply(this, args);
    };
    try {
      const admin = await t.loginAs('admin');
      const auth = { Authorization: `Bearer ${admin}` };
      const projects = (await t.http().get('/api/projects').set(auth)).body as Array<{ id: number; client: string | null }>;
      const demo = projects.find((p) => p.client !== null)!;
      expect(demo.client).toBe('Brellowin Utilities Cooperative');
      const designs = (await t.http().get(`/api/projects/${demo.id}/designs`).set(auth)).body as Array<{ id: number; status: string }>;
      const released = designs.find((d) => d.status === 'released')!;
      const pdf = await t.http().get(`/api/designs/${released.id}/report.pdf`).set(auth).buffer(true);
      expect(pdf.status).toBe(200);
    } finally {
      proto.text = original;
    }
    const text = written.join('\n');
    expect(text).toMatch(/licensed engineer/);
    expect(text).toMatch(/Running conditions/);
    expect(text).toMatch(/Requirements/);
    expect(text).toMatch(/confirmed with the supplier before purchase/);
    const offending = written.filter((line) => identifiersIn(line).length > 0);
    expect(offending).toEqual([]);
  }, 60_000);
});
