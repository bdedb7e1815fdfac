import { linSpace, sdofFrf, simulateImpactRecord, viscousDamping } from '@tacet/vibration';
import { createRfqCatalog, createDesign, releaseDesign, type TestCatalog, type TestDesign } from './factories/review.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { changedTables, dbFingerprint } from './utils/db-fingerprint.js';
import { pdfHasText } from './utils/pdf-text.js';
import { PurchasingService } from '../src/purchasing/purchasing.service.js';
import { DesignsService } from '../src/designs/designs.service.js';
import { User } from '../src/users/user.entity.js';

/**
 * As-built verification (PRODUCT.md "As-built verification (tap test)"): uploads of FRF files
 * and raw hammer records on released designs, their identification against a known system,
 * the verdict, bad files refused with (row, column, message) and nothing stored, and who may
 * upload and read.
 *
 * The test design: 1000 kg on four springs of 100 kN/m (review.factory.ts), no inertia given,
 * so the prediction is the uncoupled bounce estimate √(4·10⁵/1000)/2π = 3.1831 Hz (closed form).
 */
const MASS = 1000;
const PREDICTED_HZ = Math.sqrt(4e5 / MASS) / (2 * Math.PI);

/** An FRF file of a one-mass system (sdofFrf, closed form) with natural frequency `fnHz`. */
function frfCsv(
  fnHz: number,
  options: { form?: 'complex' | 'polar'; kind?: 'receptance' | 'mobility' | 'accelerance'; zeta?: number } = {},
): string {
  const kind = options.kind ?? 'receptance';
  const f = linSpace(0.2, 20, 991);
  const c = sdofFrf(
    { massKg: MASS, stiffnessNPerM: MASS * (2 * Math.PI * fnHz) ** 2, damping: viscousDamping(options.zeta ?? 0.04) },
    kind,
    f,
  );
  const polar = options.form === 'polar';
  const lines = [polar ? 'frequency_hz,magnitude,phase_deg' : 'frequency_hz,real,imag'];
  for (let i = 0; i < f.length; i++) {
    lines.push(polar ? `${f[i]},${c.magnitude[i]},${c.phaseDeg[i]}` : `${f[i]},${c.re[i]},${c.im[i]}`);
  }
  return `${lines.join('\n')}\n`;
}

/** A raw record: 4 hits of a 1000 kg system at `fnHz`, ζ = 0.05, 512 samples/s (RK4, simulateImpactRecord). */
function impactCsv(fnHz: number): string {
  const record = simulateImpactRecord({
    massKg: MASS,
    stiffnessNPerM: MASS * (2 * Math.PI * fnHz) ** 2,
    dampingRatio: 0.05,
    sampleRateHz: 512,
    durationS: 40.5,
    pulses: [0.5, 10.5, 20.5, 30.5].map((timeS) => ({ timeS, peakForceN: 1500, durationS: 0.02 })),
    noise: { forceN: 1, accelerationMS2: 0.001, seed: 3 },
  });
  const lines = ['time_s,force_n,acceleration_m_s2'];
  record.timeS.forEach((t, i) => lines.push(`${t},${record.forceN[i]},${record.accelerationMS2[i]}`));
  return `${lines.join('\n')}\n`;
}

