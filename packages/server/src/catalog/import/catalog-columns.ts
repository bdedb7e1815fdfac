import {
  cToF,
  exportNumber,
  fToC,
  inToMm,
  lbfPerInToNPerM,
  lbfToN,
  mmToIn,
  nPerMToLbfPerIn,
  nToLbf,
  withoutBinaryNoise,
  type UnitSystem,
} from '@tacet/vibration';
import { shiftDecimal } from './decimal-shift.js';
import { MOUNT_LIMITS, type MountType } from '../mount-rules.js';

/**
 * The columns of the catalog CSV format (catalog/FORMAT.md). A quantity may come in SI or US
 * customary units: each variant names its unit and converts to the stored SI value. Numbers are
 * written with exportNumber (at most 15 significant digits: no binary noise from a conversion), and
 * a value converted from a US customary cell is stored the same way, so an export reads back exactly.
 */

/** A mount as one CSV row describes it, in the stored units (SI; mm and °C where named). */
export interface MountValues {
  supplierName: string;
  partNumber: string;
  series: string | null;
  mountType: MountType;
  ratedLoadN: number;
  verticalStiffnessNPerM: number;
  horizontalStiffnessNPerM: number | null;
  dynamicStiffnessRatio: number | null;
  dampingRatio: number | null;
  lossFactor: number | null;
  maxDeflectionMm: number | null;
  tempMinC: number | null;
  tempMaxC: number | null;
  heightMm: number | null;
  /** Horizontal restraint rating (strength level), N. */
  restraintCapacityN: number | null;
  /** Uplift rating (strength level), N. */
  upliftCapacityN: number | null;
  unitPrice: number | null;
  currency: string;
  leadTimeDays: number | null;
}

export type MountField = keyof MountValues;

/** How a cell is read and which single-value rule it obeys. */
export type CellRule =
  | { kind: 'text'; maxLength: number }
  | { kind: 'mountType' }
  | { kind: 'currency' }
  /** A finite number; `min`/`max` with `exclusive` flags; `integer` for whole numbers. */
  | { kind: 'number'; min?: number; minExclusive?: boolean; max?: number; maxExclusive?: boolean; integer?: boolean };

export interface ColumnVariant {
  /** The header name (lower case). */
  name: string;
  /** The unit system the column is in (a column without a unit counts as SI). */
  system: UnitSystem;
  /** A stored value → the column's own unit (US customary columns; for messages). */
  fromStored?: (stored: number) => number;
  /** A cell (a valid plain number) → the stored value. */
  read: (text: string) => number;
  /** A stored value → the cell text. */
  write: (stored: number) => string;
}

/** One logical column: a field, its rule and the header names that can carry it. */
export interface ColumnSpec {
  field: MountField;
  rule: CellRule;
  /** The first variant is the SI one, the second (if any) the US customary one. */
  variants: readonly ColumnVariant[];
  required: boolean;
}

/** The stored unit itself. */
const stored = (name: string): ColumnVariant => ({ name, system: 'SI', read: Number, write: exportNumber });
/** A power-of-ten multiple of the stored unit, shifted exactly on the decimal digits. */
const decimal = (name: string, places: number): ColumnVariant => ({
  name,
  system: 'SI',
  read: (text) => Number(shiftDecimal(text, places)),
  write: (value) => shiftDecimal(exportNumber(value), -places),
});
/** A US customary unit, converted with the exact factors of @tacet/vibration. */
const customary = (name: string, toStored: (v: number) => number, fromStored: (v: number) => number): ColumnVariant => ({
  name,
  system: 'US',
  fromStored,
  read: (text) => withoutBinaryNoise(toStored(Number(text))),
  write: (value) => exportNumber(fromStored(value)),
});
const single = (name: string): ColumnVariant[] => [stored(name)];
const positive: CellRule = { kind: 'number', min: 0, minExclusive: true };

