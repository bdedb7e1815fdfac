import type { Quantity } from '@tacet/vibration';
import { measure } from './reader-words.js';

/** A property's quantity and the factor from its API unit to SI (`heightMm` → deflection, 0.001). */
interface FieldQuantity {
  quantity: Quantity;
  toSi: number;
}

/** Coordinates and box sizes carry no suffix; they are metres (PRODUCT.md, "names carry a unit suffix" otherwise). */
const METRE_PROPERTIES = new Set(['x', 'y', 'z', 'lx', 'ly', 'lz']);

/** Unit suffixes of API property names, longest first, with the quantity they measure. */
const SUFFIXES: Array<[RegExp, FieldQuantity]> = [
  [/[a-z]NPerMm$/, { quantity: 'stiffness', toSi: 1000 }],
  [/[a-z]NPerM$/, { quantity: 'stiffness', toSi: 1 }],
  [/[a-z]Mm$/, { quantity: 'deflection', toSi: 0.001 }],
  [/[a-z]Kg$/, { quantity: 'mass', toSi: 1 }],
  [/[a-z]N$/, { quantity: 'force', toSi: 1 }],
  [/[a-z]TempC$|[a-z](?:Min|Max)C$/, { quantity: 'temperature', toSi: 1 }],
  [/[a-z]Hz$/, { quantity: 'frequency', toSi: 1 }],
  [/[a-z]Rpm$/, { quantity: 'speed', toSi: 1 / 60 }],
];

/** The quantity a property of the API measures, from its name; undefined for a bare number. */
export function fieldQuantity(property: string): FieldQuantity | undefined {
  if (METRE_PROPERTIES.has(property)) return { quantity: 'position', toSi: 1 };
  return SUFFIXES.find(([pattern]) => pattern.test(property))?.[1];
}

/** class-validator's own wording of a bound (`must not be greater than 10000000`), before it is put in words. */
const BOUND = /( must not be (?:greater|less) than )(-?\d+(?:\.\d+)?(?:e[+-]?\d+)?)$/;

/**
 * A bound in a validation message with its unit, as a figure mark the reader's units write
 * (reader-words.ts): `massKg must not be greater than 10000000` → `… than ⟦mass:10000000⟧`,
 * read "10000000 kg" or "22046226.2 lb". Messages of other shapes, and properties that measure
 * no quantity, are returned as they are.
 */
export function boundWithUnit(message: string, property: string): string {
  const field = fieldQuantity(property);
  if (!field) return message;
  return message.replace(BOUND, (_whole, lead: string, value: string) => `${lead}${measure(field.quantity, Number(value) * field.toSi)}`);
}
