import { SEISMIC_CODE_EDITION } from '../restraint/seismic-design-force.js';

/**
 * The cautions the product shows (PRODUCT.md "Cautions the product shows"), from this one
 * module for every screen, the report, the bill-of-materials files and every supplier e-mail.
 */

/** What every result carries: the model's assumptions and who must look at the rest. */
export const GENERAL_CAUTION =
  'The model assumes a rigid machine on linear mounts over a rigid support (or a support of the stiffness given, as a spring). Results are for preliminary sizing: ' +
  'seismic and wind restraint, snubbers, flexible pipe and cable connections, flexible floors and guarding follow ' +
  'local codes and need review by a qualified, licensed engineer.';

/** The whole machine over its whole speed range: what the model does not settle. */
export const SPEED_RANGE_CAUTION =
  'The machine runs up and coasts down through its rigid-body modes: limit stops, snubbers and damping for that passage ' +
  'are for the engineer to settle. Shock isolation and reciprocating engines are outside the model.';

/** Catalog ratings are the suppliers' own data. */
export const SUPPLIER_RATINGS_CAUTION =
  'Ratings of load, stiffness, damping and restraint come from the suppliers’ data and are to be confirmed with the supplier before purchase.';

/**
 * The caution that goes with every seismic restraint figure, on screen and in the report.
 * docs/engineering/seismic-restraint.md §10.
 */
export const SEISMIC_RESTRAINT_CAUTION =
  `The seismic restraint check follows ${SEISMIC_CODE_EDITION} §13.3.1 only and compares the restraints with their catalog ratings; ` +
  'it does not size anchorage. Anchorage of the restraints to the structure, the structure itself and the other provisions of the ' +
  'code are the structural engineer of record’s; local codes and their amendments govern, and a licensed engineer reviews the result.';

/** A caution with a short title for screens and headings. */
export interface Caution {
  id: 'general' | 'speed-range' | 'supplier-ratings' | 'seismic-restraint';
  title: string;
  text: string;
}

export const CAUTIONS: Readonly<Record<Caution['id'], Caution>> = Object.freeze({
  general: { id: 'general', title: 'What the model covers', text: GENERAL_CAUTION },
  'speed-range': { id: 'speed-range', title: 'Run-up and coast-down', text: SPEED_RANGE_CAUTION },
  'supplier-ratings': { id: 'supplier-ratings', title: 'Supplier ratings', text: SUPPLIER_RATINGS_CAUTION },
  'seismic-restraint': { id: 'seismic-restraint', title: `Seismic restraint (${SEISMIC_CODE_EDITION})`, text: SEISMIC_RESTRAINT_CAUTION },
});

/** Where cautions are shown: a design (tabs, report, BOM files) or a message to a supplier. */
export type CautionUse = 'design' | 'supplier';

/**
 * The cautions for one use, in order. A design gets the general caution, the speed-range one
 * and the supplier ratings, plus the seismic one when it asks for a restraint check; what goes
 * to a supplier gets the general caution and the ratings to confirm.
 */
export function cautionsFor(use: CautionUse, options: { restraint?: boolean } = {}): Caution[] {
  if (use === 'supplier') return [CAUTIONS.general, CAUTIONS['supplier-ratings']];
  const list = [CAUTIONS.general, CAUTIONS['speed-range'], CAUTIONS['supplier-ratings']];
  if (options.restraint) list.push(CAUTIONS['seismic-restraint']);
  return list;
}

/** The cautions as plain text lines ("Caution — title: text"), for e-mails and files. */
export function cautionLines(use: CautionUse, options: { restraint?: boolean } = {}): string[] {
  return cautionsFor(use, options).map((c) => `Caution — ${c.title}: ${c.text}`);
}
