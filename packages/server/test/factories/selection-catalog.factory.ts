import type { TestApp } from '../utils/create-test-app.js';

/**
 * Catalog data for the selection and design tests, created through the catalog API (as a
 * catalog manager) so that the tests depend only on its contract. Every supplier gets a
 * unique invented name; tests restrict their selections to their own suppliers.
 */
let counter = 0;

export interface CreatedSupplier {
  id: number;
  name: string;
}

export interface CreatedMount {
  id: number;
  partNumber: string;
}

export async function createSupplier(t: TestApp, token: string, prefix = 'Selection Test Mounts'): Promise<CreatedSupplier> {
  const response = await t
    .http()
    .post('/api/suppliers')
    .set('Authorization', `Bearer ${token}`)
    .send({ name: `${prefix} ${++counter}-${process.pid}` });
  if (response.status !== 201) throw new Error(`supplier: ${response.status} ${response.text}`);
  return { id: response.body.id, name: response.body.name };
}

/** A steel spring by default (ζ = 0.05, n_d = 1); every field can be overridden. */
export async function createMount(t: TestApp, token: string, supplierId: number, fields: Record<string, unknown>): Promise<CreatedMount> {
  const body = {
    supplierId,
    partNumber: `SEL-${++counter}`,
    mountType: 'open_spring',
    ratedLoadN: 3000,
    verticalStiffnessNPerM: 1.0e5,
    horizontalStiffnessNPerM: 1.0e5,
    dynamicStiffnessRatio: 1,
    dampingRatio: 0.05,
    maxDeflectionMm: 50,
    tempMinC: -40,
    tempMaxC: 120,
    unitPrice: 50,
    currency: 'USD',
    leadTimeDays: 10,
    ...fields,
  };
  const response = await t.http().post('/api/mounts').set('Authorization', `Bearer ${token}`).send(body);
  if (response.status !== 201) throw new Error(`mount: ${response.status} ${response.text}`);
  return { id: response.body.id, partNumber: response.body.partNumber };
}
