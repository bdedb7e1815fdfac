import { CURRENCY_PATTERN, MOUNT_LIMITS, MOUNT_TYPES, crossFieldProblems, type MountType } from '../mount-rules.js';
import { exportNumber } from '@tacet/vibration';
import { columnOf, type CellRule, type ColumnVariant, type MountField, type MountValues } from './catalog-columns.js';
import type { CellProblem, HeaderMap } from './header-mapper.js';

/** A plain decimal with `.` (an exponent is allowed, as number formatters write one). */
const NUMBER_PATTERN = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** C0 control characters other than tab, and DEL: not part of one line of text. */
// eslint-disable-next-line no-control-regex -- the pattern is there to find control characters
const CONTROL_CHARACTERS = /[\u0000-\u0008\u000A-\u001F\u007F]/;

/** A leading `'` that guards one of these (see the export) is removed on import. */
const FORMULA_GUARD = /^'(?=[=+\-@\t\r])/;

const MOUNT_TYPE_SET = new Set<string>(MOUNT_TYPES);

/** The given value, shortened, for messages. */
function shown(raw: string): string {
  const value = raw.trim();
  return value.length > 40 ? `${value.slice(0, 37)}...` : value;
}

function describeRange(rule: Extract<CellRule, { kind: 'number' }>): string {
  const { min, max, minExclusive, maxExclusive, integer } = rule;
  if (integer && min !== undefined && max !== undefined) return `must be a whole number from ${min} to ${max}`;
  if (min === 0 && minExclusive && max === undefined) return 'must be a positive number';
  if (min === 0 && !minExclusive && max === undefined) return 'must be zero or a positive number';
  if (min !== undefined && max !== undefined && !minExclusive && !maxExclusive) return `must be a number from ${min} to ${max}`;
  const lower = min === undefined ? '' : `${minExclusive ? 'greater than' : 'at least'} ${min}`;
  const upper = max === undefined ? '' : `${maxExclusive ? 'less than' : 'at most'} ${max}`;
  return `must be a number ${[lower, upper].filter(Boolean).join(' and ')}`;
}

function inRange(value: number, rule: Extract<CellRule, { kind: 'number' }>): boolean {
  if (rule.integer && !Number.isInteger(value)) return false;
  if (rule.min !== undefined && (rule.minExclusive ? value <= rule.min : value < rule.min)) return false;
  if (rule.max !== undefined && (rule.maxExclusive ? value >= rule.max : value > rule.max)) return false;
  return true;
}

type CellValue = string | number | null;

/** The rule's limits in a US customary column's own unit (for its message): −80…250 °C reads −112…482 for °F. */
function inColumnUnit(rule: Extract<CellRule, { kind: 'number' }>, variant: ColumnVariant): Extract<CellRule, { kind: 'number' }> {
  const own = variant.fromStored;
  if (!own) return rule;
  const limit = (v: number | undefined) => (v === undefined ? undefined : Number(exportNumber(own(v))));
  return { ...rule, min: limit(rule.min), max: limit(rule.max) };
}

/** Reads one non-empty cell by its rule: the stored value, or a problem message. */
function readCell(raw: string, rule: CellRule, variant: ColumnVariant): { value?: CellValue; problem?: string } {
  const read = variant.read;
  const text = raw.trim();
  switch (rule.kind) {
    case 'text': {
      const value = text.replace(FORMULA_GUARD, '');
      if (CONTROL_CHARACTERS.test(value)) return { problem: 'must be one line of text without control characters' };
      if (value.length > rule.maxLength) return { problem: `is longer than ${rule.maxLength} characters` };
      return { value };
    }
    case 'mountType': {
      const value = text.toLowerCase();
      if (MOUNT_TYPE_SET.has(value)) return { value };
      return { problem: `must be one of ${MOUNT_TYPES.join(', ')} (got "${shown(raw)}")` };
    }
    case 'currency':
      if (CURRENCY_PATTERN.test(text)) return { value: text.toUpperCase() };
      return { problem: `must be a three-letter currency code such as USD (got "${shown(raw)}")` };
    case 'number': {
      if (!NUMBER_PATTERN.test(text)) {
        const hint = /^[+-]?[\d.,\s]+$/.test(text) ? ' with "." as the decimal point and no thousands separators' : '';
        return { problem: `must be a plain number${hint} (got "${shown(raw)}")` };
      }
      const value = read(text);
      if (!Number.isFinite(value)) return { problem: `is too large (got "${shown(raw)}")` };
      if (!inRange(value, rule)) return { problem: `${describeRange(inColumnUnit(rule, variant))} (got "${shown(raw)}")` };
      return { value };
    }
  }
}

