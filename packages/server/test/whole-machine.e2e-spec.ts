import { massProperties, prepareWholeMachine, transmissibilityBatch, wholeMachineTransmissibility } from '@tacet/vibration';
import { DataSource } from 'typeorm';
import { Design } from '../src/designs/design.entity.js';
import { PurchasingService } from '../src/purchasing/purchasing.service.js';
import { createMount, createSupplier, type CreatedMount, type CreatedSupplier } from './factories/selection-catalog.factory.js';
import { releaseDesign } from './factories/review.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';
import { pdfHasText } from './utils/pdf-text.js';

/**
 * The whole-machine verdict of POST /api/selection (docs/engineering/selection.md §19–§22) on the two
 * cases of the issue, the stiffness band, the crossings in the reasons, the guarantee that the bounce
 * estimate excludes nothing, and POST /api/selection/curves. Catalog rows are invented.
 *
 * Independent figures: the bounce estimate is the one-mass transmissibility (transmissibility.md §2–§4,
 * closed form); the whole-machine figures at a point are recomputed here with @tacet/vibration's
 * forced response (its own checks against Harris' Shock and Vibration Handbook, the chapter on
 * resiliently supported rigid bodies, live in packages/vibration).
 */
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
    amplitudeN: number;
    perPoint: { label: string; forceN: number }[];
  }[];
};
type Crossing = { mode: string; modeFrequencyHz: number; source: string; order: number; speedRpm: number };
type Candidate = {
  kind: string;
  mountId?: number;
  passes: boolean;
  reasons: string[];
  notes: string[];
  isolation: { frequencyHz: number; transmissibility: number; efficiencyPct: number }[];
  verticalNaturalFrequencyHz: number;
  modes?: { frequencyHz: number; dominant: string }[];
  wholeMachine?: WholeMachine;
  crossings?: Crossing[];
};

const TWO_PI = 2 * Math.PI;
const CORNERS = (a: number, b: number, z = 0) => [
  { label: 'A', x: a, y: b, z },
  { label: 'B', x: a, y: -b, z },
  { label: 'C', x: -a, y: b, z },
  { label: 'D', x: -a, y: -b, z },
];

/** Hysteretic one-mass transmissibility √(1 + η²)/√((1 − r²)² + η²) — transmissibility.md §3 [CF]. */
const hystereticT = (r: number, eta: number) => Math.sqrt(1 + eta * eta) / Math.sqrt((1 - r * r) ** 2 + eta * eta);

/** A tall machine (800 kg, CG 1.2 m up, a narrow base) with a low impeller on a vertical shaft, on a drive. */
const TALL = [{ name: 'Tall machine', massKg: 800, cg: { x: 0, y: 0, z: 1.2 }, box: { lx: 1.0, ly: 0.8, lz: 2.4 } }];
const TALL_POINTS = CORNERS(0.5, 0.4);
const TALL_OPERATING = {
  speedRangeRpm: { min: 780, max: 1800 },
  orders: [1],
  sources: [{ label: 'Impeller', kind: 'unbalance', at: { x: 0, y: 0, z: 0.5 }, axis: 'z', rotorMassKg: 40 }],
};

/** A skid with the motor offset to one side (CG y = 0.167 m), running at 1480 rpm. */
const OFFSET = [
  { name: 'Frame', massKg: 200, cg: { x: 0, y: 0, z: 0.1 }, box: { lx: 1.4, ly: 0.9, lz: 0.2 } },
  { name: 'Motor', massKg: 400, cg: { x: 0, y: 0.25, z: 0.6 }, box: { lx: 1.0, ly: 0.4, lz: 0.5 } },
];
const OFFSET_POINTS = CORNERS(0.6, 0.4);
const OFFSET_OPERATING = {
  speedRpm: 1480,
  orders: [1],
  sources: [{ label: 'Motor rotor', kind: 'unbalance', at: { x: 0, y: 0.25, z: 0.6 }, axis: 'x', rotorMassKg: 60 }],
};

