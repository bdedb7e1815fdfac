import type { TestApp } from '../utils/create-test-app.js';

/**
 * Designs with chosen mounts for the review and purchasing tests, made through the API:
 * an invented supplier (with or without a contact e-mail) and spring mount, a project and a
 * design whose selection is restricted to that supplier.
 */
let counter = 0;

export interface TestCatalog {
  supplier: { id: number; name: string; contactEmail: string | null };
  mountId: number;
  partNumber: string;
  unitPrice: number;
}

export async function createRfqCatalog(
  t: TestApp,
  catalogToken: string,
  contactEmail: string | null,
  unitPrice = 42.5,
): Promise<TestCatalog> {
  const n = ++counter;
  const auth = { Authorization: `Bearer ${catalogToken}` };
  const supplier = await t
    .http()
    .post('/api/suppliers')
    .set(auth)
    .send({ name: `Review Test Mounts ${n}-${process.pid}`, ...(contactEmail ? { contactEmail } : {}) });
  if (supplier.status !== 201) throw new Error(`supplier: ${supplier.status} ${supplier.text}`);
  const partNumber = `RV-SPRING-${n}`;
  const mount = await t.http().post('/api/mounts').set(auth).send({
    supplierId: supplier.body.id,
    partNumber,
    mountType: 'open_spring',
    ratedLoadN: 3000,
    verticalStiffnessNPerM: 1.0e5,
    horizontalStiffnessNPerM: 1.0e5,
    dynamicStiffnessRatio: 1,
    dampingRatio: 0.05,
    maxDeflectionMm: 50,
    tempMinC: -40,
    tempMaxC: 120,
    unitPrice,
    currency: 'USD',
    leadTimeDays: 12,
  });
  if (mount.status !== 201) throw new Error(`mount: ${mount.status} ${mount.text}`);
  return {
    supplier: { id: supplier.body.id, name: supplier.body.name, contactEmail },
    mountId: mount.body.id,
    partNumber,
    unitPrice,
  };
}

export interface TestDesign {
  id: number;
  name: string;
  projectId: number;
  projectName: string;
}

const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];

/** A draft by `authorToken` with `catalog`'s spring chosen at all four corners (unless `choose` is false). */
export async function createDesign(t: TestApp, authorToken: string, catalog: TestCatalog, choose = true): Promise<TestDesign> {
  const n = ++counter;
  const auth = { Authorization: `Bearer ${authorToken}` };
  const project = await t
    .http()
    .post('/api/projects')
    .set(auth)
    .send({ name: `Review project ${n}-${process.pid}` });
  if (project.status !== 201) throw new Error(`project: ${project.status} ${project.text}`);
  const name = `Pump skid ${n}`;
  const design = await t
    .http()
    .post(`/api/projects/${project.body.id}/designs`)
    .set(auth)
    .send({
      name,
      input: {
        components: [{ name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 } }],
        mountPoints: CORNERS,
        operating: { speedRpm: 1480, orders: [1, 2], lineFrequencyHz: 50 },
        criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, supplierIds: [catalog.supplier.id] },
      },
    });
  if (design.status !== 201) throw new Error(`design: ${design.status} ${design.text}`);
  if (choose) {
    const put = await t.http().put(`/api/designs/${design.body.id}`).set(auth).send({ version: 1, chosenMountId: catalog.mountId });
    if (put.status !== 200) throw new Error(`choose: ${put.status} ${put.text}`);
  }
  return { id: design.body.id, name, projectId: project.body.id, projectName: project.body.name };
}

/** Sends the design for check as its author and releases it as the checker. */
export async function releaseDesign(t: TestApp, id: number, authorToken: string, checkerToken: string): Promise<void> {
  const submit = await t
    .http()
    .post(`/api/designs/${id}/transitions`)
    .set({ Authorization: `Bearer ${authorToken}` })
    .send({ to: 'in_review' });
  if (submit.status !== 200) throw new Error(`submit: ${submit.status} ${submit.text}`);
  const release = await t
    .http()
    .post(`/api/designs/${id}/transitions`)
    .set({ Authorization: `Bearer ${checkerToken}` })
    .send({ to: 'released' });
  if (release.status !== 200) throw new Error(`release: ${release.status} ${release.text}`);
}
