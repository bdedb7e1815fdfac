import { createMount, createSupplier, type CreatedSupplier } from './factories/selection-catalog.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

/**
 * POST /api/selection, honest under uncertainty (docs/engineering/selection.md §14–§17): the
 * flexible support, the assumptions of every candidate, the springs' checks, the load margins, and
 * the 400s for input that would break them. Expected values from hand calculations
 * (docs/engineering/check-values.md CV-50, CV-51).
 */
const G = 9.80665;
const TWO_PI = 2 * Math.PI;
const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
const MACHINE = [{ name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } }];

type Candidate = {
  mountId?: number;
  passes: boolean;
  reasons: string[];
  notes: string[];
  assumptions: string[];
  verticalNaturalFrequencyHz: number;
  levelErrorMm: number;
  perPoint: { label: string; staticDeflectionMm: number; supportDeflectionMm?: number }[];
};

describe('selection: support, assumptions, springs, margins (e2e)', () => {
  let t: TestApp;
  let engineer: string;
  let rubber: CreatedSupplier;
  let springs: CreatedSupplier;
  let fullId: number;
  let noHorizontalId: number;
  let springId: number;
  let noRatioId: number;

  const select = (body: object) => t.http().post('/api/selection').set('Authorization', `Bearer ${engineer}`).send(body);
  const request = (overrides: object = {}, supplierIds = [rubber.id]) => ({
    components: MACHINE,
    mountPoints: CORNERS,
    disturbingFrequenciesHz: [25],
    criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, supplierIds },
    limit: 50,
    ...overrides,
  });
  const candidate = (body: { candidates: Candidate[] }, id: number) => {
    const found = body.candidates.find((c) => c.mountId === id);
    if (!found) throw new Error(`mount ${id} is not among the candidates`);
    return found;
  };

  beforeAll(async () => {
    t = await createTestApp();
    engineer = await t.loginAs('engineer');
    const manager = await t.loginAs('catalog_manager');
    rubber = await createSupplier(t, manager);
    const elastomer = { mountType: 'elastomer_mount', dampingRatio: undefined, lossFactor: 0.1 };
    fullId = (await createMount(t, manager, rubber.id, { ...elastomer, partNumber: 'FULL-1' })).id;
    noHorizontalId = (await createMount(t, manager, rubber.id, { ...elastomer, partNumber: 'NOKH-1', horizontalStiffnessNPerM: undefined }))
      .id;
    noRatioId = (await createMount(t, manager, rubber.id, { ...elastomer, partNumber: 'NOND-1', dynamicStiffnessRatio: undefined })).id;
    springs = await createSupplier(t, manager);
    springId = (await createMount(t, manager, springs.id, { partNumber: 'SPR-1', horizontalStiffnessNPerM: 0.79e5 })).id;
  });
  afterAll(() => t.close());

  it('CV-50: a support 10× the mount lowers fn to √(4·90 909.09/1000)/2π; each point reports the support deflection', async () => {
    const response = await select(request({ mountPoints: CORNERS.map((p) => ({ ...p, supportStiffnessNPerMm: 1000 })) }));
    expect(response.status).toBe(200);
    const c = candidate(response.body, fullId);
    expect(c.verticalNaturalFrequencyHz).toBeCloseTo(Math.sqrt((4 * 90909.0909) / 1000) / TWO_PI, 6);
    expect(c.perPoint[0].supportDeflectionMm).toBeCloseTo((1000 * G) / 4 / 1000, 9);
    expect(c.notes.some((n) => n.startsWith('The support under the mounts is flexible'))).toBe(true);
    expect(c.notes.some((n) => n.startsWith('Warning: the support'))).toBe(false);
    // 400 N/mm: less than 10× the 100 N/mm mount — the rule-of-thumb warning
    const soft = await select(request({ mountPoints: CORNERS.map((p) => ({ ...p, supportStiffnessNPerMm: 400 })) }));
    expect(candidate(soft.body, fullId).notes).toContainEqual(
      expect.stringMatching(/^Warning: the support at point A, point B, point C, point D is less than 10×/),
    );
  });

  it('every candidate carries its assumptions; full data ranks above the same mount without a horizontal stiffness', async () => {
    const response = await select(request());
    expect(response.status).toBe(200);
    const candidates: Candidate[] = response.body.candidates;
    expect(candidates.every((c) => Array.isArray(c.assumptions))).toBe(true);
    expect(candidate(response.body, fullId).assumptions).toEqual([]);
    expect(candidate(response.body, noHorizontalId).assumptions).toEqual([
      expect.stringMatching(/^NOKH-1: the catalog gives no horizontal stiffness/),
    ]);
    const order = candidates.map((c) => c.mountId);
    expect(order.indexOf(fullId)).toBeLessThan(order.indexOf(noHorizontalId));
  });

  it('CV-54: a mount stored without a dynamic ratio is computed with 2.0 (elastomer) and says so; with 1.0 given it is not', async () => {
    const response = await select(request());
    const missing = candidate(response.body, noRatioId);
    const given = candidate(response.body, fullId); // same mount, ratio 1.0 given
    expect(missing.verticalNaturalFrequencyHz).toBeCloseTo(Math.sqrt((2 * 4 * 1e5) / 1000) / TWO_PI, 9);
    expect(given.verticalNaturalFrequencyHz).toBeCloseTo(Math.sqrt((4 * 1e5) / 1000) / TWO_PI, 9);
    expect(missing.assumptions).toEqual([
      expect.stringMatching(/^NOND-1: the catalog gives no dynamic-to-static stiffness ratio; 2 is assumed/),
    ]);
    const stored = await t.http().get(`/api/mounts/${noRatioId}`).set('Authorization', `Bearer ${engineer}`);
    expect(stored.body.dynamicStiffnessRatio).toBeNull();
  });

  it('CV-51: an open spring with k_h/k_v = 0.79 fails lateral stability, with the reason', async () => {
    const response = await select(request({}, [springs.id]));
    const c = candidate(response.body, springId);
    expect(c.passes).toBe(false);
    expect(c.reasons).toContainEqual(
      expect.stringMatching(/^SPR-1 is laterally unstable: its horizontal stiffness is 0\.79× the vertical/),
    );
    expect(c.assumptions).toContainEqual(expect.stringMatching(/^Coil surge not checked/));
  });

  it('a second mass case (altMassKg): its figures are returned and the verdict covers it', async () => {
    const components = [
      { name: 'Machine', massKg: 600, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } },
      { name: 'Liquid', massKg: 400, altMassKg: 40, cg: { x: 0.4, y: 0, z: 0.4 }, box: { lx: 0.5, ly: 0.5, lz: 0.4 } },
    ];
    const response = await select(
      request({
        components,
        disturbingFrequenciesHz: [12],
        criteria: { minIsolationPct: 90, minUtilization: 0.3, maxUtilization: 1, supplierIds: [rubber.id] },
      }),
    );
    expect(response.status).toBe(200);
    const c = candidate(response.body, fullId) as Candidate & {
      altMassCase: { massKg: number; verticalNaturalFrequencyHz: number; passes: boolean };
    };
    // CV-55: 640 kg drained, fn 3.9789 Hz, isolation at 12 Hz 87.6 % < 90 %
    expect(c.altMassCase.massKg).toBeCloseTo(640, 9);
    expect(c.altMassCase.verticalNaturalFrequencyHz).toBeCloseTo(Math.sqrt((4 * 1e5) / 640) / TWO_PI, 9);
    expect(c.altMassCase.passes).toBe(false);
    expect(c.passes).toBe(false);
    expect(c.reasons).toContainEqual(expect.stringMatching(/^In the second mass case \(640 kg/));
  });

  it.each([
    ['a second mass of zero', { components: [{ ...MACHINE[0], altMassKg: 0 }] }, 'components.0.altMassKg', /above 0 kg/],
    [
      'a utilisation window above the rating',
      { criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.2 } },
      'criteria.maxUtilization',
      /may not be loaded beyond its rated load/,
    ],
    [
      'a support of zero stiffness',
      { mountPoints: CORNERS.map((p, i) => ({ ...p, supportStiffnessNPerMm: i === 1 ? 0 : 1000 })) },
      'mountPoints.1.supportStiffnessNPerMm',
      /above 0 N\/mm/,
    ],
    [
      'a negative support stiffness',
      { mountPoints: CORNERS.map((p, i) => ({ ...p, supportStiffnessNPerMm: i === 0 ? -5 : 1000 })) },
      'mountPoints.0.supportStiffnessNPerMm',
      /above 0 N\/mm/,
    ],
    [
      'a support stiffness as text',
      { mountPoints: CORNERS.map((p, i) => ({ ...p, supportStiffnessNPerMm: i === 0 ? 'stiff' : 1000 })) },
      'mountPoints.0.supportStiffnessNPerMm',
      /./,
    ],
  ])('answers 400 in words naming the field for %s', async (_case, overrides, field, words) => {
    const response = await select(request(overrides));
    expect(response.status).toBe(400);
    const error = response.body.errors.find((e: { field: string }) => e.field === field);
    expect(error).toBeDefined();
    expect(error.message).toMatch(words);
  });
});
