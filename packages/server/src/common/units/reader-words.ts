import { DISPLAY_UNITS, formatMeasure, type FigurePrecision, type Quantity, type UnitSystem } from '@tacet/vibration';

/**
 * Words with figures in the reader's units. The server words reasons and notes once (and keeps
 * them with a design), but every reader sees them in their own unit system: a figure inside such
 * words is kept as a mark — `measure('deflection', 0.0066)` → `⟦deflection:0.0066⟧` — and turned
 * into "6.6 mm" or "0.26 in" on the way out (ReaderUnitsInterceptor for JSON answers; the report
 * and the files call `inReaderUnits` themselves). Figures of the API stay SI and unrounded; only
 * the words change.
 */

const OPEN = '\u27e6';
const CLOSE = '\u27e7';
const QUANTITIES = new Set<string>(Object.keys(DISPLAY_UNITS.SI));
const MARK = /\u27e6([a-z]+):([^:\u27e6\u27e7]+)(?::(s?)(\d))?\u27e7/g;

/**
 * A figure inside words, written in the reader's units when the words are read. `precision`:
 * decimals (`:1`) or significant digits (`{ significant: 2 }` → `:s2`); the quantity's sentence
 * precision otherwise.
 */
export function measure(quantity: Quantity, si: number, precision?: FigurePrecision): string {
  const tail = precision === undefined ? '' : typeof precision === 'number' ? `:${precision}` : `:s${precision.significant}`;
  return `${OPEN}${quantity}:${si}${tail}${CLOSE}`;
}

/** The words with every figure mark written in `system` ("6.6 mm" / "0.26 in"); other text as it is. */
export function inReaderUnits(text: string, system: UnitSystem): string {
  if (!text.includes(OPEN)) return text;
  return text.replace(MARK, (whole, quantity: string, value: string, significant: string | undefined, digits: string | undefined) => {
    const si = Number(value);
    if (!QUANTITIES.has(quantity) || Number.isNaN(si)) return whole;
    const precision = digits === undefined ? undefined : significant ? { significant: Number(digits) } : Number(digits);
    return formatMeasure(quantity as Quantity, si, system, precision);
  });
}

/** Leaves of an answer that are not walked into. */
const isOpaque = (value: object): boolean =>
  value instanceof Date ||
  ArrayBuffer.isView(value) ||
  value instanceof ArrayBuffer ||
  value instanceof Map ||
  value instanceof Set ||
  typeof (value as { pipe?: unknown }).pipe === 'function' ||
  typeof (value as { getStream?: unknown }).getStream === 'function';

/**
 * A JSON answer with every figure mark in its strings written in `system`. What holds no mark
 * is returned as it is (same object); what does is copied (same prototype), never changed in
 * place, so a cached object keeps its marks for the next reader.
 */
export function wordsInReaderUnits<T>(value: T, system: UnitSystem): T {
  return walk(value, system, 0) as T;
}

function walk(value: unknown, system: UnitSystem, depth: number): unknown {
  if (typeof value === 'string') return inReaderUnits(value, system);
  if (value === null || typeof value !== 'object' || depth > 64 || isOpaque(value)) return value;
  if (Array.isArray(value)) {
    let copy: unknown[] | undefined;
    value.forEach((item, i) => {
      const rendered = walk(item, system, depth + 1);
      if (rendered !== item) (copy ??= [...value])[i] = rendered;
    });
    return copy ?? value;
  }
  let copy: Record<string, unknown> | undefined;
  for (const [key, item] of Object.entries(value)) {
    const rendered = walk(item, system, depth + 1);
    if (rendered !== item)
      (copy ??= Object.assign(Object.create(Object.getPrototypeOf(value) as object | null) as Record<string, unknown>, value))[key] =
        rendered;
  }
  return copy ?? value;
}
