import { DataSource } from 'typeorm';
import { Design } from '../src/designs/design.entity.js';
import { PurchasingService } from '../src/purchasing/purchasing.service.js';
import { createMount, createSupplier, type CreatedMount, type CreatedSupplier } from './factories/selection-catalog.factory.js';
import { pdfHasText } from './utils/pdf-text.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

/**
 * Seismic restraint in the selection (docs/engineering/seismic-restraint.md §9): with `restraint`
 * in the input every candidate carries its figures and fails without a rating or over it; the
 * design force is worked by hand from ASCE 7-16 Eq. 13.3-1 [REC: ASCE 7-16 §13.3.1, from memory].
 * The per-mount figures themselves are checked against an independent equilibrium solve in
 * tests/reference/restraint-vs-equilibrium.test.ts.
 */
const G = 9.80665;
const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
/** docs/engineering/check-values.md CV-14: 1000 kg, CG (0.0600, 0.0150, 0.3775) m. */
const CV14_SKID = [
  { name: 'Pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 } },
  { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
  { name: 'Base frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 } },
];
/** S_DS 1.0, I_p 1.0, z/h 0.5, gap 5 mm: F_p = 0.4·2.5·1.0·W·2/(2.0/1.0) = 1.0·W, not doubled. */
const RESTRAINT = { sdsG: 1.0, importanceFactor: 1, zOverH: 0.5, snubberGapMm: 5 };

interface RestraintPoint {
  label: string;
  shearN: number;
  tensionN: number;
  compressionN: number;
  restraintCapacityN: number | null;
  upliftCapacityN: number | null;
  passes: boolean;
}
interface Candidate {
  mountId?: number;
  label: string;
  passes: boolean;
  reasons: string[];
  restraint?: {
    codeEdition: string;
    fpN: number;
    designForceN: number;
    verticalForceN: number;
    doubled: boolean;
    limit: string;
    governing: { label: string; kind: string; demandN: number; capacityN: number | null; utilization: number | null; directionDeg: number };
    perPoint: RestraintPoint[];
    passes: boolean;
  };
}

describe('seismic restraint in the selection (e2e)', () => {
  let t: TestApp;
  let engineer: string;
  let supplier: CreatedSupplier;
  let rated: CreatedMount;
  let weak: CreatedMount;
  let noUplift: CreatedMount;
  let open: CreatedMount;

  const select = (body: Record<string, unknown>) =>
    t
      .http()
      .post('/api/selection')
      .set('Authorization', `Bearer ${engineer}`)
      .send({
        components: CV14_SKID,
        mountPoints: CORNERS,
        disturbingFrequenciesHz: [1480 / 60],
        criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [supplier.id] },
        limit: 20,
        ...body,
      });
  const byId = (candidates: Candidate[], mount: CreatedMount) => candidates.find((c) => c.mountId === mount.id)!;

  beforeAll(async () => {
    t = await createTestApp();
    engineer = await t.loginAs('engineer');
    const manager = await t.loginAs('catalog_manager');
    supplier = await createSupplier(t, manager, 'Restraint Test Mounts');
    const spring = { mountType: 'restrained_spring', ratedLoadN: 3000, verticalStiffnessNPerM: 1.0e5, horizontalStiffnessNPerM: 1.0e5 };
    rated = await createMount(t, manager, supplier.id, { ...spring, restraintCapacityN: 20_000, upliftCapacityN: 10_000 });
    weak = await createMount(t, manager, supplier.id, { ...spring, restraintCapacityN: 1_000, upliftCapacityN: 10_000, unitPrice: 40 });
    noUplift = await createMount(t, manager, supplier.id, { ...spring, restraintCapacityN: 20_000, unitPrice: 45 });
    open = await createMount(t, manager, supplier.id, { mountType: 'open_spring', ratedLoadN: 3000, unitPrice: 30 });
  });
  afterAll(() => t.close());

  it('gives every candidate its restraint figures, with the design force worked by hand (F_p = 1.0·W = 9806.65 N)', async () => {
    const response = await select({ restraint: RESTRAINT }).expect(200);
    const candidates = response.body.candidates as Candidate[];
    expect(candidates.length).toBe(4);
    for (const c of candidates) {
      expect(c.restraint).toBeDefined();
      const r = c.restraint!;
      expect(r.codeEdition).toBe('ASCE 7-16');
      expect(r.fpN).toBeCloseTo(1000 * G, 6);
      expect(r.limit).toBe('formula');
      expect(r.doubled).toBe(false);
      expect(r.designForceN).toBeCloseTo(1000 * G, 6);
      expect(r.verticalForceN).toBeCloseTo(0.2 * 1000 * G, 6); // E_v = 0.2·S_DS·D
      expect(r.perPoint.map((p) => p.label)).toEqual(['A', 'B', 'C', 'D']);
      // equilibrium: the shears carry at least the force in any one direction (each is a worst case)
      expect(r.perPoint.reduce((s, p) => s + p.shearN, 0)).toBeGreaterThanOrEqual(1000 * G * (1 - 1e-9));
      expect(['A', 'B', 'C', 'D']).toContain(r.governing.label);
      expect(r.governing.directionDeg).toBeGreaterThanOrEqual(0);
      expect(r.governing.directionDeg).toBeLessThan(360);
    }
    // the CG is high enough for uplift at some corner: 0.9 − 0.2·1.0 = 0.7 of the dead load is left against overturning
    expect(byId(candidates, rated).restraint!.perPoint.some((p) => p.tensionN > 0)).toBe(true);
  });

  it('passes a mount whose ratings cover the demand, and fails the others with the reason in words', async () => {
    const candidates = (await select({ restraint: RESTRAINT }).expect(200)).body.candidates as Candidate[];
    const ok = byId(candidates, rated);
    expect(ok.passes).toBe(true);
    expect(ok.restraint!.passes).toBe(true);
    expect(ok.restraint!.governing.utilization).toBeLessThanOrEqual(1);

    const over = byId(candidates, weak);
    expect(over.passes).toBe(false);
    expect(over.restraint!.governing).toMatchObject({ kind: 'shear', capacityN: 1000 });
    expect(over.reasons.join(' ')).toMatch(/horizontal force .* exceeds the restraint rating/);

    const unratedUplift = byId(candidates, noUplift);
    expect(unratedUplift.passes).toBe(false);
    expect(unratedUplift.reasons.join(' ')).toMatch(/no uplift rating/);

    const unrated = byId(candidates, open);
    expect(unrated.passes).toBe(false);
    expect(unrated.reasons.join(' ')).toMatch(/has no horizontal restraint rating/);
    expect(unrated.restraint!.perPoint.every((p) => p.restraintCapacityN === null && !p.passes)).toBe(true);
    // passing candidates first
    expect(candidates[0]!.mountId).toBe(rated.id);
  });

  it('without restraint in the input the figures are absent and the unrated mounts pass', async () => {
    const candidates = (await select({}).expect(200)).body.candidates as Candidate[];
    expect(candidates.every((c) => c.restraint === undefined)).toBe(true);
    expect(byId(candidates, open).passes).toBe(true);
  });

  it('refuses restraint input outside the code’s ranges with a 400 in words, naming the field', async () => {
    const bad = await select({ restraint: { ...RESTRAINT, sdsG: 150, importanceFactor: 1.2 } }).expect(400);
    const errors = bad.body.errors as { field: string; message: string }[];
    expect(errors).toEqual(
      expect.arrayContaining([
        { field: 'restraint.sdsG', message: 'S_DS must be at most 4 g: give it in g, not in % of g' },
        { field: 'restraint.importanceFactor', message: 'The importance factor I_p is 1.0 or 1.5' },
      ]),
    );
    await select({ restraint: { ...RESTRAINT, zOverH: -1 } }).expect(400);
    await select({ restraint: { sdsG: 1 } }).expect(400);
  });

  it('a design with restraint keeps its figures when the mounts are chosen, and the report has the restraint section', async () => {
    const auth = { Authorization: `Bearer ${engineer}` };
    const project = await t
      .http()
      .post('/api/projects')
      .set(auth)
      .send({ name: `Restraint project ${process.pid}` })
      .expect(201);
    const input = {
      components: CV14_SKID,
      mountPoints: CORNERS,
      operating: { speedRpm: 1480, orders: [1], lineFrequencyHz: 50 },
      criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [supplier.id] },
      restraint: RESTRAINT,
    };
    const design = await t
      .http()
      .post(`/api/projects/${project.body.id}/designs`)
      .set(auth)
      .send({ name: 'Restrained skid', input })
      .expect(201);
    expect(design.body.input.restraint).toEqual(RESTRAINT);
    const run = await t.http().post(`/api/designs/${design.body.id}/selection`).set(auth).send({}).expect(200);
    expect((run.body.candidates as Candidate[])[0]!.restraint).toBeDefined();
    const chosen = await t.http().put(`/api/designs/${design.body.id}`).set(auth).send({ version: 1, chosenMountId: rated.id }).expect(200);
    expect(chosen.body.chosen.restraint.passes).toBe(true);

    const entity = await t.app
      .get(DataSource)
      .getRepository(Design)
      .findOneOrFail({ where: { id: design.body.id }, relations: { project: true, author: true, checker: true } });
    const pdf = await t.app.get(PurchasingService).reportOf(entity, false);
    expect(pdfHasText(pdf, 'Seismic restraint (ASCE 7-16)')).toBe(true);
    expect(pdfHasText(pdf, 'Checked to ASCE 7-16 §13.3.1')).toBe(true);
    expect(pdfHasText(pdf, 'Assumptions:')).toBe(true);
    expect(pdfHasText(pdf, 'Governing:')).toBe(true);
    expect(pdfHasText(pdf, 'does not size anchorage')).toBe(true);
    expect(pdfHasText(pdf, 'structural engineer')).toBe(true);
  });
});
