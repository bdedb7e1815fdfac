import { mountBody } from './catalog.factory.js';
import { createDesign, createRfqCatalog, releaseDesign } from './review.factory.js';
import type { TestApp } from '../utils/create-test-app.js';
import { MailCatcherService } from '../../src/mail/mail-catcher.service.js';

/** Asks for a "forgot password" link for `email` and reads its token from the local mail catcher. */
async function mailedResetToken(t: TestApp, email: string): Promise<string> {
  const asked = await t.http().post('/api/auth/password-reset').send({ email });
  if (asked.status !== 202) throw new Error(`password reset: ${asked.status} ${asked.text}`);
  for (let attempt = 0; attempt < 100; attempt++) {
    const mail = t.app
      .get(MailCatcherService)
      .store.list()
      .find((m) => m.to.includes(email) && m.text.includes('reset-password?token='));
    const token = mail && /reset-password\?token=(\S+)/.exec(mail.text)?.[1];
    if (token) return decodeURIComponent(token);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`no password link reached ${email}`);
}

/** Who sends a fuzzed request: an admin (passes every role check), a user of the fuzz's own, or nobody. */
export type FuzzCaller = 'admin' | 'own-user' | 'anonymous';

/** A route to fuzz, with a valid example request that the mutations start from. */
export interface FuzzTarget {
  /** The URL with real ids of records made for the fuzz. */
  url: string;
  as: FuzzCaller;
  /** A valid body (built fresh before each request, e.g. with the current version of a design). */
  body: () => Promise<unknown> | unknown;
  /** Runs relative to FUZZ_RUNS (routes whose valid requests hash a password with bcrypt get fewer). */
  runsFactor?: number;
}

/** A route with query parameters and a valid example query. */
export interface QueryFuzzTarget {
  url: string;
  as: FuzzCaller;
  query: Record<string, string>;
}

export interface FuzzTargets {
  tokens: Record<FuzzCaller, string | undefined>;
  /** Keyed by `METHOD /path` as in test/route-matrix.ts. */
  bodies: Record<string, FuzzTarget>;
  queries: Record<string, QueryFuzzTarget>;
}

const OWN_USER = { email: 'fuzz-own@example.test', password: 'fuzz own password 1' };

const designInput = (supplierId: number) => ({
  components: [
    { name: 'Pump', massKg: 420, altMassKg: 390, cg: { x: 0.3, y: 0, z: 0.35 }, box: { lx: 0.8, ly: 0.5, lz: 0.6 } },
    { name: 'Motor', massKg: 380, cg: { x: -0.4, y: 0.02, z: 0.4 }, inertia: { ixx: 12, iyy: 30, izz: 28, ixy: 0, ixz: 0, iyz: 0 } },
  ],
  mountPoints: [
    { label: 'A', x: 0.8, y: 0.45, z: 0, supportStiffnessNPerMm: 20000 },
    { label: 'B', x: 0.8, y: -0.45, z: 0 },
    { label: 'C', x: -0.8, y: 0.45, z: 0 },
    { label: 'D', x: -0.8, y: -0.45, z: 0 },
  ],
  operating: { speedRpm: 1480, orders: [1, 2], vaneCount: 6, lineFrequencyHz: 50, extraFrequenciesHz: [120] },
  criteria: {
    minIsolationPct: 90,
    minUtilization: 0.5,
    maxUtilization: 1,
    ambientTempC: 25,
    mountTypes: ['open_spring', 'housed_spring'],
    supplierIds: [supplierId],
    weightMarginPct: 10,
  },
});

/**
 * Records for the fuzz (made through the API: a supplier with a mount, drafts, a released
 * design with a request for quotation, two users) and a valid example request for every
 * route that takes a body or query parameters.
 */
