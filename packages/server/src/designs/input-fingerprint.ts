import { createHash } from 'node:crypto';
import type { DesignInput } from '../selection/dto/design-input.dto.js';

/**
 * Which selection model produced a stored result. Change it when the selection's figures or
 * checks change meaning (a new model, new checks), so that a design does not show a result the
 * current model would not give: the stored one then no longer matches and is not returned.
 */
export const SELECTION_MODEL_VERSION = 'selection-2-whole-machine';

/** JSON with the keys of every object sorted, so that equal values give equal text whatever the key order. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) return `[${value.map((item) => (item === undefined ? 'null' : canonicalJson(item))).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, item]) => item !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([key, item]) => `${JSON.stringify(key)}:${canonicalJson(item)}`).join(',')}}`;
}

/**
 * A fingerprint of a design input for a selection: SHA-256 of the model version and the input's
 * canonical JSON. Equal inputs (whatever their key order) give equal fingerprints; any change of
 * a value gives another one.
 */
export function inputFingerprint(input: DesignInput): string {
  return createHash('sha256').update(SELECTION_MODEL_VERSION).update('\n').update(canonicalJson(input)).digest('hex');
}
