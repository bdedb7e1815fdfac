/**
 * One name for each thing (PRODUCT.md "One voice"): the words the screens, the report, the
 * e-mails, the exported files and the API's messages all use. Pure data and two formatters;
 * the web and the server import this one file, so they cannot drift apart.
 */

/** The step between author and release is the "check" (never "review" or "sign-off" on screen). */
export const CHECK_STEP = Object.freeze({
  noun: 'check',
  send: 'Send for check',
  sent: 'Sent for check',
  release: 'Check and release',
  returnToDraft: 'Return to draft',
  checker: 'Checker',
  waiting: 'Waiting for your check',
});

/** Design states by their API code (`in_review` stays the code; people read "In check"). */
export const DESIGN_STATE_LABELS = Object.freeze({
  draft: 'Draft',
  in_review: 'In check',
  released: 'Released',
  superseded: 'Superseded',
});

export type DesignStateCode = keyof typeof DESIGN_STATE_LABELS;

/** A state inside a sentence: "from in check to draft". Unknown codes get their words too. */
export function designStateWords(code: string): string {
  const label = (DESIGN_STATE_LABELS as Record<string, string>)[code];
  return label ? label.toLowerCase() : code.replace(/_/g, ' ');
}

/** Kinds of mount by their catalog code (catalog/FORMAT.md). */
export const MOUNT_TYPE_LABELS = Object.freeze({
  elastomer_pad: 'Elastomer pad',
  elastomer_mount: 'Elastomer mount',
  open_spring: 'Open spring',
  housed_spring: 'Housed spring',
  restrained_spring: 'Restrained spring',
  air_spring: 'Air spring',
  wire_rope: 'Wire rope',
});

/** A mount type in words; a code this list does not know loses its underscores. */
export function mountTypeLabel(code: string): string {
  return (MOUNT_TYPE_LABELS as Record<string, string>)[code] ?? code.replace(/_/g, ' ');
}

/** Damping models by code. */
export const DAMPING_MODEL_LABELS = Object.freeze({ viscous: 'viscous', hysteretic: 'hysteretic' });

/** The rigid-body coordinates (mode names) with the motion they stand for. */
export const MODE_NAMES = Object.freeze({
  surge: 'surge — along x',
  sway: 'sway — along y',
  bounce: 'bounce — vertical',
  roll: 'roll — about x',
  pitch: 'pitch — about y',
  yaw: 'yaw — about z',
});

/** The sections of a design: its tabs on screen and its headings in the report. */
export const DESIGN_SECTIONS = Object.freeze({
  equipment: 'Equipment',
  layout: 'Mount layout',
  running: 'Running conditions',
  requirements: 'Requirements',
  restraint: 'Seismic restraint',
  selection: 'Mount selection',
  measured: 'Measured',
});

/** Names of the running conditions and requirements, the same in the form, the report and messages. */
export const INPUT_LABELS = Object.freeze({
  speed: 'Speed',
  speedRange: 'Speed range',
  orders: 'Orders',
  vaneCount: 'Vanes or blades',
  supplyFrequency: 'Supply frequency',
  furtherFrequencies: 'Further frequencies',
  disturbingFrequencies: 'Disturbing frequencies',
  minIsolation: 'Minimum isolation',
  utilisation: 'Utilisation',
  weightMargin: 'Weight margin',
  ambientTemperature: 'Ambient temperature',
  mountTypes: 'Mount types',
  suppliers: 'Suppliers',
  secondMass: 'Second mass',
  supportStiffness: 'Support stiffness',
});

/** Words of the results, the same in the table, the comparison and the report. */
export const RESULT_LABELS = Object.freeze({
  chosenMounts: 'Chosen mounts',
  naturalFrequency: 'Natural frequency',
  resonance: 'Transmissibility at resonance',
  levelError: 'Level error',
  checksNotMet: 'Checks not met',
  billOfMaterials: 'Bill of materials',
});

/** What became of a catalog row on import. */
export const IMPORT_ROW_LABELS = Object.freeze({
  created: 'Created',
  updated: 'Updated',
  rejected: 'Rejected',
  rejectedRows: 'rejected rows',
  skipped: 'Skipped',
});

/**
 * Words for a property of an API body, where the name alone would not do (`massKg` → "Mass").
 * Other names are read by `fieldWords`: camel case split, the unit suffix dropped.
 */
