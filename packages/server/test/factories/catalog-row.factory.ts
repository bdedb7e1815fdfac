import type { CatalogRow } from '../../src/selection/engine/catalog-tuple.js';

let nextId = 1;

/**
 * A catalog row as the selection engine reads it, for unit tests of the engine: an elastomer mount
 * (hysteretic, loss factor 0.1) of 100 N/mm each way, rated 3000 N, full data; `fields` override.
 * Without an id it gets the next one (so the part number is unique too).
 */
export function catalogRow(fields: Partial<CatalogRow> = {}): CatalogRow {
  const id = fields.id ?? nextId++;
  return {
    id,
    supplierId: 1,
    partNumber: `R-${id}`,
    series: null,
    mountType: 'elastomer_mount',
    ratedLoadN: 3000,
    verticalStiffnessNPerM: 1e5,
    horizontalStiffnessNPerM: 1e5,
    dynamicStiffnessRatio: 1,
    dampingRatio: null,
    lossFactor: 0.1,
    maxDeflectionMm: 50,
    tempMinC: null,
    tempMaxC: null,
    unitPrice: 50,
    currency: 'USD',
    leadTimeDays: 10,
    ...fields,
  };
}

/** An open spring with viscous damping (ζ = 0.05), otherwise as `catalogRow`; `fields` override. */
export function springRow(fields: Partial<CatalogRow> = {}): CatalogRow {
  return catalogRow({ mountType: 'open_spring', dampingRatio: 0.05, lossFactor: null, ...fields });
}