/** One cell read: its column, text, unit and stored value. */
interface Reading {
  column: string;
  text: string;
  variant: ColumnVariant;
  value: CellValue;
}

/** Half a unit of the last digit written, in the cell's own unit: "539.5" → 0.05. */
function halfLastDigit(text: string): number {
  const match = /^[+-]?(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text);
  const decimals = (match?.[2]?.length ?? 0) - Number(match?.[3] ?? 0);
  return 0.5 * 10 ** -decimals;
}

/**
 * One quantity given in both units: they agree when they differ by no more than the rounding of
 * what is written (half a unit of the last digit of each cell, in stored units). The SI cell is
 * kept; disagreeing cells are a problem in words.
 */
function agreeing(cells: readonly Reading[]): Reading | string {
  if (cells.length === 1 || typeof cells[0].value !== 'number' || typeof cells[1].value !== 'number') return cells[0];
  const [si, us] = cells[0].variant.system === 'SI' ? cells : [cells[1], cells[0]];
  const a = si.value as number;
  const b = us.value as number;
  const slack = (cell: Reading, value: number) => {
    const x = Number(cell.text);
    return Math.abs(cell.variant.read(String(x + halfLastDigit(cell.text))) - value);
  };
  if (Math.abs(a - b) <= slack(si, a) + slack(us, b) + Math.abs(a) * 1e-12) return si;
  const inSiUnit = Number(Number(si.variant.write(b)).toPrecision(6));
  return `disagrees with ${si.column}: ${us.text} is ${inSiUnit} in the unit of ${si.column}, which says ${si.text}; give one of them, or make them agree`;
}

/** The result of one row: its values when it has no problem. */
export interface RowResult {
  values: MountValues | null;
  problems: CellProblem[];
}

const isBlank = (field: string): boolean => field.trim() === '';

/** True for a row with no content at all (a blank line, or only separators). */
export const isEmptyRow = (fields: readonly string[]): boolean => fields.every(isBlank);

/**
 * Validates one data row against the mapped header and converts it to stored units,
 * collecting every problem (duplicates across rows are the caller's business).
 */
