import { DataSource } from 'typeorm';
import { Design } from '../src/designs/design.entity.js';
import { createMount, createSupplier, type CreatedMount, type CreatedSupplier } from './factories/selection-catalog.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

/**
 * Start-up and coast-down through POST /api/selection and a design (docs/engineering/start-up-passage.md
 * §1–§4, docs/engineering/check-values.md CV-60): the passage listed, the limit failing a candidate
 * with a reason in words, a bad limit refused with the field named, the figures frozen with the choice.
 *
 * Independent figure: a symmetric box on four identical mounts level with its CG, horizontal
 * stiffness equal to the vertical, an unbalance turning about y at the CG. The translations
 * decouple and share one natural frequency √(Σk/m); there the rotating force m_r·e·ω² drives a
 * circle of the one-mass resonant radius F/(η·Σk) = m_r·e/(η·m) (closed form; the one-mass system at
 * resonance, e.g. Harris' Shock and Vibration Handbook, the chapter on the theory of vibration
 * isolation), with e = G/Ω_max (ISO 21940-11: G = e·Ω). Catalog rows are invented.
 */
type Passage = { mode: string; modeFrequencyHz: number; speedRpm: number; motionMm: number };
type Candidate = { mountId?: number; passes: boolean; reasons: string[]; notes: string[]; passage?: Passage[]; passageLimitMm?: number };

const BOX = [{ name: 'Fan set', massKg: 1000, cg: { x: 0, y: 0, z: 0 }, box: { lx: 1.2, ly: 1.0, lz: 0.6 } }];
const POINTS = [
  { label: 'A', x: 0.5, y: 0.4, z: 0 },
  { label: 'B', x: 0.5, y: -0.4, z: 0 },
  { label: 'C', x: -0.5, y: 0.4, z: 0 },
  { label: 'D', x: -0.5, y: -0.4, z: 0 },
];
const FAN = { label: 'Fan', kind: 'unbalance', at: { x: 0, y: 0, z: 0 }, axis: 'y', rotorMassKg: 200, balanceGradeMmPerS: 6.3 };
const OPERATING = { speedRangeRpm: { min: 1200, max: 1500 }, orders: [1], sources: [FAN] };
/** m_r·e/(η·m), e = G/Ω_max, mm (CV-60). */
const ONE_MASS_MM = ((200 * (6.3e-3 / ((2 * Math.PI * 1500) / 60))) / (0.1 * 1000)) * 1000;

