/**
 * How catalog rows reach the engine: the columns it reads, in which order, and the tuple (an
 * array per mount, no object per row) the catalog reader delivers. The reader selects
 * CATALOG_COLUMNS for every mount of the prefilter and DETAIL_COLUMNS for the few mounts whose
 * details are needed (candidates that are ranked high, shown or chosen).
 */

/** A catalog mount with the fields the selection uses (numbers may arrive as strings from some drivers). */
export interface CatalogRow {
  id: number;
  supplierId: number;
  partNumber: string;
  series: string | null;
  mountType: string;
  ratedLoadN: number;
  verticalStiffnessNPerM: number;
  horizontalStiffnessNPerM: number | null;
  /** Null: the catalog gives none (assumptions.ts). */
  dynamicStiffnessRatio: number | null;
  dampingRatio: number | null;
  lossFactor: number | null;
  maxDeflectionMm: number | null;
  tempMinC: number | null;
  tempMaxC: number | null;
  unitPrice: number | null;
  currency: string;
  leadTimeDays: number | null;
  /** Horizontal restraint and uplift ratings, N (seismic restraint; restraint-check.ts); absent: none. */
  restraintCapacityN?: number | null;
  upliftCapacityN?: number | null;
}

/**
 * The columns the prefilter reads per mount, in this order (rows arrive as arrays: no object
 * per row). What ranking and the row checks need (the type and the horizontal stiffness decide
 * the assumptions and the springs' stability, assumptions.ts, spring-checks.ts): the other fields of a mount (DETAIL_COLUMNS) are read
 * afterwards, for the few candidates whose modes are computed or that are shown.
 */
export const CATALOG_COLUMNS = [
  'id',
  'supplierId',
  'series',
  'ratedLoadN',
  'verticalStiffnessNPerM',
  'dynamicStiffnessRatio',
  'dampingRatio',
  'lossFactor',
  'maxDeflectionMm',
  'unitPrice',
  'currency',
  'leadTimeDays',
  'restraintCapacityN',
  'upliftCapacityN',
  'mountType',
  'horizontalStiffnessNPerM',
] as const satisfies readonly (keyof CatalogRow)[];

/**
 * Fields read for a few mounts only; a tuple may carry them after CATALOG_COLUMNS (a choice
 * evaluated outside the prefilter does, so that its temperature and type are checked).
 */
export const DETAIL_COLUMNS = ['partNumber', 'mountType', 'tempMinC', 'tempMaxC'] as const satisfies readonly (keyof CatalogRow)[];

/** The detail fields of one mount. */
export type MountDetails = Pick<CatalogRow, (typeof DETAIL_COLUMNS)[number]>;

/** Loads the details of mounts by id. */
export type DetailsLoader = (mountIds: number[]) => Promise<ReadonlyMap<number, MountDetails>>;

/** One mount as read: the CATALOG_COLUMNS values in order (+ DETAIL_COLUMNS, optionally). */
export type CatalogTuple = readonly unknown[];

/** Column positions (plain constants: the hot loop reads them per row). */
export const CATALOG_COLUMN_INDEX = {
  id: 0,
  supplierId: 1,
  series: 2,
  ratedLoadN: 3,
  verticalStiffnessNPerM: 4,
  dynamicStiffnessRatio: 5,
  dampingRatio: 6,
  lossFactor: 7,
  maxDeflectionMm: 8,
  unitPrice: 9,
  currency: 10,
  leadTimeDays: 11,
  restraintCapacityN: 12,
  upliftCapacityN: 13,
  mountType: 14,
  horizontalStiffnessNPerM: 15,
} as const satisfies { [K in (typeof CATALOG_COLUMNS)[number]]: number };

/** Position of the first DETAIL_COLUMNS value in a tuple that carries them. */
export const DETAILS_AT = CATALOG_COLUMNS.length;

/** A catalog row object → the tuple the engine reads (tests, and drivers that return objects). */
export function toCatalogTuple(row: Partial<CatalogRow>, withDetails = false): unknown[] {
  const tuple: unknown[] = CATALOG_COLUMNS.map((name) => row[name] ?? null);
  if (withDetails) for (const name of DETAIL_COLUMNS) tuple.push(row[name] ?? null);
  return tuple;
}

/** A cell as a number: NaN when empty (null / undefined). */
export const num = (value: unknown): number => (value === null || value === undefined ? Number.NaN : Number(value));
