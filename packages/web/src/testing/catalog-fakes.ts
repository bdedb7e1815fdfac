import type { CatalogImportRecord, ImportPreviewRow, ImportResult, Mount, MountType } from '@/features/catalog/types';
import type { Supplier } from '@/features/suppliers/types';

import type { FakeApi, FakeRequest } from './fake-api';

/** Invented suppliers and mounts for the catalog screens' tests (no real company or product). */
export function makeSupplier(overrides: Partial<Supplier> & Pick<Supplier, 'id' | 'name'>): Supplier {
  return {
    contactEmail: null,
    phone: null,
    notes: null,
    active: true,
    mountCount: 0,
    createdAt: '2025-02-03T08:00:00.000Z',
    updatedAt: '2025-02-03T08:00:00.000Z',
    ...overrides,
  };
}

export const QUILLMERE = makeSupplier({
  id: 1,
  name: 'Quillmere Isolation',
  contactEmail: 'orders@quillmere.test',
  phone: '+1 555 0100',
  mountCount: 180,
});
export const TAMBERLIN = makeSupplier({ id: 2, name: 'Tamberlin Elastics', mountCount: 70 });
export const OSWIN = makeSupplier({ id: 3, name: 'Oswin Springworks', active: false, mountCount: 0 });

let nextMountId = 1000;

export function makeMount(overrides: Partial<Mount> = {}): Mount {
  const id = overrides.id ?? nextMountId++;
  return {
    id,
    supplier: { id: QUILLMERE.id, name: QUILLMERE.name },
    partNumber: `QM-S1-${String(id).padStart(5, '0')}`,
    series: 'S1',
    mountType: 'open_spring',
    ratedLoadN: 2400,
    verticalStiffnessNPerM: 72_500,
    horizontalStiffnessNPerM: 68_900,
    dynamicStiffnessRatio: 1,
    dampingModel: 'viscous',
    dampingRatio: 0.008,
    lossFactor: null,
    maxDeflectionMm: 49.7,
    tempMinC: -40,
    tempMaxC: 120,
    heightMm: 120,
    restraintCapacityN: null,
    upliftCapacityN: null,
    unitPrice: 48.2,
    currency: 'USD',
    leadTimeDays: 21,
    active: true,
    createdAt: '2025-02-03T08:00:00.000Z',
    updatedAt: '2025-02-04T08:00:00.000Z',
    ...overrides,
  };
}

/** `count` mounts with rising rated loads, alternating suppliers and types. */
export function makeMounts(count: number): Mount[] {
  const types: MountType[] = ['open_spring', 'housed_spring', 'elastomer_mount', 'elastomer_pad'];
  return Array.from({ length: count }, (_, index) => {
    const supplier = index % 3 === 2 ? TAMBERLIN : QUILLMERE;
    const type = types[index % types.length] as MountType;
    const elastomer = type.startsWith('elastomer');
    return makeMount({
      id: index + 1,
      supplier: { id: supplier.id, name: supplier.name },
      partNumber: `${supplier === TAMBERLIN ? 'TE' : 'QM'}-${String(index + 1).padStart(4, '0')}`,
      mountType: type,
      ratedLoadN: 500 + index * 10,
      dampingModel: elastomer ? 'hysteretic' : 'viscous',
      dampingRatio: elastomer ? null : 0.01,
      lossFactor: elastomer ? 0.15 : null,
      dynamicStiffnessRatio: elastomer ? 1.4 : 1,
    });
  });
}

export interface FakeCatalog {
  mounts: Mount[];
  suppliers: Supplier[];
  /** The `GET /api/mounts` requests, in order. */
  listCalls: () => FakeRequest[];
}

/**
 * A small in-memory catalog behind the fake API, answering as the catalog API contract says
 * (paging, `q`, `supplierId`, `type`, load range, `includeRetired`, sort).
 */
