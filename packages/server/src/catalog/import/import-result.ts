import type { DampingModel } from '../mount-rules.js';
import type { MountValues } from './catalog-columns.js';
import type { RowProblem } from './import-problem.js';

/** An accepted row as the preview shows it: stored (SI) values in the Mount JSON names. */
export interface ImportPreviewRow extends Omit<MountValues, 'supplierName'> {
  /** The file's row (header = 1). */
  row: number;
  supplierName: string;
  dampingModel: DampingModel;
  action: 'create' | 'update';
}

/** A supplier the file names that is not in the catalog: the import creates it (a typo shows here). */
export interface NewSupplier {
  name: string;
  /** The file's first row naming it. */
  firstRow: number;
  /** Valid rows naming it. */
  rows: number;
  /** An existing supplier with a very similar name (a likely typo), or null. */
  similarTo: string | null;
}

/** What an import did (or, for a dry run or a refused file, would do). */
export interface ImportResult {
  /** Valid rows (written, unless dry run or refused). */
  accepted: number;
  /** Rows with at least one problem. */
  rejected: number;
  /** Accepted rows that add a mount / update an existing one (by supplier and part number). */
  created: number;
  updated: number;
  /** Every problem, up to MAX_REPORTED_ERRORS. */
  errors: RowProblem[];
  errorsTruncated: boolean;
  /** The recorded import; null when nothing was written. */
  importId: number | null;
  /** The first PREVIEW_ROWS accepted rows. */
  preview: ImportPreviewRow[];
  /** Suppliers the file creates (would create, in a dry run), up to MAX_NEW_SUPPLIERS, in the file's order. */
  newSuppliers: NewSupplier[];
}

export const MAX_NEW_SUPPLIERS = 200;

export const MAX_REPORTED_ERRORS = 1000;
export const PREVIEW_ROWS = 100;

export const emptyResult = (errors: RowProblem[] = []): ImportResult => ({
  accepted: 0,
  rejected: 0,
  created: 0,
  updated: 0,
  errors: errors.slice(0, MAX_REPORTED_ERRORS),
  errorsTruncated: errors.length > MAX_REPORTED_ERRORS,
  importId: null,
  preview: [],
  newSuppliers: [],
});