describe('start-up passage (e2e)', () => {
  let t: TestApp;
  let engineer: string;
  let supplier: CreatedSupplier;
  let mount: CreatedMount;

  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const request = (criteria: object = {}) => ({
    components: BOX,
    mountPoints: POINTS,
    operating: OPERATING,
    criteria: { minIsolationPct: 85, minUtilization: 0.3, maxUtilization: 1.0, supplierIds: [supplier.id], ...criteria },
  });
  const select = async (criteria: object = {}): Promise<Candidate> => {
    const response = await t.http().post('/api/selection').set(as(engineer)).send(request(criteria));
    expect(response.status).toBe(200);
    const found = (response.body.candidates as Candidate[]).find((c) => c.mountId === mount.id);
    if (!found) throw new Error('the test mount is not among the candidates');
    return found;
  };

  beforeAll(async () => {
    t = await createTestApp();
    engineer = await t.loginAs('engineer');
    const manager = await t.loginAs('catalog_manager');
    supplier = await createSupplier(t, manager);
    mount = await createMount(t, manager, supplier.id, {
      partNumber: 'PASS-E2E',
      mountType: 'elastomer_mount',
      verticalStiffnessNPerM: 2.5e5,
      horizontalStiffnessNPerM: 2.5e5,
      dampingRatio: null,
      lossFactor: 0.1,
      ratedLoadN: 3000,
    });
  });
  afterAll(() => t.close());

  it('CV-60: lists every mode below the running range with the motion at the mounts; the one-mass circle at the translational modes', async () => {
    const c = await select();
    expect(c.passes).toBe(true);
    expect(c.passageLimitMm).toBe(6); // the default (start-up-passage.md §3)
    const passage = c.passage!;
    expect(passage).toHaveLength(6);
    const f0 = Math.sqrt(1e6 / 1000) / (2 * Math.PI);
    const translational = passage.filter((p) => Math.abs(p.modeFrequencyHz / f0 - 1) < 1e-9);
    expect(translational).toHaveLength(3);
    for (const p of translational) {
      expect(p.speedRpm).toBeCloseTo(60 * f0, 9);
      expect(Math.abs(p.motionMm / ONE_MASS_MM - 1)).toBeLessThan(1e-9);
    }
    for (const p of passage) expect(p.speedRpm).toBeLessThan(1200);
    expect(Object.keys(passage[0]).sort()).toEqual(['mode', 'modeFrequencyHz', 'motionMm', 'speedRpm']);
    expect(c.notes.some((n) => /^Start-up and coast-down: 6 modes are passed below the running range; the largest motion/.test(n))).toBe(
      true,
    );
  });

  it('a limit below the motion fails the candidate with a reason in words', async () => {
    const c = await select({ maxResonantMotionMm: 0.05 });
    expect(c.passes).toBe(false);
    expect(c.passageLimitMm).toBe(0.05);
    const reasons = c.reasons.filter((r) => r.startsWith('Start-up and coast-down'));
    expect(reasons).toHaveLength(3);
    for (const r of reasons) {
      expect(r).toMatch(
        /passing the .+ mode at 5\.03 Hz \(302 rpm\), Fan moves the mounts 0\.08 mm \(steady peak\), more than the 0\.05 mm allowed/,
      );
    }
  });

  it("the reason's motions in inches for a US reader (1 in = 25.4 mm exactly, NIST SP 811 Appendix B)", async () => {
    const setUnits = (unitSystem: 'SI' | 'US') => t.http().patch('/api/auth/me').set(as(engineer)).send({ unitSystem }).expect(200);
    await setUnits('US');
    try {
      const c = await select({ maxResonantMotionMm: 0.05 });
      // 0.0802 mm = 0.00316 in; 0.05 mm = 0.00197 in
      expect(c.reasons.find((r) => r.startsWith('Start-up and coast-down'))).toMatch(
        /moves the mounts 0\.0032 in \(steady peak\), more than the 0\.002 in allowed/,
      );
    } finally {
      await setUnits('SI');
    }
  });

  it.each([
    [-1, 'The largest motion on start-up must be more than 0 mm'],
    [0, 'The largest motion on start-up must be more than 0 mm'],
    ['a lot', 'The largest motion on start-up must be a number of millimetres'],
  ])('refuses a limit of %p with the field named', async (limit, message) => {
    const response = await t
      .http()
      .post('/api/selection')
      .set(as(engineer))
      .send(request({ maxResonantMotionMm: limit }));
    expect(response.status).toBe(400);
    expect(response.body.errors).toContainEqual({ field: 'criteria.maxResonantMotionMm', message });
  });

  it('a design keeps its limit, refuses a negative one without changing, and freezes the passage with the choice', async () => {
    const project = await t
      .http()
      .post('/api/projects')
      .set(as(engineer))
      .send({ name: `Passage project ${process.pid}` });
    expect(project.status).toBe(201);
    const created = await t
      .http()
      .post(`/api/projects/${project.body.id}/designs`)
      .set(as(engineer))
      .send({ name: 'Fan on rubber', input: request({ maxResonantMotionMm: 2 }) });
    expect(created.status).toBe(201);
    const id = created.body.id as number;
    const bad = await t
      .http()
      .put(`/api/designs/${id}`)
      .set(as(engineer))
      .send({ version: created.body.version, input: request({ maxResonantMotionMm: -3 }) });
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toContainEqual({
      field: 'input.criteria.maxResonantMotionMm',
      message: 'The largest motion on start-up must be more than 0 mm',
    });
    const kept = await t.http().get(`/api/designs/${id}`).set(as(engineer));
    expect(kept.body.input.criteria.maxResonantMotionMm).toBe(2);
    expect(kept.body.version).toBe(created.body.version);

    const chosen = await t
      .http()
      .put(`/api/designs/${id}`)
      .set(as(engineer))
      .send({ version: created.body.version, chosenMountId: mount.id });
    expect(chosen.status).toBe(200);
    expect(chosen.body.chosen.passageLimitMm).toBe(2);
    const row = await t.app.get(DataSource).getRepository(Design).findOneByOrFail({ id });
    expect(row.snapshot?.wholeMachine?.passage).toEqual(chosen.body.chosen.passage);
    expect(row.snapshot?.wholeMachine?.passage).toHaveLength(6);
    expect(row.snapshot?.wholeMachine?.passageLimitMm).toBe(2);
  });
});