export const COLUMNS: readonly ColumnSpec[] = [
  {
    field: 'supplierName',
    rule: { kind: 'text', maxLength: MOUNT_LIMITS.supplierNameMaxLength },
    variants: single('supplier'),
    required: true,
  },
  {
    field: 'partNumber',
    rule: { kind: 'text', maxLength: MOUNT_LIMITS.partNumberMaxLength },
    variants: single('part_number'),
    required: true,
  },
  { field: 'series', rule: { kind: 'text', maxLength: MOUNT_LIMITS.seriesMaxLength }, variants: single('series'), required: false },
  { field: 'mountType', rule: { kind: 'mountType' }, variants: single('mount_type'), required: true },
  {
    field: 'ratedLoadN',
    rule: positive,
    variants: [stored('rated_load_n'), customary('rated_load_lbf', lbfToN, nToLbf)],
    required: true,
  },
  {
    field: 'verticalStiffnessNPerM',
    rule: positive,
    variants: [decimal('vertical_stiffness_n_per_mm', 3), customary('vertical_stiffness_lbf_per_in', lbfPerInToNPerM, nPerMToLbfPerIn)],
    required: true,
  },
  {
    field: 'horizontalStiffnessNPerM',
    rule: positive,
    variants: [decimal('horizontal_stiffness_n_per_mm', 3), customary('horizontal_stiffness_lbf_per_in', lbfPerInToNPerM, nPerMToLbfPerIn)],
    required: false,
  },
  {
    field: 'dynamicStiffnessRatio',
    rule: { kind: 'number', min: MOUNT_LIMITS.dynamicStiffnessRatio.min, max: MOUNT_LIMITS.dynamicStiffnessRatio.max },
    variants: single('dynamic_stiffness_ratio'),
    required: false,
  },
  {
    field: 'dampingRatio',
    rule: {
      kind: 'number',
      min: MOUNT_LIMITS.dampingRatio.min,
      minExclusive: true,
      max: MOUNT_LIMITS.dampingRatio.max,
      maxExclusive: true,
    },
    variants: single('damping_ratio'),
    required: false,
  },
  {
    field: 'lossFactor',
    rule: { kind: 'number', min: MOUNT_LIMITS.lossFactor.min, minExclusive: true, max: MOUNT_LIMITS.lossFactor.max },
    variants: single('loss_factor'),
    required: false,
  },
  {
    field: 'maxDeflectionMm',
    rule: positive,
    variants: [stored('max_deflection_mm'), customary('max_deflection_in', inToMm, mmToIn)],
    required: false,
  },
  {
    field: 'tempMinC',
    rule: { kind: 'number', min: MOUNT_LIMITS.temperatureC.min, max: MOUNT_LIMITS.temperatureC.max },
    variants: [stored('temp_min_c'), customary('temp_min_f', fToC, cToF)],
    required: false,
  },
  {
    field: 'tempMaxC',
    rule: { kind: 'number', min: MOUNT_LIMITS.temperatureC.min, max: MOUNT_LIMITS.temperatureC.max },
    variants: [stored('temp_max_c'), customary('temp_max_f', fToC, cToF)],
    required: false,
  },
  { field: 'heightMm', rule: positive, variants: [stored('height_mm'), customary('height_in', inToMm, mmToIn)], required: false },
  {
    field: 'restraintCapacityN',
    rule: positive,
    variants: [stored('restraint_capacity_n'), customary('restraint_capacity_lbf', lbfToN, nToLbf)],
    required: false,
  },
  {
    field: 'upliftCapacityN',
    rule: positive,
    variants: [stored('uplift_capacity_n'), customary('uplift_capacity_lbf', lbfToN, nToLbf)],
    required: false,
  },
  { field: 'unitPrice', rule: { kind: 'number', min: 0 }, variants: single('unit_price'), required: false },
  { field: 'currency', rule: { kind: 'currency' }, variants: single('currency'), required: false },
  {
    field: 'leadTimeDays',
    rule: { kind: 'number', min: MOUNT_LIMITS.leadTimeDays.min, max: MOUNT_LIMITS.leadTimeDays.max, integer: true },
    variants: single('lead_time_days'),
    required: false,
  },
];

/** Every known header name, in the order of the format. */
export const KNOWN_COLUMN_NAMES: readonly string[] = COLUMNS.flatMap((column) => column.variants.map((v) => v.name));

/** The header of an SI export: the SI variant of every column. */
export const EXPORT_HEADER: readonly string[] = COLUMNS.map((column) => column.variants[0].name);

/** Which columns an export writes: the SI ones, the US customary ones (where a quantity has them), or both. */
export type ExportUnits = UnitSystem | 'both';
export const EXPORT_UNITS: readonly ExportUnits[] = ['SI', 'US', 'both'];

/** The columns of an export in `units`, in the order of the format (both: the SI column, then the US one). */
export function exportColumns(units: ExportUnits): { spec: ColumnSpec; variant: ColumnVariant }[] {
  return COLUMNS.flatMap((spec) => {
    const us = spec.variants.find((v) => v.system === 'US');
    const chosen = units === 'SI' || !us ? [spec.variants[0]] : units === 'US' ? [us] : [spec.variants[0], us];
    return chosen.map((variant) => ({ spec, variant }));
  });
}

/** The column spec of a field. */
export const columnOf = (field: MountField): ColumnSpec => {
  const column = COLUMNS.find((c) => c.field === field);
  if (!column) throw new Error(`No column for ${field}`);
  return column;
};
