import { DataSource } from 'typeorm';
import { DEMO_PROJECT } from '../src/designs/demo-designs.seed.js';
import { DesignSelection } from '../src/designs/design-selection.entity.js';
import { Design } from '../src/designs/design.entity.js';
import { createMount, createSupplier, type CreatedMount, type CreatedSupplier } from './factories/selection-catalog.factory.js';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

const STALE = 'This design was changed by someone else; reload it';

const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];

describe('projects and designs (e2e)', () => {
  let t: TestApp;
  const tokens: Record<string, string> = {};
  const as = (who: string) => ({ Authorization: `Bearer ${tokens[who]}` });
  let supplier: CreatedSupplier;
  let spring: CreatedMount;
  const series: CreatedMount[] = [];
  let counter = 0;

  /** The test's own input: a centred 1000 kg machine, 1480 rpm, restricted to the test supplier. */
  const input = (overrides: object = {}) => ({
    components: [{ name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } }],
    mountPoints: CORNERS,
    operating: { speedRpm: 1480, orders: [1, 2], lineFrequencyHz: 50 },
    criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [supplier.id] },
    ...overrides,
  });

  const newProject = async (who = 'engineer', body: object = {}) => {
    const response = await t
      .http()
      .post('/api/projects')
      .set(as(who))
      .send({ name: `Test project ${++counter}`, ...body });
    expect(response.status).toBe(201);
    return response.body as { id: number; owner: { id: number } };
  };

  const newDesign = async (projectId: number, who = 'engineer', body: object = {}) => {
    const response = await t
      .http()
      .post(`/api/projects/${projectId}/designs`)
      .set(as(who))
      .send({ name: `Skid ${++counter}`, input: input(), ...body });
    expect(response.status).toBe(201);
    return response.body as { id: number; version: number; name: string };
  };

  const put = (id: number, body: object, who = 'engineer') => t.http().put(`/api/designs/${id}`).set(as(who)).send(body);
  const get = (id: number, who = 'engineer') => t.http().get(`/api/designs/${id}`).set(as(who));

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of ['admin', 'engineer', 'purchaser', 'viewer', 'catalog_manager'] as const) tokens[role] = await t.loginAs(role);
    tokens.checker = await t.login('checker@tacet.test', 'tacet-demo');
    supplier = await createSupplier(t, tokens.catalog_manager, 'Design Test Mounts');
    spring = await createMount(t, tokens.catalog_manager, supplier.id, { partNumber: 'DT-SPRING-3000', unitPrice: 42.5, leadTimeDays: 12 });
    for (const rated of [2700, 2950, 3200, 3450]) {
      series.push(
        await createMount(t, tokens.catalog_manager, supplier.id, {
          partNumber: `DT-LV-${rated}`,
          series: 'DTLV',
          ratedLoadN: rated,
          verticalStiffnessNPerM: rated / 0.03,
          unitPrice: rated / 100,
          leadTimeDays: 20,
        }),
      );
    }
  });
  afterAll(() => t.close());

  describe('projects', () => {
    it('an engineer creates a project and owns it; every role reads it', async () => {
      const response = await t
        .http()
        .post('/api/projects')
        .set(as('engineer'))
        .send({ name: '  Riverside Boiler House  ', site: 'Quay Road', client: '', description: 'Invented' });
      expect(response.status).toBe(201);
      expect(response.body).toMatchObject({
        name: 'Riverside Boiler House',
        site: 'Quay Road',
        client: null,
        description: 'Invented',
        owner: { name: 'Erin Engineer' },
        archived: false,
        designCount: 0,
      });
      for (const who of ['viewer', 'purchaser', 'catalog_manager', 'checker']) {
        const list = await t.http().get('/api/projects').set(as(who)).expect(200);
        expect(list.body.map((p: { id: number }) => p.id)).toContain(response.body.id);
        await t.http().get(`/api/projects/${response.body.id}`).set(as(who)).expect(200);
      }
    });

    it('only the owner or an admin changes or archives a project', async () => {
      const project = await newProject();
      const other = await t.http().patch(`/api/projects/${project.id}`).set(as('checker')).send({ name: 'Taken over' });
      expect(other.status).toBe(403);
      expect(other.body.message).toBe('Only the owner of this project or an admin can change it');
      const own = await t.http().patch(`/api/projects/${project.id}`).set(as('engineer')).send({ site: 'Dock 4', archived: true });
      expect(own.status).toBe(200);
      expect(own.body).toMatchObject({ site: 'Dock 4', archived: true });
      const admin = await t.http().patch(`/api/projects/${project.id}`).set(as('admin')).send({ site: null, archived: false });
      expect(admin.status).toBe(200);
      expect(admin.body).toMatchObject({ site: null, archived: false });
      await t.http().patch(`/api/projects/${project.id}`).set(as('viewer')).send({ name: 'x' }).expect(403);
    });

    it('refuses null for a project name or the archived flag (400, nothing changed)', async () => {
      const project = await newProject();
      const before = await t.http().get(`/api/projects/${project.id}`).set(as('engineer')).expect(200);
      for (const body of [{ name: null }, { archived: null }]) {
        const response = await t.http().patch(`/api/projects/${project.id}`).set(as('engineer')).send(body);
        expect(response.status).toBe(400);
        expect(response.body.errors[0].field).toBe(Object.keys(body)[0]);
      }
      const after = await t.http().get(`/api/projects/${project.id}`).set(as('engineer')).expect(200);
      expect(after.body).toEqual(before.body);
    });

    it('no design can be added to an archived project', async () => {
      const project = await newProject();
      await t.http().patch(`/api/projects/${project.id}`).set(as('engineer')).send({ archived: true }).expect(200);
      const response = await t.http().post(`/api/projects/${project.id}/designs`).set(as('engineer')).send({ name: 'Late' });
      expect(response.status).toBe(409);
    });

    it('a project with only drafts is deleted with them; one with a released design is not', async () => {
      const project = await newProject();
      const design = await newDesign(project.id);
      await t.http().delete(`/api/projects/${project.id}`).set(as('checker')).expect(403);
      await t.http().delete(`/api/projects/${project.id}`).set(as('engineer')).expect(204);
      await t.http().get(`/api/projects/${project.id}`).set(as('engineer')).expect(404);
      await get(design.id).expect(404);

      const demo = (await t.http().get('/api/projects').set(as('admin'))).body.find((p: { name: string }) => p.name === DEMO_PROJECT.name);
      const refused = await t.http().delete(`/api/projects/${demo.id}`).set(as('admin'));
      expect(refused.status).toBe(409);
      expect(refused.body.message).toBe('A project with a released design cannot be deleted; archive it instead');
    });

    it('answers 400 for a blank or over-long name', async () => {
      await t.http().post('/api/projects').set(as('engineer')).send({ name: '   ' }).expect(400);
      await t
        .http()
        .post('/api/projects')
        .set(as('engineer'))
        .send({ name: 'n'.repeat(201) })
        .expect(400);
    });
  });

  describe('designs', () => {
    it('POST creates revision 1, draft, version 1, with a template input when none is sent', async () => {
      const project = await newProject();
      const response = await t.http().post(`/api/projects/${project.id}/designs`).set(as('engineer')).send({ name: 'Template' });
      expect(response.status).toBe(201);
      expect(response.body).toMatchObject({
        projectId: project.id,
        projectName: expect.stringMatching(/^Test project/),
        name: 'Template',
        revision: 1,
        status: 'draft',
        version: 1,
        chosen: null,
        bom: [],
        author: { name: 'Erin Engineer' },
        checker: null,
      });
      expect(response.body.input.mountPoints).toHaveLength(4);
      // 1480 rpm, orders 1 and 2, 50 Hz supply (CV-13: 24.67, 49.33, 100 Hz)
      expect(response.body.disturbingFrequencies.map((f: { frequencyHz: number }) => f.frequencyHz.toFixed(2))).toEqual([
        '24.67',
        '49.33',
        '100.00',
      ]);
      expect(response.body.disturbingFrequencies[2].label).toBe('2× line (50 Hz supply)');
      const duplicate = await t.http().post(`/api/projects/${project.id}/designs`).set(as('engineer')).send({ name: 'Template' });
      expect(duplicate.status).toBe(409);
      const list = await t.http().get(`/api/projects/${project.id}/designs`).set(as('viewer')).expect(200);
      expect(list.body).toEqual([
        { id: response.body.id, name: 'Template', revision: 1, status: 'draft', updatedAt: expect.any(String), author: expect.any(Object) },
      ]);
    });

    it('PUT saves with version + 1; a stale version gets 409 and writes nothing', async () => {
      const design = await newDesign((await newProject()).id);
      const first = await put(design.id, { version: 1, name: 'Renamed once' });
      expect(first.status).toBe(200);
      expect(first.body.version).toBe(2);
      const stale = await put(design.id, { version: 1, name: 'Lost update' });
      expect(stale.status).toBe(409);
      expect(stale.body).toEqual({ statusCode: 409, message: STALE });
      const now = await get(design.id);
      expect(now.body).toMatchObject({ name: 'Renamed once', version: 2 });
    });

    it('refuses null for a design name (400, nothing changed)', async () => {
      const design = await newDesign((await newProject()).id);
      const before = await get(design.id);
      const response = await put(design.id, { version: design.version, name: null });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('name');
      expect((await get(design.id)).body).toEqual(before.body);
    });

    it('of 10 concurrent PUTs with the same version exactly one wins; the others get 409', async () => {
      const design = await newDesign((await newProject()).id);
      // One process on SQLite would run the requests one after another; hold every read of the
      // design for a moment so that all 10 read version 1 before the first one writes, as
      // requests on several API instances would.
      const repo = t.app.get(DataSource).getRepository(Design);
      const find = repo.find;
      let reads = 0;
      repo.find = async function (this: typeof repo, ...args: Parameters<typeof find>) {
        const found = await find.apply(this, args);
        reads++;
        await new Promise((resolve) => setTimeout(resolve, 50));
        return found;
      } as typeof find;
      let responses: Awaited<ReturnType<typeof put>>[];
      try {
        responses = await Promise.all(Array.from({ length: 10 }, (_, i) => put(design.id, { version: 1, name: `Writer ${i}` })));
      } finally {
        repo.find = find;
      }
      expect(reads).toBeGreaterThanOrEqual(10);
      const statuses = responses.map((r) => r.status).sort();
      expect(statuses).toEqual([200, 409, 409, 409, 409, 409, 409, 409, 409, 409]);
      responses.filter((r) => r.status === 409).forEach((r) => expect(r.body.message).toBe(STALE));
      const winner = responses.find((r) => r.status === 200)!;
      const now = await get(design.id);
      expect(now.body.version).toBe(2);
      expect(now.body.name).toBe(winner.body.name);
    });

    it('a version someone else changed directly in the database is stale too', async () => {
      const design = await newDesign((await newProject()).id);
      // another writer (e.g. a second API instance) bumps the version first
      const dataSource = t.app.get(DataSource);
      const repo = dataSource.getRepository(Design);
      const result = await repo
        .createQueryBuilder()
        .update(Design)
        .set({ name: 'Sneaky', version: () => '"version" + 1' })
        .where('id = :id AND version = :version', { id: design.id, version: 1 })
        .execute();
      expect(result.affected).toBe(1);
      const response = await put(design.id, { version: 1, name: 'Mine' });
      expect(response.status).toBe(409);
      expect((await get(design.id)).body.name).toBe('Sneaky');
    });

    it('a draft is edited by its author or an admin only', async () => {
      const design = await newDesign((await newProject()).id);
      const other = await put(design.id, { version: 1, name: 'Not mine' }, 'checker');
      expect(other.status).toBe(403);
      expect(other.body.message).toBe('Only the author of this design or an admin can change it');
      const admin = await put(design.id, { version: 1, name: 'Fixed by admin' }, 'admin');
      expect(admin.status).toBe(200);
      await put(design.id, { version: 2, name: 'x' }, 'viewer').expect(403);
      await put(design.id, { version: 2, name: 'x' }, 'purchaser').expect(403);
    });

    it('a failing PUT leaves the row unchanged (nothing half-saved)', async () => {
      const design = await newDesign((await newProject()).id);
      const before = (await get(design.id)).body;
      const badInput = await put(design.id, {
        version: 1,
        name: 'Should not stick',
        input: input({ components: [{ name: 'M', massKg: 0, cg: { x: 0, y: 0, z: 0 } }] }),
      });
      expect(badInput.status).toBe(400);
      expect(badInput.body.errors.map((e: { field: string }) => e.field)).toContain('input.components.0.massKg');
      const collinear = await put(design.id, {
        version: 1,
        name: 'Should not stick',
        input: input({ mountPoints: [0, 1, 2].map((i) => ({ label: `P${i}`, x: i, y: 0, z: 0 })) }),
      });
      expect(collinear.status).toBe(400);
      expect(collinear.body.errors[0].field).toBe('input.mountPoints');
      const noFrequency = await put(design.id, {
        version: 1,
        name: 'Should not stick',
        input: input({ operating: { orders: [] } }),
      });
      expect(noFrequency.status).toBe(400);
      expect(noFrequency.body.errors[0].field).toBe('input.operating');
      const unknownMount = await put(design.id, { version: 1, name: 'Should not stick', chosenMountId: 99_999_999 });
      expect(unknownMount.status).toBe(400);
      expect(unknownMount.body.errors[0].field).toBe('chosenMountId');
      const both = await put(design.id, { version: 1, chosenMountId: spring.id, chosenSeriesId: `${supplier.id}:DTLV` });
      expect(both.status).toBe(400);
      const after = (await get(design.id)).body;
      expect(after).toEqual(before);
    });

    it.each<[string, object, string]>([
      [
        'speed and speed range together',
        { operating: { speedRpm: 1480, speedRangeRpm: { min: 900, max: 1480 }, orders: [1] } },
        'input.operating.speedRangeRpm',
      ],
      [
        'a speed range upside down',
        { operating: { speedRangeRpm: { min: 1480, max: 900 }, orders: [1] } },
        'input.operating.speedRangeRpm.max',
      ],
      ['a zero order', { operating: { speedRpm: 1480, orders: [0] } }, 'input.operating.orders'],
      [
        'a negative extra frequency',
        { operating: { speedRpm: 1480, orders: [1], extraFrequenciesHz: [-3] } },
        'input.operating.extraFrequenciesHz',
      ],
      ['a missing criteria block', { criteria: undefined }, 'input.criteria'],
    ])('PUT answers 400 naming the field for %s', async (_case, overrides, field) => {
      const design = await newDesign((await newProject()).id);
      const response = await put(design.id, { version: 1, input: input(overrides) });
      expect(response.status).toBe(400);
      expect(response.body.errors.map((e: { field: string }) => e.field)).toContain(field);
    });

    it('choosing a uniform candidate stores it (recomputed on the server), a snapshot and the bill of materials', async () => {
      const design = await newDesign((await newProject()).id);
      const selection = await t.http().post(`/api/designs/${design.id}/selection`).set(as('engineer')).send({ limit: 50 });
      expect(selection.status).toBe(200);
      expect(selection.body.disturbingFrequenciesHz.map((f: number) => f.toFixed(2))).toEqual(['24.67', '49.33', '100.00']);
      const listed = selection.body.candidates.find((c: { mountId?: number }) => c.mountId === spring.id);
      expect(listed.passes).toBe(true);

      const response = await put(design.id, { version: 1, chosenMountId: spring.id });
      expect(response.status).toBe(200);
      expect(response.body.version).toBe(2);
      const chosen = response.body.chosen;
      expect(chosen).toMatchObject({ kind: 'uniform', mountId: spring.id, passes: true, label: 'DT-SPRING-3000' });
      // the same figures as in the list the engineer chose from
      expect(chosen.perPoint).toEqual(listed.perPoint);
      expect(chosen.isolation).toEqual(listed.isolation);
      expect(chosen.score).toBeCloseTo(listed.score, 12);
      expect(chosen.modes).toHaveLength(6);
      expect(response.body.bom).toEqual([
        {
          supplier: { id: supplier.id, name: supplier.name },
          partNumber: 'DT-SPRING-3000',
          mountId: spring.id,
          quantity: 4,
          mountPoints: ['A', 'B', 'C', 'D'],
          unitPrice: 42.5,
          extendedPrice: 170,
          currency: 'USD',
          leadTimeDays: 12,
        },
      ]);
      const row = await t.app.get(DataSource).getRepository(Design).findOneByOrFail({ id: design.id });
      expect(row.snapshot?.mounts).toEqual([
        expect.objectContaining({ id: spring.id, partNumber: 'DT-SPRING-3000', verticalStiffnessNPerM: 1e5, dampingModel: 'viscous' }),
      ]);
      expect(row.snapshot?.candidate).toEqual(chosen);
      expect(row.snapshot?.massProperties.massKg).toBe(1000);
      expect(row.snapshot?.disturbingFrequencies).toHaveLength(3);

      // a later catalog change does not touch the stored choice
      await t.http().patch(`/api/mounts/${spring.id}`).set(as('catalog_manager')).send({ unitPrice: 99 }).expect(200);
      expect((await get(design.id)).body.bom[0].unitPrice).toBe(42.5);
      await t.http().patch(`/api/mounts/${spring.id}`).set(as('catalog_manager')).send({ unitPrice: 42.5 }).expect(200);

      // a new input without a choice clears the stale choice; null clears it explicitly
      const cleared = await put(design.id, {
        version: 2,
        input: input({ criteria: { minIsolationPct: 95, minUtilization: 0.5, maxUtilization: 1, supplierIds: [supplier.id] } }),
      });
      expect(cleared.body).toMatchObject({ version: 3, chosen: null, bom: [] });
      await put(design.id, { version: 3, chosenMountId: spring.id }).expect(200);
      const explicit = await put(design.id, { version: 4, chosenMountId: null });
      expect(explicit.body).toMatchObject({ version: 5, chosen: null, bom: [] });
    });

    it('choosing a series groups the BOM by part number with the points each part goes to', async () => {
      const skid = {
        components: [
          { name: 'Pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 } },
          { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
          { name: 'Base frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 } },
        ],
      };
      const design = await newDesign((await newProject()).id, 'engineer', { input: input(skid) });
      const response = await put(design.id, { version: 1, chosenSeriesId: `${supplier.id}:DTLV` });
      expect(response.status).toBe(200);
      expect(response.body.chosen).toMatchObject({ kind: 'series', seriesId: `${supplier.id}:DTLV` });
      const parts = response.body.chosen.perPoint.map((p: { partNumber: string }) => p.partNumber);
      const bom = response.body.bom as {
        partNumber: string;
        quantity: number;
        mountPoints: string[];
        unitPrice: number;
        extendedPrice: number;
      }[];
      expect(bom.reduce((n, line) => n + line.quantity, 0)).toBe(4);
      for (const line of bom) {
        expect(line.mountPoints).toEqual(['A', 'B', 'C', 'D'].filter((_, i) => parts[i] === line.partNumber));
        expect(line.quantity).toBe(line.mountPoints.length);
        expect(line.extendedPrice).toBeCloseTo(line.unitPrice * line.quantity, 9);
      }
      expect(new Set(bom.map((line) => line.partNumber)).size).toBe(bom.length);
      const malformed = await put(design.id, { version: 2, chosenSeriesId: 'no-colon' });
      expect(malformed.status).toBe(400);
    });

    it('purchasers see released and superseded designs only; others do not exist for them', async () => {
      const project = await newProject();
      const draft = await newDesign(project.id);
      const list = await t.http().get(`/api/projects/${project.id}/designs`).set(as('purchaser')).expect(200);
      expect(list.body).toEqual([]);
      await get(draft.id, 'purchaser').expect(404);
      const projects = await t.http().get('/api/projects').set(as('purchaser')).expect(200);
      expect(projects.body.find((p: { id: number }) => p.id === project.id).designCount).toBe(0);
      const forEngineer = await t.http().get(`/api/projects/${project.id}`).set(as('engineer')).expect(200);
      expect(forEngineer.body.designCount).toBe(1);
    });

    it('runs the selection of a saved design for engineers only', async () => {
      const design = await newDesign((await newProject()).id);
      await t.http().post(`/api/designs/${design.id}/selection`).set(as('viewer')).send({}).expect(403);
      const response = await t.http().post(`/api/designs/${design.id}/selection`).set(as('checker')).send({});
      expect(response.status).toBe(200);
      expect(Object.keys(response.body).sort()).toEqual(
        ['candidates', 'cg', 'considered', 'disturbingFrequenciesHz', 'elapsedMs', 'pointLoadsN', 'totalMassKg'].sort(),
      );
      await t.http().post(`/api/designs/${design.id}/selection`).set(as('engineer')).send({ limit: 0 }).expect(400);
    });

    it('keeps the last selection with the design while its input is unchanged', async () => {
      const design = await newDesign((await newProject()).id);
      expect((await get(design.id)).body.lastSelection).toBeNull();
      const run = await t.http().post(`/api/designs/${design.id}/selection`).set(as('engineer')).send({ limit: 7 });
      expect(run.status).toBe(200);

      // every role that reads the design gets it back exactly as the run answered; the design itself is untouched
      for (const who of ['engineer', 'checker', 'viewer', 'admin']) {
        const read = await get(design.id, who).expect(200);
        expect(read.body.version).toBe(1);
        expect(read.body.lastSelection).toMatchObject({ ranBy: { name: 'Erin Engineer' }, limit: 7, catalogChanged: false });
        expect(Date.parse(read.body.lastSelection.ranAt)).not.toBeNaN();
        expect(read.body.lastSelection.result).toEqual(run.body);
      }

      // a save that sends the same input again (key order aside) keeps the selection and the choice
      const chosen = await put(design.id, { version: 1, chosenMountId: spring.id });
      expect(chosen.status).toBe(200);
      const same = input();
      const reordered = { criteria: same.criteria, operating: same.operating, mountPoints: same.mountPoints, components: same.components };
      const resent = await put(design.id, { version: 2, name: 'Renamed skid', input: reordered });
      expect(resent.status).toBe(200);
      expect(resent.body).toMatchObject({ version: 3, name: 'Renamed skid', chosen: { mountId: spring.id } });
      expect(resent.body.lastSelection.result).toEqual(run.body);

      // a later run replaces it; the checker may run it too
      const again = await t.http().post(`/api/designs/${design.id}/selection`).set(as('checker')).send({});
      expect(again.status).toBe(200);
      const replaced = (await get(design.id)).body.lastSelection;
      expect(replaced).toMatchObject({ ranBy: { name: 'Chris Checker' }, limit: 20 });
      expect(replaced.result).toEqual(again.body);

      // a catalog change since the run is reported, the result still shown
      await t.http().patch(`/api/mounts/${spring.id}`).set(as('catalog_manager')).send({ leadTimeDays: 13 }).expect(200);
      expect((await get(design.id)).body.lastSelection.catalogChanged).toBe(true);
      await t.http().patch(`/api/mounts/${spring.id}`).set(as('catalog_manager')).send({ leadTimeDays: 12 }).expect(200);

      // a changed input ends it (and the choice), and the stored row goes
      const changed = await put(design.id, {
        version: 3,
        input: input({ operating: { speedRpm: 1450, orders: [1, 2], lineFrequencyHz: 50 } }),
      });
      expect(changed.status).toBe(200);
      expect(changed.body).toMatchObject({ chosen: null, lastSelection: null });
      expect(await t.app.get(DataSource).getRepository(DesignSelection).countBy({ designId: design.id })).toBe(0);
    });

    it('does not keep a run that failed, nor return a run made on another input', async () => {
      const design = await newDesign((await newProject()).id);
      await t.http().post(`/api/designs/${design.id}/selection`).set(as('viewer')).send({}).expect(403);
      await t.http().post(`/api/designs/${design.id}/selection`).set(as('engineer')).send({ limit: 0 }).expect(400);
      expect((await get(design.id)).body.lastSelection).toBeNull();

      await t.http().post(`/api/designs/${design.id}/selection`).set(as('engineer')).send({}).expect(200);
      // the input changes behind the stored row's back (as when a save races a run): it is not shown
      const repo = t.app.get(DataSource).getRepository(Design);
      const row = await repo.findOneByOrFail({ id: design.id });
      await repo.update({ id: design.id }, { input: { ...row.input, criteria: { ...row.input.criteria, minIsolationPct: 91 } } });
      expect((await get(design.id)).body.lastSelection).toBeNull();
    });
  });

  describe('the demo scenario', () => {
    const demoDesigns = async (who: string) => {
      const projects = await t.http().get('/api/projects').set(as(who)).expect(200);
      const project = projects.body.find((p: { name: string }) => p.name === DEMO_PROJECT.name);
      expect(project).toMatchObject({ site: DEMO_PROJECT.site, client: DEMO_PROJECT.client, owner: { name: 'Erin Engineer' } });
      return (await t.http().get(`/api/projects/${project.id}/designs`).set(as(who)).expect(200)).body as {
        id: number;
        name: string;
        status: string;
      }[];
    };

    it('holds P-2 released (with a passing candidate, checker and BOM) and P-3 as a draft with a choice', async () => {
      const designs = await demoDesigns('engineer');
      expect(designs.map((d) => [d.name, d.status])).toEqual([
        ['CHW pump P-2 skid', 'released'],
        ['CHW pump P-3 skid', 'draft'],
      ]);
      const p2 = (await get(designs[0].id)).body;
      expect(p2.checker).toEqual({ id: expect.any(Number), name: 'Chris Checker' });
      expect(p2.input.components.map((c: { massKg: number }) => c.massKg)).toEqual([300, 450, 250]);
      expect(p2.disturbingFrequencies.map((f: { frequencyHz: number }) => f.frequencyHz.toFixed(2))).toEqual([
        '24.67',
        '49.33',
        '100.00',
        '148.00',
      ]);
      expect(p2.chosen.passes).toBe(true);
      expect(p2.chosen.isolation[0].efficiencyPct).toBeGreaterThanOrEqual(90);
      expect(p2.bom.reduce((n: number, line: { quantity: number }) => n + line.quantity, 0)).toBe(4);
      const p3 = (await get(designs[1].id)).body;
      expect(p3.chosen).not.toBeNull();
      // released designs are frozen
      const frozen = await put(p2.id, { version: p2.version, name: 'Edited' }, 'admin');
      expect(frozen.status).toBe(409);
      expect(frozen.body.message).toBe('Released designs are frozen; start a new revision');
    });

    it('shows the purchaser the released design only', async () => {
      const designs = await demoDesigns('purchaser');
      expect(designs.map((d) => d.name)).toEqual(['CHW pump P-2 skid']);
      expect((await get(designs[0].id, 'purchaser')).status).toBe(200);
    });
  });
});
