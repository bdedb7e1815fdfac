import type { Response } from 'supertest';
import { createMount, createSupplier, type CreatedSupplier } from './factories/selection-catalog.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { inflatePdf, pdfHasText } from './utils/pdf-text.js';

const binary = (res: Response, callback: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => callback(null, Buffer.concat(chunks)));
};

/**
 * The words of the selection (reasons and notes) follow the reader's unit system, the figures
 * stay SI and unrounded (PRODUCT.md "One voice"). Conversions: 1 in = 25.4 mm and 1 lbf =
 * 4.4482216152605 N exactly (NIST SP 811, Appendix B); °F = °C × 1.8 + 32.
 */
const G = 9.80665;
const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
/** 3000 kg centred: 3000·g/4 = 7354.99 N on each corner. */
const HEAVY = [{ name: 'Machine', massKg: 3000, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } }];

interface Candidate {
  mountId?: number;
  reasons: string[];
  notes: string[];
  perPoint: { staticDeflectionMm: number; loadN: number }[];
}

describe('reasons and notes in the reader’s units (e2e)', () => {
  let t: TestApp;
  let engineer: string;
  let supplier: CreatedSupplier;
  let firmId: number;

  const setUnits = (unitSystem: 'SI' | 'US') =>
    t.http().patch('/api/auth/me').set('Authorization', `Bearer ${engineer}`).send({ unitSystem }).expect(200);
  const CRITERIA = (ambientTempC?: number) => ({
    minIsolationPct: 50,
    minUtilization: 0.3,
    maxUtilization: 1.0,
    weightMarginPct: 0, // the weights are known: the figures below are without a margin
    ambientTempC,
    supplierIds: [supplier.id],
  });
  const select = async (): Promise<Candidate> => {
    const response = await t
      .http()
      .post('/api/selection')
      .set('Authorization', `Bearer ${engineer}`)
      .send({
        components: HEAVY,
        mountPoints: CORNERS,
        disturbingFrequenciesHz: [24.67],
        criteria: CRITERIA(),
        restraint: { sdsG: 1.0, importanceFactor: 1, zOverH: 0.5, snubberGapMm: 5 },
        limit: 50,
      })
      .expect(200);
    const found = (response.body.candidates as Candidate[]).find((c) => c.mountId === firmId);
    if (!found) throw new Error(`the firm mount is not among the candidates: ${JSON.stringify(response.body).slice(0, 600)}`);
    return found;
  };

  beforeAll(async () => {
    t = await createTestApp();
    engineer = await t.loginAs('engineer');
    const manager = await t.loginAs('catalog_manager');
    supplier = await createSupplier(t, manager, 'Reader Units Mounts');
    // 7355 N on 2.0e5 N/m: 36.77 mm against 30 mm allowed; −20…70 °C against 90 °C; no restraint rating.
    firmId = (
      await createMount(t, manager, supplier.id, {
        partNumber: 'RU-FIRM',
        ratedLoadN: 9000,
        verticalStiffnessNPerM: 2.0e5,
        horizontalStiffnessNPerM: 2.0e5,
        maxDeflectionMm: 30,
        tempMinC: -20,
        tempMaxC: 70,
      })
    ).id;
  });
  afterAll(async () => {
    await setUnits('SI');
    await t.close();
  });

  it('a metric reader reads mm and N', async () => {
    await setUnits('SI');
    const c = await select();
    const words = c.reasons.join('\n');
    expect(words).toContain('Static deflection at point A (36.8 mm) exceeds the 30 mm the mount RU-FIRM allows.');
    expect(words).toMatch(/has no horizontal restraint rating \(points A, B, C, D\); the design force puts up to \d+ N on a mount\./);
    expect(words).not.toMatch(/ in\b|lbf|°F|\u27e6/);
  });

  it('a US customary reader reads inches and lbf; the figures stay SI', async () => {
    await setUnits('SI');
    const metric = await select();
    await setUnits('US');
    const c = await select();
    const words = c.reasons.join('\n');
    // 36.77 mm = 1.448 in, 30 mm = 1.181 in
    expect(words).toContain('Static deflection at point A (1.45 in) exceeds the 1.18 in the mount RU-FIRM allows.');
    const shear = /the design force puts up to (\d+) lbf on a mount\./.exec(words);
    const shearN = Number(/the design force puts up to (\d+) N on a mount\./.exec(metric.reasons.join('\n'))![1]);
    expect(Math.abs(Number(shear![1]) - shearN / 4.4482216152605)).toBeLessThanOrEqual(1);
    expect(words).not.toMatch(/mm|°C|\d N\b|\u27e6/);
    expect(c.perPoint).toEqual(metric.perPoint);
    expect(c.perPoint[0].staticDeflectionMm).toBeCloseTo(((3000 * G) / 4 / 2.0e5) * 1000, 9);
  });

  it('a design’s chosen mounts: words kept once, read by each reader in their own units (°F, in)', async () => {
    await setUnits('SI');
    const auth = { Authorization: `Bearer ${engineer}` };
    const project = await t
      .http()
      .post('/api/projects')
      .set(auth)
      .send({ name: `Reader units ${process.pid}` })
      .expect(201);
    const design = await t
      .http()
      .post(`/api/projects/${project.body.id}/designs`)
      .set(auth)
      .send({
        name: 'Heavy skid',
        input: { components: HEAVY, mountPoints: CORNERS, operating: { speedRpm: 1480, orders: [1] }, criteria: CRITERIA(90) },
      })
      .expect(201);
    await t.http().put(`/api/designs/${design.body.id}`).set(auth).send({ version: 1, chosenMountId: firmId }).expect(200);
    const read = async () => (await t.http().get(`/api/designs/${design.body.id}`).set(auth).expect(200)).body.chosen as Candidate;
    const metric = await read();
    expect(metric.reasons).toContain('The ambient temperature 90 °C is outside the range of RU-FIRM (-20 °C to 70 °C).');
    await setUnits('US');
    const us = await read();
    // 90 °C = 194 °F, −20 °C = −4 °F, 70 °C = 158 °F; 36.77 mm = 1.45 in
    expect(us.reasons).toContain('The ambient temperature 194 °F is outside the range of RU-FIRM (-4 °F to 158 °F).');
    expect(us.reasons).toContain('Static deflection at point B (1.45 in) exceeds the 1.18 in the mount RU-FIRM allows.');
    expect(us.perPoint).toEqual(metric.perPoint);

    // the report the reader downloads, in the same units
    const report = async () =>
      inflatePdf(
        (await t.http().get(`/api/designs/${design.body.id}/report.pdf`).set(auth).buffer(true).parse(binary).expect(200)).body as Buffer,
      );
    const usPdf = await report();
    expect(pdfHasText(usPdf, 'Ambient temperature 194 °F')).toBe(true);
    expect(pdfHasText(usPdf, 'The ambient temperature 194 °F is outside the range of RU-FIRM (-4 °F to 158 °F).')).toBe(true);
    expect(pdfHasText(usPdf, '\u27e6')).toBe(false);
    await setUnits('SI');
    expect(pdfHasText(await report(), 'Ambient temperature 90 °C')).toBe(true);
  });
});