describe('as-built verification (e2e)', () => {
  let t: TestApp;
  const tokens: Record<string, string> = {};
  let catalog: TestCatalog;
  let released: TestDesign;
  let draft: TestDesign;

  const auth = (role: string) => ({ Authorization: `Bearer ${tokens[role]}` });
  const upload = (designId: number, role: string, csv: string | Buffer, fields: Record<string, string>, fileName = 'tap.csv') => {
    let request = t.http().post(`/api/designs/${designId}/verifications`).set(auth(role));
    for (const [name, value] of Object.entries(fields)) request = request.field(name, value);
    return request.attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv, 'utf8'), fileName);
  };

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ['admin', 'engineer', 'viewer', 'purchaser', 'catalog_manager'] as const) tokens[role] = await t.loginAs(role);
    tokens.checker = await t.login('checker@tacet.test', 'tacet-demo');
    catalog = await createRfqCatalog(t, tokens.catalog_manager, null);
    released = await createDesign(t, tokens.engineer, catalog);
    await releaseDesign(t, released.id, tokens.engineer, tokens.checker);
    draft = await createDesign(t, tokens.engineer, catalog);
  }, 120_000);
  afterAll(() => t?.close());

  it('the demo database holds one invented measurement of the released demo design, a few per cent off its bounce mode', async () => {
    const projects = await t.http().get('/api/projects').set(auth('viewer')).expect(200);
    const project = projects.body.find((p: { name: string }) => p.name === 'North Loop Chilled Water Plant');
    const designs = await t.http().get(`/api/projects/${project.id}/designs`).set(auth('viewer')).expect(200);
    const demo = designs.body.find((d: { name: string; status: string }) => d.name === 'CHW pump P-2 skid' && d.status === 'released');
    const list = await t.http().get(`/api/designs/${demo.id}/verifications`).set(auth('purchaser')).expect(200);
    expect(list.body).toHaveLength(1);
    const [v] = list.body;
    expect(v.kind).toBe('impact');
    expect(v.measuredBy.name).toBeTruthy();
    expect(v.predicted.mode).toBe('bounce');
    expect(v.predicted.source).toBe('rigid-body modes');
    expect(v.deviationPct).toBeGreaterThan(2);
    expect(v.deviationPct).toBeLessThan(6);
    expect(v.verdict).toBe('agrees');
    expect(v.processing.hitsAveraged).toBe(5);
    expect(v.identified.dampingRatio).toBeGreaterThan(0.045);
    expect(v.identified.dampingRatio).toBeLessThan(0.055);
    expect(v.warnings).toEqual([]);
    expect(v.measured.frequencyHz.length).toBeGreaterThan(50);
  });

  it('an engineer uploads a receptance FRF 5 % above the prediction: 201 with the contract fields; every role reads it', async () => {
    const fn = PREDICTED_HZ * 1.05;
    const response = await upload(released.id, 'engineer', frfCsv(fn), {
      kind: 'frf',
      quantity: 'receptance',
      note: 'Hammer at the CG, vertical',
    }).expect(201);
    const v = response.body;
    expect(v).toMatchObject({
      id: expect.any(Number),
      identified: { naturalFrequencyHz: expect.any(Number), dampingRatio: expect.any(Number), stiffnessNPerM: expect.any(Number) },
      predicted: { naturalFrequencyHz: expect.any(Number), mode: 'bounce' },
      deviationPct: expect.any(Number),
      verdict: 'agrees',
      notes: expect.any(Array),
      note: 'Hammer at the CG, vertical',
      tolerancePct: 10,
    });
    expect(Math.abs(v.identified.naturalFrequencyHz / fn - 1)).toBeLessThan(0.01);
    expect(Math.abs(v.identified.dampingRatio / 0.04 - 1)).toBeLessThan(0.05);
    expect(Math.abs(v.identified.stiffnessNPerM / (MASS * (2 * Math.PI * fn) ** 2) - 1)).toBeLessThan(0.02);
    expect(v.predicted.naturalFrequencyHz).toBeCloseTo(PREDICTED_HZ, 9);
    expect(v.predicted.source).toBe('bounce estimate');
    expect(v.deviationPct).toBeCloseTo(5, 0);
    const me = await t.http().get('/api/auth/me').set(auth('engineer')).expect(200);
    expect(v.measuredBy).toEqual({ id: me.body.id, name: me.body.name });
    for (const role of ['viewer', 'purchaser', 'catalog_manager', 'admin']) {
      const list = await t.http().get(`/api/designs/${released.id}/verifications`).set(auth(role)).expect(200);
      expect(list.body.map((x: { id: number }) => x.id)).toContain(v.id);
    }
  });

  it('an accelerance file in magnitude and phase 20 % above: stiffer, with the short-circuit causes; a tolerance of 25 % agrees', async () => {
    const csv = frfCsv(PREDICTED_HZ * 1.2, { form: 'polar', kind: 'accelerance' });
    const stiff = await upload(released.id, 'admin', csv, { kind: 'frf', quantity: 'accelerance' }).expect(201);
    expect(stiff.body.verdict).toBe('stiffer');
    expect(stiff.body.deviationPct).toBeCloseTo(20, 0);
    expect(stiff.body.stiffnessDeviationPct).toBeCloseTo(44, 0);
    expect(stiff.body.notes.join(' ')).toMatch(/short-circuit.*rigid pipe.*snubber/);
    const loose = await upload(released.id, 'engineer', csv, { kind: 'frf', quantity: 'accelerance', tolerancePct: '25' }).expect(201);
    expect(loose.body.verdict).toBe('agrees');
    const soft = await upload(released.id, 'engineer', frfCsv(PREDICTED_HZ * 0.8, { kind: 'mobility' }), {
      kind: 'frf',
      quantity: 'mobility',
    }).expect(201);
    expect(soft.body.verdict).toBe('softer');
    expect(soft.body.notes.join(' ')).toMatch(/flexible support.*heavier machine/);
  });

  it('a raw hammer record is turned into H1 and identified within 1 %', async () => {
    const fn = PREDICTED_HZ * 0.97;
    const response = await upload(released.id, 'engineer', impactCsv(fn), { kind: 'impact' }).expect(201);
    const v = response.body;
    expect(v.quantity).toBe('accelerance');
    expect(v.processing.hitsFound).toBe(4);
    expect(v.processing.hitsAveraged).toBe(4);
    expect(v.processing.sampleRateHz).toBeCloseTo(512, 6);
    expect(Math.abs(v.identified.naturalFrequencyHz / fn - 1)).toBeLessThan(0.01);
    expect(Math.abs(v.identified.dampingRatio / 0.05 - 1)).toBeLessThan(0.05);
    expect(v.identified.meanCoherence).toBeGreaterThan(0.95);
    expect(v.measured.coherence).toHaveLength(v.measured.frequencyHz.length);
    expect(v.warnings.join(' ')).toMatch(/4 hits averaged; at least 5/);
  });

  it('viewers, purchasers and catalog managers cannot upload (403); a draft cannot be verified (409); nothing is stored', async () => {
    const before = await dbFingerprint(t);
    for (const role of ['viewer', 'purchaser', 'catalog_manager']) {
      await upload(released.id, role, frfCsv(3), { kind: 'frf', quantity: 'receptance' }).expect(403);
    }
    const refused = await upload(draft.id, 'engineer', frfCsv(3), { kind: 'frf', quantity: 'receptance' }).expect(409);
    expect(refused.body.message).toMatch(/released or superseded/);
    await upload(999999, 'engineer', frfCsv(3), { kind: 'frf', quantity: 'receptance' }).expect(404);
    expect(changedTables(before, await dbFingerprint(t))).toEqual([]);
  });

  describe('bad files: a clear problem each, as (row, column, message), and nothing stored', () => {
    const good = frfCsv(3).trim().split('\n');
    const cases: Array<{ name: string; csv: string; fields?: Record<string, string>; status?: number; problem: object | RegExp }> = [
      {
        name: 'a missing column',
        csv: 'frequency_hz,real\n1,2\n',
        problem: { row: 1, column: 'imag', message: 'missing column' },
      },
      {
        name: 'an unknown column',
        csv: 'frequency_hz,real,imag,comment\n',
        problem: { row: 1, column: 'comment', message: expect.stringMatching(/unknown column/) },
      },
      {
        name: 'text in a number',
        csv: [good[0], ...good.slice(1, 5), '2.5,abc,0.001', ...good.slice(5)].join('\n'),
        problem: { row: 6, column: 'real', message: 'not a number: "abc"' },
      },
      {
        name: 'non-monotonic frequencies',
        csv: [...good.slice(0, 10), good[8], ...good.slice(10)].join('\n'),
        problem: { row: 11, column: 'frequency_hz', message: expect.stringMatching(/frequencies must increase/) },
      },
      {
        name: 'too few points',
        csv: good.slice(0, 6).join('\n'),
        problem: { row: 0, column: '', message: 'the file has 5 frequency lines; at least 10 are needed' },
      },
      {
        name: 'uneven sampling in a raw record',
        csv: impactCsv(3)
          .split('\n')
          .filter((_, i) => i !== 300)
          .join('\n'),
        fields: { kind: 'impact' },
        problem: { row: 301, column: 'time_s', message: expect.stringMatching(/uneven sampling/) },
      },
      {
        name: 'a raw record with the FRF columns',
        csv: good.join('\n'),
        fields: { kind: 'impact' },
        problem: { row: 1, column: 'frequency_hz', message: expect.stringMatching(/unknown column; a raw record has the columns time_s/) },
      },
      {
        name: 'no resonance in the band',
        csv: ['frequency_hz,real,imag', ...Array.from({ length: 20 }, (_, i) => `${i + 1},${1e-6 / (i + 1)},0`)].join('\n'),
        problem: { row: 0, column: '', message: expect.stringMatching(/No natural frequency could be identified/) },
      },
      {
        name: 'a broken quote',
        csv: 'frequency_hz,real,imag\n1,"2,3\n',
        problem: { row: 2, column: '', message: expect.stringMatching(/quoted field is not closed/) },
      },
    ];
    it.each(cases)('$name', async ({ csv, fields, problem, status }) => {
      const before = await dbFingerprint(t);
      const response = await upload(released.id, 'engineer', csv, fields ?? { kind: 'frf', quantity: 'receptance' });
      expect(response.status).toBe(status ?? 422);
      expect(response.body.statusCode).toBe(response.status);
      expect(response.body.message).toMatch(/^(The file|No natural frequency)/);
      expect(response.body.errors).toContainEqual(problem);
      expect(changedTables(before, await dbFingerprint(t))).toEqual([]);
    });

    it('a file over 10 MB (413), another extension, no file, no quantity, a bad tolerance or kind (400/422) — nothing stored', async () => {
      const before = await dbFingerprint(t);
      const big = Buffer.alloc(10 * 1024 * 1024 + 10, '1,2,3\n');
      const tooBig = await upload(released.id, 'engineer', big, { kind: 'frf', quantity: 'receptance' }).expect(413);
      expect(tooBig.body.message).toMatch(/larger than 10 MB/);
      const excel = await upload(released.id, 'engineer', frfCsv(3), { kind: 'frf', quantity: 'receptance' }, 'tap.xlsx').expect(422);
      expect(excel.body.message).toMatch(/must be a CSV file/);
      const none = await t
        .http()
        .post(`/api/designs/${released.id}/verifications`)
        .set(auth('engineer'))
        .field('kind', 'frf')
        .field('quantity', 'mobility')
        .expect(400);
      expect(none.body.message).toMatch(/multipart field "file"/);
      const noQuantity = await upload(released.id, 'engineer', frfCsv(3), { kind: 'frf' }).expect(400);
      expect(noQuantity.body.errors).toEqual([
        { field: 'quantity', message: expect.stringMatching(/accelerance, mobility or receptance/) },
      ]);
      const tolerance = await upload(released.id, 'engineer', frfCsv(3), {
        kind: 'frf',
        quantity: 'receptance',
        tolerancePct: 'ten',
      }).expect(400);
      expect(tolerance.body.errors[0].field).toBe('tolerancePct');
      await upload(released.id, 'engineer', frfCsv(3), { kind: 'frf', quantity: 'receptance', tolerancePct: '90' }).expect(400);
      await upload(released.id, 'engineer', frfCsv(3), { kind: 'modal', quantity: 'receptance' }).expect(400);
      await upload(released.id, 'engineer', frfCsv(3), { kind: 'impact', quantity: 'receptance' }).expect(400);
      await t.http().post(`/api/designs/${released.id}/verifications`).set(auth('engineer')).send({ kind: 'frf' }).expect(400);
      expect(changedTables(before, await dbFingerprint(t))).toEqual([]);
    });
  });

  it('the PDF report of a measured design gains the as-built section; a design without measurements has none', async () => {
    const purchasing = t.app.get(PurchasingService);
    const designs = t.app.get(DesignsService);
    const admin = { id: 0, role: 'admin' } as User;
    const measured = await purchasing.reportOf(await designs.getVisible(admin, released.id), false);
    expect(pdfHasText(measured, 'As-built verification')).toBe(true);
    expect(pdfHasText(measured, 'stiffer than predicted')).toBe(true);
    const unmeasured = await purchasing.reportOf(await designs.getVisible(admin, draft.id), false);
    expect(pdfHasText(unmeasured, 'As-built verification')).toBe(false);
  });
});
