/**
 * The catalog as the API returns it (SI units throughout: N, N/m, °C; lengths whose name ends in
 * `Mm` in millimetres). The API shapes are aliases of the types generated from the server's
 * OpenAPI document (`@/api/schema`, `npm run api-types`); the query and sort types below are the
 * catalog page's own state.
 */
import { mountTypeValues, type ApiSchemas, type operations } from '@/api/schema';

/** Mount kinds, in the server's order. */
export const MOUNT_TYPES = mountTypeValues;
export type MountType = ApiSchemas['MountType'];

/** viscous ↔ damping ratio ζ; hysteretic (structural) ↔ loss factor η. */
export type DampingModel = ApiSchemas['DampingModel'];

export type SupplierRef = ApiSchemas['MountSupplierDto'];

/** A supplier as a choice in a filter or a form (composed in by the route). */
export type SupplierOption = Pick<ApiSchemas['SupplierDto'], 'id' | 'name' | 'active'>;

/** `GET /api/mounts/:id`, one item of `GET /api/mounts`. */
export type Mount = ApiSchemas['MountDto'];

export type MountPage = ApiSchemas['MountPageDto'];

/** The query parameters of `GET /api/mounts`. */
export type MountSearchParams = NonNullable<operations['MountsController_search']['parameters']['query']>;

/** Fields `GET /api/mounts` can sort by. */
export const MOUNT_SORT_FIELDS = [
  'supplier',
  'partNumber',
  'series',
  'mountType',
  'ratedLoadN',
  'verticalStiffnessNPerM',
  'unitPrice',
  'leadTimeDays',
  'updatedAt',
] as const satisfies readonly (keyof Mount)[];

export type MountSortField = (typeof MOUNT_SORT_FIELDS)[number];

export interface MountSort {
  field: MountSortField;
  direction: 'asc' | 'desc';
}

/** What the catalog page asks the server for. Loads in N. */
export interface MountQuery {
  q: string;
  supplierId: number | null;
  types: MountType[];
  minLoadN: number | null;
  maxLoadN: number | null;
  includeRetired: boolean;
  /** `null`: the server's default order (supplier, then part number). */
  sort: MountSort | null;
  /** 1-based. */
  page: number;
  pageSize: number;
}

/** Body of `POST /api/mounts`. Exactly one of `dampingRatio` / `lossFactor`. */
export type MountInput = ApiSchemas['CreateMountDto'];

/** Body of `PATCH /api/mounts/:id`: any of the writable fields, and `active` to restore. */
export type MountChanges = ApiSchemas['UpdateMountDto'];

/** One problem of an imported file: the file's own row number (header = 1) and column. */
export type ImportProblem = ApiSchemas['ImportProblemDto'];

/** An accepted row of an import preview: SI values in the Mount field names. */
export type ImportPreviewRow = ApiSchemas['ImportPreviewRowDto'];

/** `POST /api/mounts/import` (200; the body of its 422 adds `statusCode` and `message`). */
export type ImportResult = ApiSchemas['ImportResultDto'];

export type ImportMode = ApiSchemas['ImportMode'];

/** `GET /api/mounts/imports`, newest first. */
export type CatalogImportRecord = ApiSchemas['CatalogImportDto'];
