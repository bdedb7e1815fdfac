import { mountLoads } from '@tacet/vibration';
import { createMount, createSupplier, type CreatedMount, type CreatedSupplier } from './factories/selection-catalog.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

/**
 * POST /api/selection against hand-computed cases. Expected values come from closed forms
 * (docs/engineering/transmissibility.md §2, docs/engineering/static-deflection.md §2,
 * docs/engineering/mount-loads.md §2 [CF]; textbook results, e.g. Rao, Mechanical Vibrations)
 * computed here independently, and from the check values docs/engineering/check-values.md
 * CV-14, CV-15, CV-20. The checks and the score: docs/engineering/selection.md.
 */
const G = 9.80665;
const TWO_PI = 2 * Math.PI;

/** Viscous transmissibility √(1 + (2ζr)²)/√((1 − r²)² + (2ζr)²) — docs/engineering/transmissibility.md §2 [CF]. */
const viscousT = (r: number, zeta: number) => Math.sqrt(1 + (2 * zeta * r) ** 2) / Math.sqrt((1 - r * r) ** 2 + (2 * zeta * r) ** 2);

const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];

/** docs/engineering/check-values.md CV-14: pump, motor and base frame as point masses. */
const CV14_SKID = [
  { name: 'Pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 } },
  { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
  { name: 'Base frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 } },
];

/** 1000 kg centred over the corners, with box dimensions so that its inertia is known. */
const CENTRED_MACHINE = [{ name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } }];

const SHAFT_1480 = 1480 / 60; // 24.667 Hz — CV-13

type Candidate = {
  kind: string;
  mountId?: number;
  seriesId?: string;
  label: string;
  passes: boolean;
  reasons: string[];
  notes: string[];
  perPoint: { label: string; mountId: number; partNumber: string; loadN: number; utilization: number; staticDeflectionMm: number }[];
  verticalNaturalFrequencyHz: number;
  isolation: { frequencyHz: number; transmissibility: number; efficiencyPct: number; dB: number }[];
  levelErrorMm: number;
  modes?: { frequencyHz: number; dominant: string; coupled: boolean; energyFractions: Record<string, number> }[];
  weightMarginPct: number;
  score: number;
  scoreTerms: Record<string, number>;
  totalPrice: number | null;
};

type WholeMachine = {
  worst: {
    transmissibility: number;
    efficiencyPct: number;
    frequencyHz: number;
    speedRpm: number | null;
    source: string;
    stiffnessFactor: number;
  };
  stiffnessTolerancePct: number;
  perFrequency: {
    source: string;
    frequencyHz: number;
    speedRpm: number | null;
    transmissibility: number;
    perPoint: { label: string; forceN: number }[];
  }[];
};

describe('selection (e2e)', () => {
  let t: TestApp;
  let engineer: string;
  let springs: CreatedSupplier;
  let levelling: CreatedSupplier;
  let stiffSideways: CreatedSupplier;
  let soft: CreatedMount; // k = 1.0e5 N/m, 3000 N
  let offset: CreatedMount; // k = 2.0e5 N/m, 3400 N
  let swayMount: CreatedMount;
  const series: CreatedMount[] = [];

  const select = (body: object) => t.http().post('/api/selection').set('Authorization', `Bearer ${engineer}`).send(body);

  const request = (overrides: object = {}) => ({
    components: CENTRED_MACHINE,
    mountPoints: CORNERS,
    disturbingFrequenciesHz: [SHAFT_1480, 2 * SHAFT_1480],
    criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [springs.id] },
    limit: 200,
    ...overrides,
  });

  const find = (candidates: Candidate[], mountId: number) => {
    const found = candidates.find((c) => c.kind === 'uniform' && c.mountId === mountId);
    if (!found) throw new Error(`mount ${mountId} is not among the candidates`);
    return found;
  };

  beforeAll(async () => {
    t = await createTestApp();
    engineer = await t.loginAs('engineer');
    const manager = await t.loginAs('catalog_manager');
    springs = await createSupplier(t, manager);
    soft = await createMount(t, manager, springs.id, { partNumber: 'SOFT-3000', verticalStiffnessNPerM: 1.0e5, ratedLoadN: 3000 });
    offset = await createMount(t, manager, springs.id, {
      partNumber: 'FIRM-3400',
      verticalStiffnessNPerM: 2.0e5,
      horizontalStiffnessNPerM: 2.0e5,
      ratedLoadN: 3400,
      maxDeflectionMm: 30,
    });
    // A series whose sizes deflect 30 mm at their rated load (invented).
    levelling = await createSupplier(t, manager);
    for (const rated of [2700, 2950, 3200, 3450, 3700]) {
      series.push(
        await createMount(t, manager, levelling.id, {
          partNumber: `LV-${rated}`,
          series: 'LV',
          ratedLoadN: rated,
          verticalStiffnessNPerM: rated / 0.03,
          horizontalStiffnessNPerM: rated / 0.03,
        }),
      );
    }
    // Vertically soft, sideways very stiff: surge and sway land near 1× shaft.
    stiffSideways = await createSupplier(t, manager);
    swayMount = await createMount(t, manager, stiffSideways.id, {
      partNumber: 'SWAY-3000',
      verticalStiffnessNPerM: 1.0e5,
      horizontalStiffnessNPerM: 6.0e6,
    });
  });
  afterAll(() => t.close());

  it('symmetric CG: equal loads W/4, deflection W/(4k), fn = √(n_d·Σk/m)/2π, T per frequency from the closed form', async () => {
    const response = await select(request());
    expect(response.status).toBe(200);
    const body = response.body;
    expect(body.totalMassKg).toBe(1000);
    expect(body.cg).toEqual({ x: 0, y: 0, z: 0.3 });
    body.pointLoadsN.forEach((f: number) => expect(f).toBeCloseTo((1000 * G) / 4, 8)); // 2451.66 N
    expect(body.disturbingFrequenciesHz).toEqual([SHAFT_1480, 2 * SHAFT_1480]);

    const c = find(body.candidates, soft.id);
    expect(c.passes).toBe(true);
    expect(c.reasons).toEqual([]);
    expect(c.label).toBe('SOFT-3000');
    expect(c.perPoint.map((p) => p.label)).toEqual(['A', 'B', 'C', 'D']);
    for (const p of c.perPoint) {
      expect(p.partNumber).toBe('SOFT-3000');
      expect(p.loadN).toBeCloseTo(2451.6625, 6);
      expect(p.utilization).toBeCloseTo(2451.6625 / 3000, 10);
      expect(p.staticDeflectionMm).toBeCloseTo(24.516625, 8);
    }
    // CV-20: √(4·1.0e5/1000) = 20 rad/s → 3.183 Hz
    const fn = 20 / TWO_PI;
    expect(c.verticalNaturalFrequencyHz).toBeCloseTo(fn, 10);
    expect(c.verticalNaturalFrequencyHz.toFixed(3)).toBe('3.183');
    c.isolation.forEach((row, j) => {
      const f = body.disturbingFrequenciesHz[j];
      const expected = viscousT(f / fn, 0.05);
      expect(row.frequencyHz).toBe(f);
      expect(row.transmissibility).toBeCloseTo(expected, 12);
      expect(row.efficiencyPct).toBeCloseTo((1 - expected) * 100, 10);
      expect(row.dB).toBeCloseTo(-20 * Math.log10(expected), 10);
    });
    expect(c.levelErrorMm).toBeCloseTo(0, 9);
    expect(c.totalPrice).toBe(200);
    // the six rigid-body modes of the best candidates; bounce is uncoupled here: √(4k/m)/2π
    expect(c.modes).toHaveLength(6);
    const bounce = c.modes!.find((m) => m.dominant === 'bounce')!;
    expect(bounce.frequencyHz).toBeCloseTo(fn, 8);
    // each mode carries its kinetic-energy shares (docs/engineering/rigid-body-modes.md §6)
    for (const mode of c.modes!) {
      expect(Object.keys(mode.energyFractions).sort()).toEqual(['bounce', 'pitch', 'roll', 'surge', 'sway', 'yaw']);
      expect(Object.values(mode.energyFractions).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 9);
      expect(mode.energyFractions[mode.dominant]).toBe(Math.max(...Object.values(mode.energyFractions)));
    }
    expect(bounce.energyFractions.bounce).toBeCloseTo(1, 9);
    expect(c.weightMarginPct).toBe(0);
    expect(Object.values(c.scoreTerms).reduce((a, b) => a + b, 0)).toBeCloseTo(c.score, 12);
  });

  it('offset CG (CV-14 on CV-15 mounts): the rigid-frame loads, not the lever-rule product', async () => {
    const response = await select(request({ components: CV14_SKID }));
    expect(response.status).toBe(200);
    const c = find(response.body.candidates, offset.id);
    const loads = c.perPoint.map((p) => p.loadN);
    // CV-15 quoted values [N], order (+,+), (+,−), (−,+), (−,−)
    [2717.3, 2553.8, 2349.5, 2186.1].forEach((quoted, i) => expect(Math.abs(loads[i] - quoted)).toBeLessThan(0.05));
    // the lever-rule product must not match
    [2723.4, 2547.7, 2343.4, 2192.2].forEach((lever, i) => expect(Math.abs(loads[i] - lever)).toBeGreaterThan(5));
    // and the calculation library agrees to rounding
    const library = mountLoads({ points: CORNERS, stiffnessNPerM: 2e5, weightN: 1000 * G, cg: { x: 0.06, y: 0.015 } });
    library.loadsN.forEach((f, i) => expect(loads[i]).toBeCloseTo(f, 8));
    // CV-15 deflections 13.59 / 12.77 / 11.75 / 10.93 mm
    expect(c.perPoint.map((p) => p.staticDeflectionMm.toFixed(2))).toEqual(['13.59', '12.77', '11.75', '10.93']);
    expect(c.levelErrorMm).toBeCloseTo(((loads[0] - loads[3]) / 2e5) * 1000, 9);
    expect(response.body.cg.x).toBeCloseTo(0.06, 12);
    expect(response.body.cg.y).toBeCloseTo(0.015, 12);
    expect(response.body.cg.z).toBeCloseTo(0.3775, 12);
  });

  it('a frequency below √2·fn is amplified: the whole-machine verdict fails it at the stiff end of the ±10 % band', async () => {
    // fn = 3.183 Hz → √2·fn = 4.50 Hz; 4 Hz is amplified, not isolated. A symmetric machine with a vertical force
    // through its CG reduces to the one-mass system (docs/engineering/selection.md §19); a steel spring's band is
    // ±10 % (§20, common practice), and the stiff end, fn·√1.1, lies nearer 4 Hz.
    const response = await select(request({ disturbingFrequenciesHz: [SHAFT_1480, 4] }));
    expect(response.status).toBe(200);
    const c = find(response.body.candidates, soft.id) as Candidate & { wholeMachine: WholeMachine };
    expect(c.passes).toBe(false);
    // the quick figure (bounce estimate) stays as it was
    expect(c.isolation[1].transmissibility).toBeCloseTo(viscousT(4 / (20 / TWO_PI), 0.05), 12);
    const stiff = viscousT(4 / ((20 / TWO_PI) * Math.sqrt(1.1)), 0.05);
    expect(c.wholeMachine.worst.transmissibility).toBeCloseTo(stiff, 9);
    expect(c.wholeMachine.worst).toMatchObject({ frequencyHz: 4, speedRpm: null, stiffnessFactor: 1.1 });
    expect(c.wholeMachine.stiffnessTolerancePct).toBe(10);
    expect(c.reasons).toEqual([
      `Whole machine, Vertical force through the CG, 4 Hz: at 4 Hz (stiffness 10 % above nominal) the mounts amplify the force ` +
        `(transmissibility ${stiff.toFixed(2)}) instead of isolating it; 90 % isolation is required.`,
    ]);
  });

  it('isolation below the requirement names the source, the efficiency and the band end', async () => {
    // 8 Hz: r = 2.513 nominal; the stiff end (fn·√1.1) isolates least
    const response = await select(request({ disturbingFrequenciesHz: [8] }));
    const c = find(response.body.candidates, soft.id);
    expect(c.passes).toBe(false);
    const efficiency = (1 - viscousT(8 / ((20 / TWO_PI) * Math.sqrt(1.1)), 0.05)) * 100;
    expect(c.reasons[0]).toBe(
      `Whole machine, Vertical force through the CG, 8 Hz: isolation ${efficiency.toFixed(1)} % at 8 Hz (stiffness 10 % above nominal), below the 90 % required.`,
    );
  });

  it('with the band set to 0 the verdict is the one-mass transmissibility at the nominal stiffness', async () => {
    const response = await select(
      request({
        disturbingFrequenciesHz: [8],
        criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [springs.id], stiffnessTolerancePct: 0 },
      }),
    );
    const c = find(response.body.candidates, soft.id) as Candidate & { wholeMachine: WholeMachine };
    const nominal = viscousT(8 / (20 / TWO_PI), 0.05);
    expect(c.wholeMachine.worst.transmissibility).toBeCloseTo(nominal, 9);
    expect(c.wholeMachine.worst.stiffnessFactor).toBe(1);
    expect(c.passes).toBe(true); // 80.6 % ≥ 80 %
  });

  it('sorts passing candidates first, by score, then failing ones with their reasons', async () => {
    // CV-15 loads 2717 / 2554 / 2350 / 2186 N with a 5 % weight margin, window 50–85 %:
    // the 3400 N mount stays at 84 % or less; the 3000 N one is over at A and B
    const response = await select(
      request({
        components: CV14_SKID,
        criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 0.85, weightMarginPct: 5, supplierIds: [springs.id] },
      }),
    );
    const candidates: Candidate[] = response.body.candidates;
    const firstFailing = candidates.findIndex((c) => !c.passes);
    expect(firstFailing).toBeGreaterThan(0);
    expect(candidates.slice(firstFailing).every((c) => !c.passes)).toBe(true);
    const passingScores = candidates.slice(0, firstFailing).map((c) => c.score);
    expect(passingScores).toEqual([...passingScores].sort((a, b) => b - a));
    const failed = find(candidates, soft.id);
    expect(failed.reasons).toEqual([
      'Load outside the allowed 50 %–85 % of the rated load with the 5 % weight margin at point A (95 %), point B (89 %).',
    ]);
    expect(find(candidates, offset.id).passes).toBe(true);
    // the margin the checks applied travels with every candidate, so screens show utilisation on the same basis
    expect(candidates.every((c) => c.weightMarginPct === 5)).toBe(true);
    expect(response.body.considered).toBe(2);
    expect(response.body.elapsedMs).toBeGreaterThanOrEqual(0);
  });

  it('reads only the mounts whose rated load suits at least one point (the SQL prefilter)', async () => {
    // equal loads of 2452 N at full utilisation with a 25 % margin need P_r ≥ 3065 N: only the 3400 N mount qualifies
    const response = await select(
      request({
        criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, weightMarginPct: 25, supplierIds: [springs.id] },
      }),
    );
    expect(response.body.considered).toBe(1);
    expect(response.body.candidates.map((c: Candidate) => c.mountId)).toEqual([offset.id]);
  });

  it('a series with the size picked per point comes out level; one size everywhere does not', async () => {
    const response = await select(
      request({
        components: CV14_SKID,
        criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [levelling.id] },
      }),
    );
    const candidates: Candidate[] = response.body.candidates;
    const levelled = candidates.find((c) => c.kind === 'series');
    expect(levelled).toBeDefined();
    expect(levelled!.seriesId).toBe(`${levelling.id}:LV`);
    expect(levelled!.passes).toBe(true);
    // k_req = F_i/δ₀ with δ₀ = 0.8 × 30 mm: the sizes closest to it, heaviest corner stiffest
    expect(levelled!.perPoint.map((p) => p.partNumber)).toEqual(['LV-3450', 'LV-3200', 'LV-2950', 'LV-2700']);
    expect(levelled!.label).toBe('Series LV: LV-3450 ×1, LV-3200 ×1, LV-2950 ×1, LV-2700 ×1');
    // loads re-solved with the picked stiffnesses still carry the weight
    expect(levelled!.perPoint.reduce((sum, p) => sum + p.loadN, 0)).toBeCloseTo(1000 * G, 6);
    const uniform = candidates.filter((c) => c.kind === 'uniform');
    expect(uniform.length).toBeGreaterThan(0);
    const bestUniformLevel = Math.min(...uniform.map((c) => c.levelErrorMm));
    expect(levelled!.levelErrorMm).toBeLessThan(bestUniformLevel / 4);
    const deflections = levelled!.perPoint.map((p) => p.staticDeflectionMm);
    expect(levelled!.levelErrorMm).toBeCloseTo(Math.max(...deflections) - Math.min(...deflections), 9);
  });

  it('a rigid-body mode near a disturbing frequency is judged by the whole machine: not driven, it passes with a note; driven, it fails', async () => {
    // mounts at the CG height: surge and sway are uncoupled at √(4·6.0e6/1000)/2π = 24.66 Hz
    const points = CORNERS.map((p) => ({ ...p, z: 0.3 }));
    const criteria = { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [stiffSideways.id] };
    const vertical = await select(request({ mountPoints: points, disturbingFrequenciesHz: [SHAFT_1480], criteria }));
    const c = find(vertical.body.candidates, swayMount.id);
    const surge = c.modes!.find((m) => m.dominant === 'surge')!;
    expect(surge.frequencyHz).toBeCloseTo(Math.sqrt(24000) / TWO_PI, 6);
    // a vertical force through the CG of a symmetric machine drives bounce only
    expect(c.passes).toBe(true);
    expect(c.notes.some((n) => /^The (surge|sway) mode at 24\.66 Hz lies within ±20 % of the disturbing frequency 24\.67 Hz/.test(n))).toBe(
      true,
    );
    // an unbalance turning in the horizontal plane at the CG drives surge and sway at 1480 rpm
    const driven = await select({
      ...request({ mountPoints: points, criteria, disturbingFrequenciesHz: undefined }),
      operating: {
        speedRpm: 1480,
        orders: [1],
        sources: [{ label: 'Rotor', kind: 'unbalance', at: { x: 0, y: 0, z: 0.3 }, axis: 'z', rotorMassKg: 50 }],
      },
    });
    expect(driven.status).toBe(200);
    const d = find(driven.body.candidates, swayMount.id) as Candidate & { wholeMachine: WholeMachine };
    expect(d.passes).toBe(false);
    expect(d.wholeMachine.worst.transmissibility).toBeGreaterThan(1); // well damped: viscous rows damp as 2ζω/ω_v (selection.md §19)
    expect(d.reasons[0]).toMatch(
      /^Whole machine, Rotor: at 1480 rpm, 24\.67 Hz \((nominal stiffness|stiffness 10 % (above|below) nominal)\) the mounts amplify the force/,
    );
  });

  it('a CG outside the mount polygon fails every candidate with that reason (not a 500)', async () => {
    const response = await select(request({ components: [{ name: 'Overhung', massKg: 1000, cg: { x: 1.2, y: 0, z: 0.3 } }] }));
    expect(response.status).toBe(200);
    expect(response.body.candidates.length).toBeGreaterThan(0);
    for (const c of response.body.candidates as Candidate[]) {
      expect(c.passes).toBe(false);
      expect(c.reasons[0]).toMatch(/centre of gravity .* lies outside the polygon of the mount points/);
    }
  });

  it('keeps the order of the mount points and of the frequencies as sent', async () => {
    const reversed = [...CORNERS].reverse();
    const response = await select(request({ mountPoints: reversed, disturbingFrequenciesHz: [2 * SHAFT_1480, SHAFT_1480] }));
    const c = find(response.body.candidates, soft.id);
    expect(c.perPoint.map((p) => p.label)).toEqual(['D', 'C', 'B', 'A']);
    expect(c.isolation.map((i) => i.frequencyHz)).toEqual([2 * SHAFT_1480, SHAFT_1480]);
  });

  it('sees every catalog change at once: an edit, a retirement, a restore, a retired supplier, an import', async () => {
    const manager = await t.loginAs('catalog_manager');
    const as = { Authorization: `Bearer ${manager}` };
    const fresh = await createSupplier(t, manager, 'Selection Freshness Mounts');
    const part = await createMount(t, manager, fresh.id, { partNumber: 'FRESH-3000', verticalStiffnessNPerM: 1.0e5 });
    const run = async () =>
      (await select(request({ criteria: { ...request().criteria, supplierIds: [fresh.id] } })).expect(200)).body.candidates as Candidate[];
    const fn = (k: number) => Math.sqrt((4 * k) / 1000) / TWO_PI; // n_d = 1, four mounts, 1000 kg [CF]

    expect(find(await run(), part.id).verticalNaturalFrequencyHz).toBeCloseTo(fn(1.0e5), 6);
    await t.http().patch(`/api/mounts/${part.id}`).set(as).send({ verticalStiffnessNPerM: 1.2e5 }).expect(200);
    expect(find(await run(), part.id).verticalNaturalFrequencyHz).toBeCloseTo(fn(1.2e5), 6);

    await t.http().delete(`/api/mounts/${part.id}`).set(as).expect(200);
    expect(await run()).toEqual([]);
    await t.http().patch(`/api/mounts/${part.id}`).set(as).send({ active: true }).expect(200);
    expect((await run()).map((c) => c.mountId)).toEqual([part.id]);

    await t.http().patch(`/api/suppliers/${fresh.id}`).set(as).send({ active: false }).expect(200);
    expect(await run()).toEqual([]);
    await t.http().patch(`/api/suppliers/${fresh.id}`).set(as).send({ active: true }).expect(200);

    const csv =
      'supplier,part_number,mount_type,rated_load_n,vertical_stiffness_n_per_mm,damping_ratio\n' +
      `${fresh.name},FRESH-IMPORTED,open_spring,3000,90,0.05\n`;
    const imported = await t.http().post('/api/mounts/import').set(as).attach('file', Buffer.from(csv), 'fresh.csv').expect(200);
    expect(imported.body.created).toBe(1);
    expect((await run()).map((c) => c.label).join(' ')).toContain('FRESH-IMPORTED');
  });

  it.each<[string, object, string]>([
    ['a zero mass', { components: [{ name: 'M', massKg: 0, cg: { x: 0, y: 0, z: 0 } }] }, 'components.0.massKg'],
    ['a negative mass', { components: [{ name: 'M', massKg: -5, cg: { x: 0, y: 0, z: 0 } }] }, 'components.0.massKg'],
    ['a mass as text', { components: [{ name: 'M', massKg: '12', cg: { x: 0, y: 0, z: 0 } }] }, 'components.0.massKg'],
    ['a component without a CG', { components: [{ name: 'M', massKg: 5 }] }, 'components.0.cg'],
    ['no component', { components: [] }, 'components'],
    [
      '10,000 components',
      { components: Array.from({ length: 10_000 }, () => ({ name: 'c', massKg: 1, cg: { x: 0, y: 0, z: 0 } })) },
      'components',
    ],
    ['2 mount points', { mountPoints: CORNERS.slice(0, 2) }, 'mountPoints'],
    ['65 mount points', { mountPoints: Array.from({ length: 65 }, (_, i) => ({ label: `P${i}`, x: i, y: i % 2, z: 0 })) }, 'mountPoints'],
    ['collinear mount points', { mountPoints: [0, 1, 2].map((i) => ({ label: `P${i}`, x: i, y: 0, z: 0 })) }, 'mountPoints'],
    ['duplicate point labels', { mountPoints: CORNERS.map((p) => ({ ...p, label: 'A' })) }, 'mountPoints'],
    ['an over-long point label', { mountPoints: CORNERS.map((p, i) => ({ ...p, label: `${'x'.repeat(40)}${i}` })) }, 'mountPoints.0.label'],
    ['a zero frequency', { disturbingFrequenciesHz: [0, 24] }, 'disturbingFrequenciesHz'],
    ['a negative frequency', { disturbingFrequenciesHz: [-24] }, 'disturbingFrequenciesHz'],
    ['no frequency', { disturbingFrequenciesHz: [] }, 'disturbingFrequenciesHz'],
    ['51 frequencies', { disturbingFrequenciesHz: Array.from({ length: 51 }, (_, i) => i + 1) }, 'disturbingFrequenciesHz'],
    [
      'an inverted utilisation window',
      { criteria: { minIsolationPct: 90, minUtilization: 0.9, maxUtilization: 0.6 } },
      'criteria.maxUtilization',
    ],
    ['a window above 1.5', { criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.6 } }, 'criteria.maxUtilization'],
    ['100 % isolation', { criteria: { minIsolationPct: 100, minUtilization: 0.5, maxUtilization: 1 } }, 'criteria.minIsolationPct'],
    [
      'an unknown mount type',
      { criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1, mountTypes: ['pogo'] } },
      'criteria.mountTypes',
    ],
    ['a limit above 200', { limit: 201 }, 'limit'],
    ['an unknown field', { colour: 'red' }, 'colour'],
  ])('answers 400 naming the field for %s', async (_case, overrides, field) => {
    const response = await select(request(overrides));
    expect(response.status).toBe(400);
    expect(response.body.message).toBe('Validation failed');
    expect(response.body.errors.map((e: { field: string }) => e.field)).toContain(field);
  });
});