export const FIELD_WORDS: Readonly<Record<string, string>> = Object.freeze({
  massKg: 'Mass',
  altMassKg: INPUT_LABELS.secondMass,
  supportStiffnessNPerMm: INPUT_LABELS.supportStiffness,
  cg: 'Centre of gravity',
  mountPoints: 'Mount points',
  speedRpm: INPUT_LABELS.speed,
  speedRangeRpm: INPUT_LABELS.speedRange,
  lineFrequencyHz: INPUT_LABELS.supplyFrequency,
  extraFrequenciesHz: INPUT_LABELS.furtherFrequencies,
  vaneCount: INPUT_LABELS.vaneCount,
  operating: DESIGN_SECTIONS.running,
  criteria: DESIGN_SECTIONS.requirements,
  minIsolationPct: INPUT_LABELS.minIsolation,
  minUtilization: 'Lowest utilisation',
  maxUtilization: 'Highest utilisation',
  weightMarginPct: INPUT_LABELS.weightMargin,
  ambientTempC: INPUT_LABELS.ambientTemperature,
  mountTypes: INPUT_LABELS.mountTypes,
  supplierIds: INPUT_LABELS.suppliers,
  checkerId: CHECK_STEP.checker,
  mountId: 'Mount',
  designId: 'Design',
  projectId: 'Project',
  supplierId: 'Supplier',
  ratedLoadN: 'Rated load',
  verticalStiffnessNPerM: 'Vertical stiffness',
  horizontalStiffnessNPerM: 'Horizontal stiffness',
  maxDeflectionMm: 'Largest deflection',
  tempMinC: 'Lowest temperature',
  tempMaxC: 'Highest temperature',
  leadTimeDays: 'Lead time',
  unitPrice: 'Unit price',
  dampingRatio: 'Damping ratio',
  lossFactor: 'Loss factor',
  partNumber: 'Part number',
  mountType: 'Mount type',
  unitSystem: 'Unit system',
  lx: 'Length (x)',
  ly: 'Width (y)',
  lz: 'Height (z)',
  to: 'The new state',
  x: 'x',
  y: 'y',
  z: 'z',
});

/** Unit suffixes of API property names (docs: "names carry a unit suffix"). */
const UNIT_SUFFIX = /(?:Kg|Hz|Rpm|Pct|Mm|NPerM|NPerMm|N|M|C|Days|S|Ms)$/;

/**
 * A property name in words for people: `massKg` → "Mass", `contactEmail` → "Contact email",
 * `part_number` → "Part number". One word, sentence case, no unit suffix.
 */
export function fieldWords(property: string): string {
  const known = FIELD_WORDS[property];
  if (known !== undefined) return known;
  const bare = property.length > 2 && UNIT_SUFFIX.test(property) ? property.replace(UNIT_SUFFIX, '') : property;
  const words = bare
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[_-]+/g, ' ')
    .trim()
    .toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** The parts of a field path: `input.mountPoints.2.x` or `mountPoints[2].x` → input, mountPoints, 2, x. */
function pathParts(path: string): string[] {
  return path
    .replace(/\[([^\]]*)\]/g, '.$1')
    .split('.')
    .filter(Boolean);
}

const singular = (words: string): string => (/ies$/.test(words) ? words.replace(/ies$/, 'y') : words.replace(/([^s])s$/, '$1'));

/**
 * Where in a list a field path points, in words: `components.0.massKg` → "component 1",
 * `input.mountPoints.2.x` → "mount point 3", `components[Motor].massKg` → "component Motor";
 * "" when the path has no list index.
 */
export function fieldPlace(path: string): string {
  const parts = pathParts(path);
  const places: string[] = [];
  for (let i = 1; i < parts.length; i++) {
    if (/^[a-z][A-Za-z]*$/.test(parts[i]) && !/^\d+$/.test(parts[i])) continue;
    const collection = parts[i - 1];
    if (/^\d+$/.test(collection)) continue;
    const index = /^\d+$/.test(parts[i]) ? String(Number(parts[i]) + 1) : parts[i];
    places.push(`${singular(fieldWords(collection).toLowerCase())} ${index}`);
  }
  return places.join(', ');
}

/** The last named property of a field path in words: `components.0.massKg` → "Mass". */
export function fieldName(path: string): string {
  const named = pathParts(path).filter((part) => !/^\d+$/.test(part));
  return fieldWords(named[named.length - 1] ?? path);
}

/**
 * A calculation refusal (`VibrationInputError`: `field` and `message` "massKg: must be ...") in
 * words: "Mass must be a finite number > 0", "Mounts are collinear (or coincide): ...".
 */
export function inputProblemWords(field: string, message: string): string {
  const own = message.startsWith(`${field}: `) ? message.slice(field.length + 2) : message;
  const predicate = /^(must|is|are|gives?|needs?|has|have|should|cannot)\b/.test(own);
  const text = predicate ? `${fieldName(field)} ${own}` : own;
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Money as every screen and file shows it: ISO code, thousands separated, two decimals ("USD 1,240.50"). */
export function formatMoney(amount: number, currency: string): string {
  const [whole, cents] = Math.abs(amount).toFixed(2).split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${amount < 0 ? '-' : ''}${currency} ${grouped}.${cents}`;
}

/** Utilisation (a ratio of the rated load) as a percentage, the only way people see it ("73 %"). */
export function formatUtilisation(ratio: number, digits = 0): string {
  return `${(ratio * 100).toFixed(digits)} %`;
}

/** Unit symbols that look like camel case but are words to an engineer. */
const UNIT_SYMBOLS = new Set(['kN', 'kPa', 'dB', 'kHz', 'kW', 'mN', 'kgf', 'lbf', 'rpm']);

/**
 * Identifiers in a text meant for people: camel case (`massKg`), snake-case codes (`open_spring`)
 * and indexed paths (`components[0]`). Empty when the text is all words. The tests run every
 * message and the report through it.
 */
export function identifiersIn(text: string): string[] {
  const found = [
    ...(text.match(/\b[a-z]+(?:[A-Z][a-z0-9]*)+\b/g) ?? []).filter((word) => !UNIT_SYMBOLS.has(word)),
    ...(text.match(/\b[a-z][a-z0-9]*(?:_[a-z0-9]+)+\b/g) ?? []),
    ...(text.match(/\b\w+\[\d+\]/g) ?? []),
  ];
  return [...new Set(found)];
}
