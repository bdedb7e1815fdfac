/**
 * The catalog as the API returns it (see the catalog API contract; SI units throughout:
 * N, N/m, °C; lengths whose name ends in `Mm` in millimetres).
 */

export const MOUNT_TYPES = [
  'elastomer_pad',
  'elastomer_mount',
  'open_spring',
  'housed_spring',
  'restrained_spring',
  'air_spring',
  'wire_rope',
] as const;

export type MountType = (typeof MOUNT_TYPES)[number];

/** viscous ↔ damping ratio ζ; hysteretic (structural) ↔ loss factor η. */
export type DampingModel = 'viscous' | 'hysteretic';

export interface SupplierRef {
  id: number;
  name: string;
}

/** A supplier as a choice in a filter or a form (composed in by the route). */
export interface SupplierOption extends SupplierRef {
  active: boolean;
}

/** `GET /api/mounts/:id`, one item of `GET /api/mounts`. */
export interface Mount {
  id: number;
  supplier: SupplierRef;
  partNumber: string;
  series: string | null;
  mountType: MountType;
  ratedLoadN: number;
  verticalStiffnessNPerM: number;
  horizontalStiffnessNPerM: number | null;
  dynamicStiffnessRatio: number;
  dampingModel: DampingModel;
  /** Set for viscous damping, else null. */
  dampingRatio: number | null;
  /** Set for hysteretic damping, else null. */
  lossFactor: number | null;
  maxDeflectionMm: number | null;
  tempMinC: number | null;
  tempMaxC: number | null;
  heightMm: number | null;
  unitPrice: number | null;
  currency: string;
  leadTimeDays: number | null;
  active: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface MountPage {
  items: Mount[];
  total: number;
}

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
] as const;

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
export interface MountInput {
  supplierId: number;
  partNumber: string;
  series?: string | null;
  mountType: MountType;
  ratedLoadN: number;
  verticalStiffnessNPerM: number;
  horizontalStiffnessNPerM?: number | null;
  dynamicStiffnessRatio?: number;
  dampingRatio?: number | null;
  lossFactor?: number | null;
  maxDeflectionMm?: number | null;
  tempMinC?: number | null;
  tempMaxC?: number | null;
  heightMm?: number | null;
  unitPrice?: number | null;
  currency?: string;
  leadTimeDays?: number | null;
}

/** Body of `PATCH /api/mounts/:id`: any of the writable fields, and `active` to restore. */
export type MountChanges = Partial<MountInput> & { active?: boolean };

/** One problem of an imported file: the file's own row number (header = 1) and column. */
export interface ImportProblem {
  row: number;
  column: string;
  message: string;
}

/** An accepted row of an import preview: SI values in the Mount field names. */
export interface ImportPreviewRow
  extends Partial<Omit<Mount, 'id' | 'supplier' | 'active' | 'createdAt' | 'updatedAt'>> {
  row?: number;
  supplierName: string;
  partNumber: string;
  mountType: MountType;
  ratedLoadN: number;
  verticalStiffnessNPerM: number;
  action: 'create' | 'update';
}

/** `POST /api/mounts/import` (200, and the body of its 422). */
export interface ImportResult {
  accepted: number;
  rejected: number;
  /** Accepted rows that add a mount / update one (would, for a dry run or a refused file). */
  created: number;
  updated: number;
  errors: ImportProblem[];
  errorsTruncated: boolean;
  importId: number | null;
  preview: ImportPreviewRow[];
}

export type ImportMode = 'all_or_nothing' | 'skip_invalid';

/** `GET /api/mounts/imports`, newest first. */
export interface CatalogImportRecord {
  id: number;
  fileName: string;
  createdAt: string;
  user: { id: number; name: string } | null;
  mode: ImportMode;
  accepted: number;
  rejected: number;
  created: number;
  updated: number;
  hasErrorReport: boolean;
}