export function validateRow(fields: readonly string[], header: HeaderMap): RowResult {
  const width = header.columns.length;
  if (fields.length < width || fields.slice(width).some((field) => !isBlank(field))) {
    return { values: null, problems: [{ column: '', message: `the row has ${fields.length} fields; the header has ${width}` }] };
  }

  const problems: CellProblem[] = [];
  const read: Partial<Record<MountField, CellValue>> = {};
  /** The cells read per field: one, or two when the file gives both units of a quantity. */
  const readings = new Map<MountField, Reading[]>();
  /** Fields with a value in some column (a required one given in the other unit is not missing). */
  const filled = new Set(header.columns.flatMap((mapped, index) => (mapped && !isBlank(fields[index]) ? [mapped.spec.field] : [])));
  const missing = new Set<MountField>();
  header.columns.forEach((mapped, index) => {
    const raw = fields[index];
    if (!mapped) {
      if (!isBlank(raw)) problems.push({ column: `column ${index + 1}`, message: 'has a value but the header gives this column no name' });
      return;
    }
    const column = header.names[index].toLowerCase();
    const field = mapped.spec.field;
    read[field] ??= null;
    if (isBlank(raw)) {
      if (mapped.spec.required && !filled.has(field) && !missing.has(field)) {
        missing.add(field);
        problems.push({ column, message: 'is required' });
      }
      return;
    }
    const { value, problem } = readCell(raw, mapped.spec.rule, mapped.variant);
    if (problem !== undefined) problems.push({ column, message: problem });
    else readings.set(field, [...(readings.get(field) ?? []), { column, text: raw.trim(), variant: mapped.variant, value: value ?? null }]);
  });
  for (const [field, cells] of readings) {
    const agreed = agreeing(cells);
    if (typeof agreed === 'string') problems.push({ column: cells[cells.length - 1].column, message: agreed });
    else read[field] = agreed.value;
  }

  const numberOf = (field: MountField): number | null => (typeof read[field] === 'number' ? (read[field] as number) : null);
  const columnName = (field: MountField): string => header.nameOf[field] ?? columnOf(field).variants[0].name;
  const failed = new Set(problems.map((problem) => problem.column));
  const damping = `${columnName('dampingRatio')} or ${columnName('lossFactor')}`;
  const crossProblems = crossFieldProblems({
    dampingRatio: numberOf('dampingRatio'),
    lossFactor: numberOf('lossFactor'),
    tempMinC: numberOf('tempMinC'),
    tempMaxC: numberOf('tempMaxC'),
  });
  for (const { field, rule } of crossProblems) {
    const column = columnName(field);
    if (rule === 'temperature_order') {
      problems.push({ column, message: `must be below ${columnName('tempMaxC')}` });
    } else if (!failed.has(columnName('dampingRatio')) && !failed.has(columnName('lossFactor'))) {
      // (A damping cell that failed its own rule already explains the row.)
      problems.push({ column, message: rule === 'damping_both' ? `give ${damping}, not both` : `give ${damping}` });
    }
  }
  if (problems.length > 0) return { values: null, problems };

  const text = (field: MountField): string | null => (read[field] as string | null | undefined) ?? null;
  return {
    values: {
      supplierName: text('supplierName') as string,
      partNumber: text('partNumber') as string,
      series: text('series'),
      mountType: text('mountType') as MountType,
      ratedLoadN: numberOf('ratedLoadN') as number,
      verticalStiffnessNPerM: numberOf('verticalStiffnessNPerM') as number,
      horizontalStiffnessNPerM: numberOf('horizontalStiffnessNPerM'),
      dynamicStiffnessRatio: numberOf('dynamicStiffnessRatio'),
      dampingRatio: numberOf('dampingRatio'),
      lossFactor: numberOf('lossFactor'),
      maxDeflectionMm: numberOf('maxDeflectionMm'),
      tempMinC: numberOf('tempMinC'),
      tempMaxC: numberOf('tempMaxC'),
      heightMm: numberOf('heightMm'),
      restraintCapacityN: numberOf('restraintCapacityN'),
      upliftCapacityN: numberOf('upliftCapacityN'),
      unitPrice: numberOf('unitPrice'),
      currency: text('currency') ?? MOUNT_LIMITS.defaultCurrency,
      leadTimeDays: numberOf('leadTimeDays'),
    },
    problems,
  };
}

/**
 * The supplier and part number a row names (trimmed, formula guard removed), even when the
 * row has other problems: enough to detect duplicates within a file.
 */
export function rowKeyParts(fields: readonly string[], header: HeaderMap): { supplierName: string; partNumber: string } | null {
  let supplierName = '';
  let partNumber = '';
  header.columns.forEach((mapped, index) => {
    if (mapped?.spec.field === 'supplierName') supplierName = (fields[index] ?? '').trim().replace(FORMULA_GUARD, '');
    if (mapped?.spec.field === 'partNumber') partNumber = (fields[index] ?? '').trim().replace(FORMULA_GUARD, '');
  });
  return supplierName && partNumber ? { supplierName, partNumber } : null;
}
