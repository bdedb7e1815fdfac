import { createMount, createSupplier, type CreatedSupplier } from './factories/selection-catalog.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

/**
 * The operating conditions of Model 2 in POST /api/selection and in a design: sources, skip bands
 * and motor poles (docs/engineering/whole-machine.md §2). Bad input gets a 400 in words with the
 * field named, and changes nothing.
 */
const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
const MACHINE = [{ name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } }];
const IMPELLER = { label: 'Impeller', kind: 'unbalance', at: { x: 0.5, y: 0, z: 0.6 }, axis: 'x', rotorMassKg: 40 };

type FieldError = { field: string; message: string };

describe('operating sources (e2e)', () => {
  let t: TestApp;
  let engineer: string;
  let supplier: CreatedSupplier;

  const select = (body: object) => t.http().post('/api/selection').set('Authorization', `Bearer ${engineer}`).send(body);
  const request = (operating: object, overrides: object = {}) => ({
    components: MACHINE,
    mountPoints: CORNERS,
    operating,
    criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [supplier.id] },
    ...overrides,
  });
  const errorsOf = (body: { errors?: FieldError[] }) => body.errors ?? [];

  beforeAll(async () => {
    t = await createTestApp();
    engineer = await t.loginAs('engineer');
    const manager = await t.loginAs('catalog_manager');
    supplier = await createSupplier(t, manager);
    await createMount(t, manager, supplier.id, { partNumber: 'OPS-3000', verticalStiffnessNPerM: 1.0e5, ratedLoadN: 3000 });
  });
  afterAll(() => t.close());

  it('accepts operating (sources, skip bands, motor poles) instead of disturbingFrequenciesHz', async () => {
    const response = await select(
      request({
        speedRangeRpm: { min: 900, max: 1480 },
        orders: [1],
        lineFrequencyHz: 50,
        motorPoles: 4,
        skipBandsRpm: [{ min: 1100, max: 1150 }],
        sources: [
          IMPELLER,
          { label: 'Motor', kind: 'force', at: { x: -0.3, y: 0, z: 0.45 }, axis: 'z', amplitudeN: 200, frequencyHz: 100 },
        ],
      }),
    );
    expect(response.status).toBe(200);
    // quick figures: 1× at both ends, 2× drive output (4 poles: 2·4·n/120 = 4·n/60) at both ends, and the fixed 100 Hz force
    const hz: number[] = response.body.disturbingFrequenciesHz;
    expect(hz).toEqual([900 / 60, 1480 / 60, 60, (4 * 1480) / 60, 100].sort((a, b) => a - b));
  });

  it('refuses both or neither of operating and disturbingFrequenciesHz, naming the field', async () => {
    const both = await select(request({ speedRpm: 1480, orders: [1] }, { disturbingFrequenciesHz: [25] }));
    expect(both.status).toBe(400);
    expect(errorsOf(both.body)).toContainEqual({
      field: 'disturbingFrequenciesHz',
      message: 'Give either the operating conditions or the disturbing frequencies, not both',
    });
    const neither = await select(request(undefined as unknown as object));
    expect(neither.status).toBe(400);
    expect(errorsOf(neither.body)).toContainEqual({
      field: 'disturbingFrequenciesHz',
      message: 'Give the operating conditions or the disturbing frequencies',
    });
  });

  it.each([
    [
      'an unbalance without its rotor mass',
      { ...IMPELLER, rotorMassKg: undefined },
      'operating.sources.0.rotorMassKg',
      'An unbalance needs the mass of its rotor',
    ],
    [
      'a force without its amplitude',
      { ...IMPELLER, kind: 'force', rotorMassKg: undefined },
      'operating.sources.0.amplitudeN',
      'A force needs its amplitude',
    ],
    [
      'an unbalance with an amplitude',
      { ...IMPELLER, amplitudeN: 5 },
      'operating.sources.0.amplitudeN',
      'Only a force has an amplitude; an unbalance follows from its rotor mass and balance grade',
    ],
    [
      'an unbalance at a fixed frequency',
      { ...IMPELLER, frequencyHz: 50 },
      'operating.sources.0.frequencyHz',
      'An unbalance turns with the shaft: give an order, not a frequency',
    ],
    [
      'a force with a balance grade',
      { ...IMPELLER, kind: 'force', rotorMassKg: undefined, amplitudeN: 9, balanceGradeMmPerS: 2.5 },
      'operating.sources.0.balanceGradeMmPerS',
      'Only an unbalance has a balance grade',
    ],
    ['an unknown kind', { ...IMPELLER, kind: 'shock' }, 'operating.sources.0.kind', 'The kind of source must be an unbalance or a force'],
    [
      'an unknown axis',
      { ...IMPELLER, axis: 'w' },
      'operating.sources.0.axis',
      'The axis must be along the skid (x), lateral (y) or vertical (z)',
    ],
    ['no position', { ...IMPELLER, at: undefined }, 'operating.sources.0.at', 'Say where the source acts'],
    ['a zero order', { ...IMPELLER, order: 0 }, 'operating.sources.0.order', 'The order must be greater than zero'],
    [
      'a negative rotor mass',
      { ...IMPELLER, rotorMassKg: -1 },
      'operating.sources.0.rotorMassKg',
      'The rotor mass must be greater than zero',
    ],
  ])('refuses %s with the field named', async (_what, source, field, message) => {
    const response = await select(request({ speedRangeRpm: { min: 900, max: 1480 }, orders: [1], sources: [source] }));
    expect(response.status).toBe(400);
    expect(errorsOf(response.body)).toContainEqual({ field, message });
  });

  it('refuses two sources of one name, odd motor poles and an upside-down skip band', async () => {
    const response = await select(
      request({
        speedRangeRpm: { min: 900, max: 1480 },
        orders: [1],
        motorPoles: 3,
        skipBandsRpm: [{ min: 1200, max: 1100 }],
        sources: [IMPELLER, IMPELLER],
      }),
    );
    expect(response.status).toBe(400);
    const errors = errorsOf(response.body);
    expect(errors).toContainEqual({ field: 'operating.sources', message: 'Each source needs its own label' });
    expect(errors).toContainEqual({ field: 'operating.motorPoles', message: 'The number of motor poles must be even' });
    expect(errors).toContainEqual({
      field: 'operating.skipBandsRpm.0.max',
      message: 'The upper end of a skip band must be above its lower end',
    });
  });

  it('refuses skip bands without a speed range, bands that leave no running speed, and an unbalance without a speed', async () => {
    const fixed = await select(request({ speedRpm: 1480, orders: [1], skipBandsRpm: [{ min: 1000, max: 1100 }] }));
    expect(fixed.status).toBe(400);
    expect(errorsOf(fixed.body)[0].field).toBe('operating.skipBandsRpm');
    expect(errorsOf(fixed.body)[0].message).toMatch(/skip bands need a speed range/i);
    const all = await select(request({ speedRangeRpm: { min: 900, max: 1480 }, orders: [1], skipBandsRpm: [{ min: 800, max: 1500 }] }));
    expect(all.status).toBe(400);
    expect(errorsOf(all.body)[0].message).toMatch(/leave no running speed/i);
    const noSpeed = await select(request({ lineFrequencyHz: 50, orders: [], sources: [IMPELLER] }));
    expect(noSpeed.status).toBe(400);
    expect(errorsOf(noSpeed.body)[0].field).toBe('operating.sources.0');
    expect(errorsOf(noSpeed.body)[0].message).toMatch(/an unbalance turns with the shaft: give the speed or the speed range/i);
  });

  it('a design stores its sources, skip bands and motor poles', async () => {
    const project = await t.http().post('/api/projects').set('Authorization', `Bearer ${engineer}`).send({ name: 'Sources project' });
    expect(project.status).toBe(201);
    const operating = {
      speedRangeRpm: { min: 900, max: 1480 },
      orders: [1],
      motorPoles: 4,
      skipBandsRpm: [{ min: 1100, max: 1150 }],
      sources: [{ ...IMPELLER, order: 1, balanceGradeMmPerS: 2.5 }],
    };
    const input = { ...request(operating), operating };
    delete (input as { limit?: number }).limit;
    const created = await t
      .http()
      .post(`/api/projects/${project.body.id}/designs`)
      .set('Authorization', `Bearer ${engineer}`)
      .send({ name: 'Pump on a drive', input });
    expect(created.status).toBe(201);
    expect(created.body.input.operating).toEqual(operating);
  });
});