describe('whole-machine verdict (e2e)', () => {
  let t: TestApp;
  let engineer: string;
  let rubber: CreatedSupplier;
  let offsetRubber: CreatedSupplier;
  let sideways: CreatedSupplier;
  let tallMount: CreatedMount;
  let offsetMount: CreatedMount;
  const shaky: CreatedMount[] = [];
  let quiet: CreatedMount;

  const post = (path: string, body: object) => t.http().post(path).set('Authorization', `Bearer ${engineer}`).send(body);
  const find = (candidates: Candidate[], mountId: number) => {
    const found = candidates.find((c) => c.mountId === mountId);
    if (!found) throw new Error(`mount ${mountId} is not among the candidates`);
    return found;
  };

  beforeAll(async () => {
    t = await createTestApp();
    engineer = await t.loginAs('engineer');
    const manager = await t.loginAs('catalog_manager');
    rubber = await createSupplier(t, manager);
    const elastomer = { mountType: 'elastomer_mount', dampingRatio: null, lossFactor: 0.1, dynamicStiffnessRatio: 1 };
    // stiffer sideways than vertically
    tallMount = await createMount(t, manager, rubber.id, {
      ...elastomer,
      partNumber: 'WM-TALL',
      verticalStiffnessNPerM: 2e5,
      horizontalStiffnessNPerM: 4e5,
      ratedLoadN: 3000,
    });
    offsetRubber = await createSupplier(t, manager);
    offsetMount = await createMount(t, manager, offsetRubber.id, {
      ...elastomer,
      partNumber: 'WM-OFFSET',
      verticalStiffnessNPerM: 1.2e5,
      horizontalStiffnessNPerM: 8.4e5,
      ratedLoadN: 2500,
    });
    // The guarantee: ten rows the estimate ranks first (soft vertically) whose surge sits on the 4 Hz force,
    // and one the estimate puts below the requirement (bounce near 4 Hz) that isolates the horizontal force well.
    sideways = await createSupplier(t, manager);
    for (let i = 0; i < 10; i++) {
      shaky.push(
        await createMount(t, manager, sideways.id, {
          mountType: 'elastomer_mount', // not a coil spring: the springs' lateral-stability rule would fail these rows
          partNumber: `WM-SHAKY-${i}`,
          verticalStiffnessNPerM: 1e4,
          horizontalStiffnessNPerM: 1.5e5 + i * 2e3,
          maxDeflectionMm: 400,
          unitPrice: 40,
        }),
      );
    }
    quiet = await createMount(t, manager, sideways.id, {
      mountType: 'elastomer_mount',
      partNumber: 'WM-QUIET',
      verticalStiffnessNPerM: 1.209e5,
      horizontalStiffnessNPerM: 1e4,
      unitPrice: 60,
    });
  });
  afterAll(() => t.close());

  it('tall machine on a drive: passes by the bounce estimate at both ends, fails on the rocking mode its impeller crosses inside the range', async () => {
    const response = await post('/api/selection', {
      components: TALL,
      mountPoints: TALL_POINTS,
      operating: TALL_OPERATING,
      criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [rubber.id] },
    });
    expect(response.status).toBe(200);
    const c = find(response.body.candidates, tallMount.id);
    // the quick figures: bounce √(4·2e5/800)/2π = 5.033 Hz, hysteretic η = 0.1, at 13 Hz and 30 Hz (closed form)
    const fn = Math.sqrt((4 * 2e5) / 800) / TWO_PI;
    expect(c.verticalNaturalFrequencyHz).toBeCloseTo(fn, 10);
    expect(c.isolation.map((row) => row.frequencyHz)).toEqual([13, 30]);
    c.isolation.forEach((row) => {
      expect(row.transmissibility).toBeCloseTo(hystereticT(row.frequencyHz / fn, 0.1), 12);
      expect(row.efficiencyPct).toBeGreaterThan(80);
    });
    // the whole machine: the upper roll/sway and pitch/surge modes (13.7–13.9 Hz) are crossed at 823–834 rpm
    expect(c.passes).toBe(false);
    const wm = c.wholeMachine!;
    expect(wm.stiffnessTolerancePct).toBe(15); // elastomer mount, common practice
    expect(wm.worst.source).toBe('Impeller');
    expect(wm.worst.transmissibility).toBeGreaterThan(5);
    expect(wm.worst.speedRpm).toBeGreaterThan(780);
    expect(wm.worst.speedRpm).toBeLessThan(1000);
    const crossings = c.crossings!;
    expect(crossings.length).toBeGreaterThanOrEqual(2);
    for (const x of crossings) {
      expect(x.source).toBe('Impeller');
      expect(x.order).toBe(1);
      // n = 60·f/o exactly (selection.md §20)
      expect(x.speedRpm).toBeCloseTo(60 * x.modeFrequencyHz, 9);
      expect(x.speedRpm).toBeGreaterThanOrEqual(780);
      expect(x.speedRpm).toBeLessThanOrEqual(1800);
      const mode = c.modes!.find((m) => Math.abs(m.frequencyHz - x.modeFrequencyHz) < 1e-9);
      expect(mode).toBeDefined();
    }
    expect(crossings.some((x) => /roll/.test(x.mode))).toBe(true);
    expect(c.reasons[0]).toMatch(
      /^Whole machine, Impeller: at \d+ rpm, [\d.]+ Hz \((nominal stiffness|stiffness 15 % (above|below) nominal)\) the mounts amplify the force/,
    );
    for (const x of crossings) {
      expect(c.reasons).toContain(
        `The ${x.mode} mode at ${x.modeFrequencyHz.toFixed(2).replace(/\.?0+$/, '')} Hz is crossed by Impeller (1× shaft speed) ` +
          `at ${Math.round(x.speedRpm)} rpm, inside the running range.`,
      );
    }
    // perFrequency: range ends, each crossing and the worst point, with the force per mount for the actual unbalance
    const speeds = wm.perFrequency.map((p) => p.speedRpm);
    expect(speeds).toContain(780);
    expect(speeds).toContain(1800);
    const top = wm.perFrequency.find((p) => p.speedRpm === 1800)!;
    // unbalance at top speed: m_r·G·Ω_max = 40 · 6.3e-3 · 2π·30 (forcing.md §7, closed form)
    expect(top.amplitudeN).toBeCloseTo(40 * 6.3e-3 * TWO_PI * 30, 9);
    expect(top.perPoint.reduce((s, p) => s + p.forceN, 0) / top.amplitudeN).toBeCloseTo(top.transmissibility, 9);
    // recomputed here at the governing stiffness (an independent path: no sweep, no server)
    const mass = massProperties([
      { name: 'Tall', massKg: 800, cg: { x: 0, y: 0, z: 1.2 }, shape: 'box', dimensions: { x: 1.0, y: 0.8, z: 2.4 } },
    ]);
    const system = prepareWholeMachine(
      {
        body: { massKg: 800, cg: mass.cg, inertia: mass.inertia },
        mounts: TALL_POINTS.map((p) => ({
          position: p,
          stiffness: { x: 4e5, y: 4e5, z: 2e5 },
          damping: { model: 'hysteretic' as const, lossFactor: 0.1 },
        })),
      },
      { stiffnessFactor: wm.worst.stiffnessFactor },
    );
    const again = wholeMachineTransmissibility(system, { at: { x: 0, y: 0, z: 0.5 }, kind: 'rotating', axis: 'z' }, wm.worst.frequencyHz);
    expect(again).toBeCloseTo(wm.worst.transmissibility, 9);
  });

  it('offset machine: a roll mode near the running speed gives several times the bounce figure and fails', async () => {
    const response = await post('/api/selection', {
      components: OFFSET,
      mountPoints: OFFSET_POINTS,
      operating: OFFSET_OPERATING,
      criteria: { minIsolationPct: 90, minUtilization: 0.2, maxUtilization: 1.0, supplierIds: [offsetRubber.id] },
    });
    expect(response.status).toBe(200);
    const c = find(response.body.candidates, offsetMount.id);
    const f = 1480 / 60;
    const estimate = c.isolation.find((row) => row.frequencyHz === f)!;
    expect(estimate.efficiencyPct).toBeGreaterThan(95); // the bounce estimate alone would pass
    const roll = c.modes!.find((m) => m.dominant === 'roll')!;
    expect(roll.frequencyHz / f).toBeGreaterThan(0.75);
    expect(roll.frequencyHz / f).toBeLessThan(0.9);
    expect(c.passes).toBe(false);
    expect(c.wholeMachine!.worst.transmissibility).toBeGreaterThan(5 * estimate.transmissibility);
    expect(c.wholeMachine!.worst.speedRpm).toBe(1480);
    expect(c.wholeMachine!.worst.stiffnessFactor).toBe(1.15); // the stiff end brings the mode nearer
    expect(c.crossings).toEqual([]); // a fixed speed crosses nothing on the way (start-up is another check)
    expect(c.reasons[0]).toMatch(
      /^Whole machine, Motor rotor: isolation [\d.]+ % at 1480 rpm, 24\.67 Hz \(stiffness 15 % above nominal\), below the 90 % required\.$/,
    );
  });

  it('a fixed speed gives one row per source in the per-frequency figures (the worst point not repeated for a rounding difference)', async () => {
    // with a ±10 % band, 1480/√1.1·√1.1 = 1480.0000000000002 in floating point (and so for 990 and 2960 rpm)
    for (const speedRpm of [1480, 990, 2960]) {
      const response = await post('/api/selection', {
        components: TALL,
        mountPoints: TALL_POINTS,
        operating: { speedRpm, orders: [1, 2], vaneCount: 6, lineFrequencyHz: 50 },
        criteria: { minIsolationPct: 50, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [rubber.id], stiffnessTolerancePct: 10 },
      });
      expect(response.status).toBe(200);
      const c = find(response.body.candidates, tallMount.id);
      const bySource = new Map<string, number>();
      for (const p of c.wholeMachine!.perFrequency) bySource.set(p.source, (bySource.get(p.source) ?? 0) + 1);
      expect([...bySource.values()]).toEqual([1, 1, 1, 1]);
    }
  });

  it('the band: the verdict is the worse end, the one-mass T at the stiff end above resonance (symmetric machine, hysteretic)', async () => {
    const body = {
      components: [{ name: 'Block', massKg: 800, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.0, ly: 0.8, lz: 0.6 } }],
      mountPoints: TALL_POINTS,
      disturbingFrequenciesHz: [20],
      criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [rubber.id], stiffnessTolerancePct: 25 },
    };
    const response = await post('/api/selection', body);
    const c = find(response.body.candidates, tallMount.id);
    const fn = Math.sqrt((4 * 2e5) / 800) / TWO_PI;
    const stiff = hystereticT(20 / (fn * Math.sqrt(1.25)), 0.1);
    expect(c.wholeMachine!.stiffnessTolerancePct).toBe(25);
    expect(c.wholeMachine!.worst.stiffnessFactor).toBe(1.25);
    expect(c.wholeMachine!.worst.transmissibility).toBeCloseTo(stiff, 9);
    // the default vertical force is per newton: Σ forces = T
    const at = c.wholeMachine!.perFrequency[0];
    expect(at.amplitudeN).toBe(1);
    expect(at.perPoint.reduce((s, p) => s + p.forceN, 0)).toBeCloseTo(stiff, 9);
  });

  it('the bounce estimate only orders: a candidate it puts below the requirement is still judged and returned when the whole machine passes it', async () => {
    const response = await post('/api/selection', {
      components: [{ name: 'Shaker table', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } }],
      mountPoints: CORNERS(0.8, 0.45, 0.3), // at the CG height: the horizontal force drives surge alone
      operating: {
        speedRpm: 240,
        orders: [1],
        sources: [{ label: 'Shaker', kind: 'force', at: { x: 0, y: 0, z: 0.3 }, axis: 'x', amplitudeN: 100 }],
      },
      criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [sideways.id] },
      limit: 1,
    });
    expect(response.status).toBe(200);
    const candidates: Candidate[] = response.body.candidates;
    const first = candidates[0];
    expect(first.mountId).toBe(quiet.id);
    expect(first.passes).toBe(true);
    // the estimate (bounce 3.5 Hz against 4 Hz) amplifies; the whole machine (surge ≈ 1 Hz) isolates
    expect(first.isolation[0].transmissibility).toBeGreaterThan(1);
    expect(first.wholeMachine!.worst.efficiencyPct).toBeGreaterThan(90);
    expect(first.notes[0]).toMatch(
      /^Whole machine: worst isolation [\d.]+ %, Shaker at 240 rpm, 4 Hz \(stiffness 15 % above nominal\); the isolation per frequency above is the bounce estimate\.$/,
    );
    // the ten rows the estimate ranks higher were judged by the whole machine first and fail on their surge
    const failing = candidates.filter((c) => !c.passes);
    expect(failing).toHaveLength(1);
    expect(shaky.map((m) => m.id)).toContain(failing[0].mountId);
    expect(failing[0].reasons[0]).toMatch(/^Whole machine, Shaker: at 240 rpm, 4 Hz/);
    // sanity of the construction: the estimate would rank every shaky row above the quiet one
    const out = new Float64Array(2);
    transmissibilityBatch(
      Float64Array.from([Math.sqrt(4e4 / 1000) / TWO_PI, Math.sqrt((4 * 1.209e5) / 1000) / TWO_PI]),
      Float64Array.from([0.05, 0.05]),
      new Uint8Array(2),
      [4],
      out,
    );
    expect(out[0]).toBeLessThan(0.1);
    expect(out[1]).toBeGreaterThan(1);
  });

  it('POST /api/selection/curves: transmissibility against speed per source, nominal and both band ends, with the crossings and bands', async () => {
    const response = await post('/api/selection/curves', {
      components: TALL,
      mountPoints: TALL_POINTS,
      operating: { ...TALL_OPERATING, skipBandsRpm: [{ min: 1000, max: 1100 }] },
      criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [rubber.id] },
      mountId: tallMount.id,
    });
    expect(response.status).toBe(200);
    const body = response.body;
    expect(body.candidate).toMatchObject({ kind: 'uniform', mountId: tallMount.id, label: 'WM-TALL', passes: false });
    expect(body.speedRangeRpm).toEqual({ min: 780, max: 1800 });
    expect(body.skipBandsRpm).toEqual([{ min: 1000, max: 1100 }]);
    expect(body.requirement.minIsolationPct).toBe(80);
    expect(body.requirement.transmissibility).toBeCloseTo(0.2, 12);
    expect(body.stiffnessTolerancePct).toBe(15);
    expect(body.modes).toHaveLength(6);
    expect(body.crossings.length).toBeGreaterThanOrEqual(2);
    expect(body.sources).toHaveLength(1);
    const curve = body.sources[0];
    expect(curve).toMatchObject({ label: 'Impeller', order: 1, fixedFrequencyHz: null });
    const n: number[] = curve.speedRpm;
    expect(n[0]).toBe(780);
    expect(n[n.length - 1]).toBe(1800);
    expect(n).toContain(1000);
    expect(n).toContain(1100);
    expect(n.some((x) => x > 1000 && x < 1100)).toBe(false); // skipped
    for (let i = 1; i < n.length; i++) {
      expect(n[i]).toBeGreaterThan(n[i - 1]);
      if (!(n[i - 1] === 1000 && n[i] === 1100)) expect(n[i] / n[i - 1]).toBeLessThanOrEqual(1.005 + 1e-12);
    }
    for (const x of body.crossings) expect(n).toContain(x.speedRpm);
    expect(curve.frequencyHz).toEqual(n.map((x) => x / 60));
    for (const key of ['transmissibility', 'softEnd', 'stiffEnd']) expect(curve[key]).toHaveLength(n.length);
    // the worst over the band and the grid is the verdict's worst (both include the crossings of every band end)
    const worst = Math.max(...curve.transmissibility, ...curve.softEnd, ...curve.stiffEnd);
    expect(worst).toBeLessThanOrEqual(body.worst.transmissibility * (1 + 1e-9));
    expect(worst).toBeGreaterThan(body.worst.transmissibility * 0.99);
  });

  it('a released design freezes the sources, the worst point, the crossings and the verdict, and its report prints them', async () => {
    const auth = { Authorization: `Bearer ${engineer}` };
    const project = await t
      .http()
      .post('/api/projects')
      .set(auth)
      .send({ name: `Whole machine ${process.pid}` });
    expect(project.status).toBe(201);
    const input = {
      components: TALL,
      mountPoints: TALL_POINTS,
      operating: { ...TALL_OPERATING, skipBandsRpm: [{ min: 1000, max: 1100 }] },
      criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [rubber.id] },
    };
    const created = await t.http().post(`/api/projects/${project.body.id}/designs`).set(auth).send({ name: 'Tall pump on a drive', input });
    expect(created.status).toBe(201);
    const chosen = await t.http().put(`/api/designs/${created.body.id}`).set(auth).send({ version: 1, chosenMountId: tallMount.id });
    expect(chosen.status).toBe(200);
    expect(chosen.body.chosen.passes).toBe(false);
    expect(chosen.body.chosen.crossings.length).toBeGreaterThanOrEqual(2);
    await releaseDesign(t, created.body.id, engineer, await t.login('checker@tacet.test', 'tacet-demo'));

    const design = await t.app
      .get(DataSource)
      .getRepository(Design)
      .findOneOrFail({
        where: { id: created.body.id },
        relations: { project: true, author: true, checker: true },
      });
    const frozen = design.snapshot!.wholeMachine!;
    expect(design.snapshot!.operating).toEqual(input.operating);
    expect(frozen.worst).toEqual(chosen.body.chosen.wholeMachine.worst);
    expect(frozen.crossings).toEqual(chosen.body.chosen.crossings);
    expect(frozen.passes).toBe(false);
    expect(frozen.reasons).toEqual(chosen.body.chosen.reasons);
    expect(frozen.skipBandsRpm).toEqual([{ min: 1000, max: 1100 }]);
    expect(frozen.curves[0].label).toBe('Impeller');
    expect(frozen.curves[0].speedRpm.length).toBeGreaterThan(100);

    const pdf = await t.app.get(PurchasingService).reportOf(design, false);
    const wanted = [
      'Whole machine over the running range',
      'Source Impeller: unbalance of a 40.0 kg rotor balanced to G6.3',
      'Skip bands of the drive: 1000 rpm',
      'Verdict: does not meet the requirements',
      `Crossing: the ${frozen.crossings[0].mode} mode`,
      'Whole-machine transmissibility T (log) against shaft speed',
    ];
    expect(wanted.filter((text) => !pdfHasText(pdf, text))).toEqual([]);
  });

  it('the curves route refuses a candidate that is not in the catalog, and neither or both of a mount and a series', async () => {
    const base = {
      components: TALL,
      mountPoints: TALL_POINTS,
      operating: TALL_OPERATING,
      criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0 },
    };
    const missing = await post('/api/selection/curves', { ...base, mountId: 999999 });
    expect(missing.status).toBe(400);
    expect(missing.body.errors).toEqual([{ field: 'mountId', message: 'Mount 999999 is not an active part of the catalog' }]);
    const neither = await post('/api/selection/curves', base);
    expect(neither.status).toBe(400);
    expect(neither.body.errors).toContainEqual({ field: 'mountId', message: 'Say which candidate to draw: a mount or a series' });
    const both = await post('/api/selection/curves', { ...base, mountId: tallMount.id, seriesId: '1:X' });
    expect(both.status).toBe(400);
    expect(both.body.errors).toContainEqual({ field: 'mountId', message: 'Give either a mount or a series, not both' });
  });
});