export async function createFuzzTargets(t: TestApp): Promise<FuzzTargets> {
  const admin = await t.loginAs('admin');
  const catalogManager = await t.loginAs('catalog_manager');
  const engineer = await t.loginAs('engineer');
  const checker = await t.login('checker@tacet.test', 'tacet-demo');
  const auth = { Authorization: `Bearer ${admin}` };
  const must = async (label: string, request: Promise<{ status: number; text: string; body: { id: number } }>, status = 201) => {
    const response = await request;
    if (response.status !== status) throw new Error(`${label}: ${response.status} ${response.text}`);
    return response.body;
  };

  const catalog = await createRfqCatalog(t, catalogManager, 'quotes@fuzz-springs.invalid');
  const supplierId = catalog.supplier.id;
  const draft = await createDesign(t, admin, catalog);
  const toSubmit = await createDesign(t, admin, catalog);
  const released = await createDesign(t, engineer, catalog);
  await releaseDesign(t, released.id, engineer, checker);
  const rfq = await must('rfq', t.http().post(`/api/designs/${released.id}/rfqs`).set(auth).send({ supplierId, machineCount: 2 }));
  const rfqLineId = (rfq as unknown as { lines: { id: number }[] }).lines[0].id;
  const victim = await must(
    'user',
    t
      .http()
      .post('/api/users')
      .set(auth)
      .send({ email: 'fuzz-victim@example.test', name: 'Vic Victim', role: 'viewer', password: 'victim password 1' }),
  );
  await must(
    'own user',
    t
      .http()
      .post('/api/users')
      .set(auth)
      .send({ ...OWN_USER, name: 'Fay Fuzz', role: 'engineer' }),
  );
  const ownUser = await t.login(OWN_USER.email, OWN_USER.password);
  // One link, spent by the first valid example request; every later confirmation is refused and changes nothing.
  const resetToken = await mailedResetToken(t, 'fuzz-victim@example.test');
  const checkerId = (
    await t
      .http()
      .get('/api/auth/me')
      .set({ Authorization: `Bearer ${checker}` })
  ).body.id as number;

  const currentVersion = async (id: number): Promise<number> => (await t.http().get(`/api/designs/${id}`).set(auth)).body.version ?? 1;
  const input = designInput(supplierId);

  const bodies: Record<string, FuzzTarget> = {
    'POST /api/auth/login': { url: '/api/auth/login', as: 'anonymous', body: () => OWN_USER, runsFactor: 0.5 },
    'PATCH /api/auth/me': { url: '/api/auth/me', as: 'own-user', body: () => ({ name: 'Fay Fuzz', unitSystem: 'US' }) },
    'POST /api/auth/me/password': {
      url: '/api/auth/me/password',
      as: 'own-user',
      body: () => ({ currentPassword: OWN_USER.password, newPassword: 'fuzz own password 2' }),
      runsFactor: 0.5,
    },
    'POST /api/users': {
      url: '/api/users',
      as: 'admin',
      body: () => ({ email: 'fuzz-new@example.test', name: 'Nia New', role: 'viewer', password: 'new user password', unitSystem: 'SI' }),
      runsFactor: 0.5,
    },
    'POST /api/auth/password-reset': { url: '/api/auth/password-reset', as: 'anonymous', body: () => ({ email: OWN_USER.email }) },
    'POST /api/auth/password-reset/confirm': {
      url: '/api/auth/password-reset/confirm',
      as: 'anonymous',
      body: () => ({ token: resetToken, password: 'victim password 2' }),
    },
    'POST /api/users/:id/temporary-password': {
      url: `/api/users/${victim.id}/temporary-password`,
      as: 'admin',
      body: () => ({ password: 'temporary password 1' }),
      runsFactor: 0.5,
    },
    'PATCH /api/users/:id': {
      url: `/api/users/${victim.id}`,
      as: 'admin',
      body: () => ({ name: 'Vic Victim', role: 'viewer', active: true, unitSystem: 'SI' }),
    },
    'POST /api/suppliers': {
      url: '/api/suppliers',
      as: 'admin',
      body: () => ({
        name: 'Fuzzwell Mounts',
        contactEmail: 'sales@fuzzwell.invalid',
        phone: '+1 555 0100',
        notes: 'Invented for the fuzz tests',
      }),
    },
    'PATCH /api/suppliers/:id': {
      url: `/api/suppliers/${supplierId}`,
      as: 'admin',
      body: () => ({ phone: '+1 555 0199', notes: 'Updated' }),
    },
    'POST /api/mounts': {
      url: '/api/mounts',
      as: 'admin',
      body: () => mountBody(supplierId, { horizontalStiffnessNPerM: 50_000, unitPrice: 12.5, currency: 'EUR', leadTimeDays: 14 }),
    },
    'PATCH /api/mounts/:id': {
      url: `/api/mounts/${catalog.mountId}`,
      as: 'admin',
      body: () => ({ ratedLoadN: 3000, series: 'F2', leadTimeDays: 12 }),
    },
    'POST /api/mounts/import': { url: '/api/mounts/import?dryRun=true', as: 'admin', body: () => ({}) },
    'POST /api/projects': {
      url: '/api/projects',
      as: 'admin',
      body: () => ({ name: 'Fuzz project', site: 'Plant 9', client: 'Nobody Ltd', description: 'Invented' }),
    },
    'PATCH /api/projects/:id': {
      url: `/api/projects/${draft.projectId}`,
      as: 'admin',
      body: () => ({ name: draft.projectName, site: 'Plant 9', archived: false }),
    },
    'POST /api/projects/:id/designs': {
      url: `/api/projects/${draft.projectId}/designs`,
      as: 'admin',
      body: () => ({ name: 'Fuzzed skid', input }),
    },
    'PUT /api/designs/:id': {
      url: `/api/designs/${draft.id}`,
      as: 'admin',
      body: async () => ({ version: await currentVersion(draft.id), name: draft.name, input, chosenMountId: catalog.mountId }),
    },
    'POST /api/designs/:id/selection': { url: `/api/designs/${draft.id}/selection`, as: 'admin', body: () => ({ limit: 5 }) },
    'POST /api/designs/:id/transitions': {
      url: `/api/designs/${toSubmit.id}/transitions`,
      as: 'admin',
      body: () => ({ to: 'in_review', note: 'Ready for check', checkerId: checkerId }),
    },
    'POST /api/designs/:id/revisions': { url: `/api/designs/${released.id}/revisions`, as: 'admin', body: () => ({}) },
    'POST /api/designs/:id/rfqs/preview': {
      url: `/api/designs/${released.id}/rfqs/preview`,
      as: 'admin',
      body: () => ({ supplierId, message: 'Please quote.', machineCount: 3 }),
    },
    'POST /api/designs/:id/rfqs': {
      url: `/api/designs/${released.id}/rfqs`,
      as: 'admin',
      body: () => ({ supplierId, message: 'Please quote.', machineCount: 2 }),
    },
    'PATCH /api/rfqs/:id': {
      url: `/api/rfqs/${rfq.id}`,
      as: 'admin',
      body: () => ({
        status: 'quoted',
        lines: [{ lineId: rfqLineId, unitPrice: 40.5, leadTimeDays: 21 }],
        reference: 'Q-2026-041',
        validUntil: '2026-06-30',
        currency: 'USD',
        quotedAt: '2026-03-01T12:00:00.000Z',
        note: 'By phone',
      }),
    },
    'POST /api/rfqs/:id/retry': { url: `/api/rfqs/${rfq.id}/retry`, as: 'admin', body: () => ({}) },
    // multipart: JSON bodies never carry the file, so every one is refused; the file itself is fuzzed in fuzz-verification.e2e-spec.ts
    'POST /api/designs/:id/verifications': {
      url: `/api/designs/${released.id}/verifications`,
      as: 'admin',
      body: () => ({ kind: 'frf', quantity: 'receptance', tolerancePct: 10, note: 'Hammer at the centre of gravity' }),
    },
    'POST /api/selection': {
      url: '/api/selection',
      as: 'admin',
      body: () => ({
        components: input.components,
        mountPoints: input.mountPoints,
        disturbingFrequenciesHz: [24.67, 49.33, 100],
        criteria: input.criteria,
        restraint: { sdsG: 1.0, importanceFactor: 1.5, zOverH: 0.5, ap: 2.5, rp: 2, snubberGapMm: 6 },
        limit: 5,
      }),
    },
    'POST /api/selection/curves': {
      url: '/api/selection/curves',
      as: 'admin',
      body: () => ({
        components: input.components,
        mountPoints: input.mountPoints,
        operating: {
          speedRangeRpm: { min: 900, max: 1480 },
          orders: [1],
          skipBandsRpm: [{ min: 1000, max: 1050 }],
          sources: [{ label: 'Impeller', kind: 'unbalance', at: { x: 0.5, y: 0, z: 0.5 }, axis: 'x', rotorMassKg: 30 }],
        },
        criteria: input.criteria,
        mountId: catalog.mountId,
      }),
    },
  };

  const queries: Record<string, QueryFuzzTarget> = {
    'GET /api/mounts': {
      url: '/api/mounts',
      as: 'admin',
      query: {
        q: 'spring',
        type: 'open_spring,housed_spring',
        supplierId: String(supplierId),
        minLoadN: '100',
        maxLoadN: '5000',
        page: '1',
        pageSize: '20',
        sort: '-ratedLoadN,partNumber',
        includeRetired: 'false',
      },
    },
    'POST /api/mounts/import': { url: '/api/mounts/import', as: 'admin', query: { dryRun: 'true', onInvalid: 'skip' } },
    'GET /api/mounts/export.csv': { url: '/api/mounts/export.csv', as: 'admin', query: { units: 'both' } },
  };

  return { tokens: { admin, 'own-user': ownUser, anonymous: undefined }, bodies, queries };
}