export function serveCatalog(fake: FakeApi, initial: { mounts?: Mount[]; suppliers?: Supplier[] } = {}): FakeCatalog {
  const mounts = [...(initial.mounts ?? [])];
  const suppliers = [...(initial.suppliers ?? [QUILLMERE, TAMBERLIN, OSWIN])];
  fake
    .on('get', '/mounts', ({ query }) => {
      let rows = mounts.filter((mount) => query.includeRetired === 'true' || mount.active);
      const q = query.q?.toLowerCase();
      if (q) {
        rows = rows.filter((mount) =>
          [mount.partNumber, mount.series ?? '', mount.supplier.name].some((text) => text.toLowerCase().includes(q)),
        );
      }
      if (query.supplierId) rows = rows.filter((mount) => mount.supplier.id === Number(query.supplierId));
      if (query.type) {
        const types = query.type.split(',');
        rows = rows.filter((mount) => types.includes(mount.mountType));
      }
      if (query.minLoadN) rows = rows.filter((mount) => mount.ratedLoadN >= Number(query.minLoadN));
      if (query.maxLoadN) rows = rows.filter((mount) => mount.ratedLoadN <= Number(query.maxLoadN));
      if (query.sort) {
        const descending = query.sort.startsWith('-');
        const field = (descending ? query.sort.slice(1) : query.sort) as keyof Mount;
        rows = [...rows].sort((a, b) => {
          const left = field === 'supplier' ? a.supplier.name : (a[field] as string | number);
          const right = field === 'supplier' ? b.supplier.name : (b[field] as string | number);
          const order = left < right ? -1 : left > right ? 1 : 0;
          return descending ? -order : order;
        });
      }
      const page = Number(query.page ?? 1);
      const pageSize = Number(query.pageSize ?? 50);
      return { status: 200, data: { items: rows.slice((page - 1) * pageSize, page * pageSize), total: rows.length } };
    })
    .on('get', '/mounts/:id', ({ params }) => {
      const mount = mounts.find((candidate) => candidate.id === Number(params.id));
      return mount ? { status: 200, data: mount } : { status: 404, data: { statusCode: 404, message: 'Mount not found' } };
    })
    .on('patch', '/mounts/:id', ({ params, body }) => {
      const mount = mounts.find((candidate) => candidate.id === Number(params.id));
      if (!mount) return { status: 404, data: { statusCode: 404, message: 'Mount not found' } };
      Object.assign(mount, body);
      return { status: 200, data: mount };
    })
    .on('delete', '/mounts/:id', ({ params }) => {
      const mount = mounts.find((candidate) => candidate.id === Number(params.id));
      if (!mount) return { status: 404, data: { statusCode: 404, message: 'Mount not found' } };
      mount.active = false;
      return { status: 200, data: mount };
    })
    .on('get', '/suppliers', () => ({ status: 200, data: [...suppliers].sort((a, b) => a.name.localeCompare(b.name)) }));
  return { mounts, suppliers, listCalls: () => fake.calls('get', '/mounts') };
}

/** An accepted row of an import preview as the server sends it (every field, null where empty). */
export function makePreviewRow(overrides: Partial<ImportPreviewRow> & Pick<ImportPreviewRow, 'row' | 'partNumber'>): ImportPreviewRow {
  return {
    action: 'create',
    supplierName: QUILLMERE.name,
    series: null,
    mountType: 'open_spring',
    ratedLoadN: 1000,
    verticalStiffnessNPerM: 40_000,
    horizontalStiffnessNPerM: null,
    dynamicStiffnessRatio: 1,
    dampingModel: 'viscous',
    dampingRatio: 0.01,
    lossFactor: null,
    maxDeflectionMm: null,
    tempMinC: null,
    tempMaxC: null,
    heightMm: null,
    restraintCapacityN: null,
    upliftCapacityN: null,
    unitPrice: null,
    currency: 'USD',
    leadTimeDays: null,
    ...overrides,
  };
}

export function makeImportResult(overrides: Partial<ImportResult> = {}): ImportResult {
  return {
    accepted: 0,
    rejected: 0,
    created: 0,
    updated: 0,
    errors: [],
    errorsTruncated: false,
    importId: null,
    preview: [],
    newSuppliers: [],
    ...overrides,
  };
}

export function makeImportRecord(overrides: Partial<CatalogImportRecord> & Pick<CatalogImportRecord, 'id'>): CatalogImportRecord {
  return {
    fileName: 'spring-range.csv',
    createdAt: '2025-03-10T14:30:00.000Z',
    user: { id: 2, name: 'Cato Catalog' },
    mode: 'all_or_nothing',
    accepted: 12,
    rejected: 0,
    created: 10,
    updated: 2,
    hasErrorReport: false,
    ...overrides,
  };
}
