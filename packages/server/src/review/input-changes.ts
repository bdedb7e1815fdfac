import {
  INPUT_LABELS,
  KG_PER_LB,
  M_PER_IN,
  mountTypeLabel,
  rpmToHz,
  toDisplay,
  unitLabel,
  type Quantity,
  type UnitSystem,
} from '@tacet/vibration';

/**
 * What changed in a design's input between two submissions for check, field by field. The
 * values are kept as stored (SI; percentages as percent) with the kind of quantity they are, so
 * each reader sees them in their own units (`formatInputChange`).
 */

/** How a changed number reads: a quantity of the units module (SI value), a percentage, an inertia or a plain count. */
export type ChangeQuantity = Quantity | 'percent' | 'inertia' | 'count';

export interface InputChange {
  /** Where the value sits in the design input, e.g. `mountPoints[B].x` (for programs, not for people). */
  field: string;
  /** The field in words, e.g. "Mount point B: x position". */
  label: string;
  /** The kind of number (null: a text or a list). */
  quantity: ChangeQuantity | null;
  /** Numbers as stored (SI, percent), null when absent or not a number. */
  before: number | null;
  after: number | null;
  /** Texts and lists as words, null when absent or a number. */
  beforeText: string | null;
  afterText: string | null;
}

/** The changes recorded with a submission: since the last submission of this revision, or since the previous revision. */
export interface SubmissionChanges {
  /** Null: since the last time this revision was sent for check; a number: since that (released) revision. */
  sinceRevision: number | null;
  items: InputChange[];
}

/** Names the things an input refers to by id (suppliers). */
export interface ChangeContext {
  supplierName: (id: number) => string;
}

interface LeafRule {
  label: string;
  quantity: ChangeQuantity | null;
  /** Stored value → value of `quantity` (e.g. rpm → Hz, a fraction → percent). */
  scale?: (value: number) => number;
  /** A list or code, as words. */
  words?: (value: unknown, context: ChangeContext) => string;
}

const list = (value: unknown): unknown[] => (Array.isArray(value) ? value : []);
const plainNumber = (value: number): string => String(Number(value.toPrecision(12)));

/** Fields with a name and unit of their own; other fields are named from their key (see `ruleFor`). */
const RULES: Record<string, LeafRule> = {
  'components.massKg': { label: 'mass', quantity: 'mass' },
  'components.cg.x': { label: 'centre of gravity x', quantity: 'position' },
  'components.cg.y': { label: 'centre of gravity y', quantity: 'position' },
  'components.cg.z': { label: 'centre of gravity z', quantity: 'position' },
  'components.box.lx': { label: 'length (x)', quantity: 'position' },
  'components.box.ly': { label: 'width (y)', quantity: 'position' },
  'components.box.lz': { label: 'height (z)', quantity: 'position' },
  'components.inertia.ixx': { label: 'moment of inertia Ixx', quantity: 'inertia' },
  'components.inertia.iyy': { label: 'moment of inertia Iyy', quantity: 'inertia' },
  'components.inertia.izz': { label: 'moment of inertia Izz', quantity: 'inertia' },
  'components.inertia.ixy': { label: 'product of inertia Ixy', quantity: 'inertia' },
  'components.inertia.ixz': { label: 'product of inertia Ixz', quantity: 'inertia' },
  'components.inertia.iyz': { label: 'product of inertia Iyz', quantity: 'inertia' },
  'mountPoints.x': { label: 'x position', quantity: 'position' },
  'mountPoints.y': { label: 'y position', quantity: 'position' },
  'mountPoints.z': { label: 'height (z)', quantity: 'position' },
  'operating.speedRpm': { label: 'Running speed', quantity: 'speed', scale: rpmToHz },
  'operating.speedRangeRpm.min': { label: 'Lowest running speed', quantity: 'speed', scale: rpmToHz },
  'operating.speedRangeRpm.max': { label: 'Highest running speed', quantity: 'speed', scale: rpmToHz },
  'operating.orders': {
    label: 'Orders of running speed',
    quantity: null,
    words: (v) =>
      list(v)
        .map((o) => `${o}×`)
        .join(', '),
  },
  'operating.vaneCount': { label: INPUT_LABELS.vaneCount, quantity: 'count' },
  'operating.lineFrequencyHz': { label: INPUT_LABELS.supplyFrequency, quantity: 'frequency' },
  'operating.extraFrequenciesHz': {
    label: INPUT_LABELS.furtherFrequencies,
    quantity: null,
    words: (v) =>
      list(v)
        .map((f) => `${plainNumber(Number(f))} Hz`)
        .join(', '),
  },
  'operating.motorPoles': { label: 'Motor poles', quantity: 'count' },
  'operating.skipBandsRpm': {
    label: 'Skip bands',
    quantity: null,
    words: (v) =>
      list(v)
        .map((b) => (isObject(b) ? `${plainNumber(Number(b.min))}–${plainNumber(Number(b.max))} rpm` : ''))
        .join(', '),
  },
  'operating.sources.kind': { label: 'kind', quantity: null, words: (v) => (v === 'unbalance' ? 'unbalance' : 'force') },
  'operating.sources.axis': { label: 'axis', quantity: null, words: (v) => String(v) },
  'operating.sources.at.x': { label: 'position x', quantity: 'position' },
  'operating.sources.at.y': { label: 'position y', quantity: 'position' },
  'operating.sources.at.z': { label: 'position z', quantity: 'position' },
  'operating.sources.order': { label: 'order', quantity: 'count' },
  'operating.sources.rotorMassKg': { label: 'rotor mass', quantity: 'mass' },
  'operating.sources.balanceGradeMmPerS': { label: 'balance grade (mm/s)', quantity: 'count' },
  'operating.sources.amplitudeN': { label: 'amplitude', quantity: 'force' },
  'operating.sources.frequencyHz': { label: 'frequency', quantity: 'frequency' },
  'criteria.stiffnessTolerancePct': { label: 'Stiffness tolerance', quantity: 'percent' },
  'criteria.minIsolationPct': { label: INPUT_LABELS.minIsolation, quantity: 'percent' },
  'criteria.minUtilization': { label: 'Lowest utilisation', quantity: 'percent', scale: (u) => u * 100 },
  'criteria.maxUtilization': { label: 'Highest utilisation', quantity: 'percent', scale: (u) => u * 100 },
  'criteria.ambientTempC': { label: INPUT_LABELS.ambientTemperature, quantity: 'temperature' },
  'criteria.weightMarginPct': { label: INPUT_LABELS.weightMargin, quantity: 'percent' },
  'criteria.maxResonantMotionMm': { label: 'Largest motion on start-up', quantity: 'deflection', scale: (mm) => mm / 1000 },
  'criteria.mountTypes': {
    label: INPUT_LABELS.mountTypes,
    quantity: null,
    words: (v) =>
      list(v)
        .map((t) => mountTypeLabel(String(t)).toLowerCase())
        .join(', '),
  },
  'criteria.supplierIds': {
    label: INPUT_LABELS.suppliers,
    quantity: null,
    words: (v, context) =>
      list(v)
        .map((id) => context.supplierName(Number(id)))
        .join(', '),
  },
};

/** How the items of a list of objects are told apart, and named. */
const KEYED_LISTS: Record<string, { key: string; name: (key: string) => string }> = {
  components: { key: 'name', name: (key) => key },
  mountPoints: { key: 'label', name: (key) => `Mount point ${key}` },
  'operating.sources': { key: 'label', name: (key) => `Source ${key}` },
};

/** Unit suffixes of field names (CONVENTIONS.md: a name carries its unit where it is not SI base). */
const SUFFIXES: { suffix: RegExp; quantity: ChangeQuantity; scale?: (value: number) => number }[] = [
  { suffix: /Hz$/, quantity: 'frequency' },
  { suffix: /Rpm$/, quantity: 'speed', scale: rpmToHz },
  { suffix: /Kg$/, quantity: 'mass' },
  { suffix: /TempC$|C$/, quantity: 'temperature' },
  { suffix: /Pct$/, quantity: 'percent' },
  { suffix: /NPerM$/, quantity: 'stiffness' },
  { suffix: /NPerMm$/, quantity: 'stiffness', scale: (nPerMm) => nPerMm * 1000 },
  { suffix: /Mm$/, quantity: 'deflection', scale: (mm) => mm / 1000 },
  { suffix: /N$/, quantity: 'force' },
  { suffix: /M$/, quantity: 'position' },
];

/** A field without a rule of its own: named from its key ("supportStiffnessNPerM" → "support stiffness", N/m). */
function ruleFor(path: string, key: string): LeafRule {
  const known = RULES[path];
  if (known) return known;
  const unit = SUFFIXES.find((candidate) => candidate.suffix.test(key));
  const bare = unit ? key.replace(unit.suffix, '') || key : key;
  const words = bare
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/_/g, ' ')
    .toLowerCase();
  return { label: words, quantity: unit?.quantity ?? 'count', scale: unit?.scale };
}

/** The words before a field of a section, e.g. "Requirements: " is not needed for the known ones. */
function sectionPrefix(section: string): string {
  if (section === 'operating' || section === 'criteria') return '';
  return `${ruleFor(section, section).label}: `;
}

const isObject = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null && !Array.isArray(value);

const same = (a: unknown, b: unknown): boolean => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

class ChangeWalker {
  readonly items: InputChange[] = [];

  constructor(private readonly context: ChangeContext) {}

  /** Compares two values at `field` (path for programs), `rulePath` (path for RULES), named `label`. */
  walk(before: unknown, after: unknown, field: string, rulePath: string, label: string, key: string): void {
    if (same(before, after)) return;
    const keyed = KEYED_LISTS[rulePath];
    if (keyed && (Array.isArray(before) || Array.isArray(after))) {
      this.keyedList(list(before), list(after), field, rulePath, keyed);
      return;
    }
    const rule = RULES[rulePath];
    if (!rule?.words && (isObject(before) || isObject(after))) {
      const b = isObject(before) ? before : {};
      const a = isObject(after) ? after : {};
      for (const child of unionKeys(b, a)) {
        const childPath = `${rulePath}.${child}`;
        // A group with no rules of its own (a field added later) lends its name to its fields.
        const known = Object.keys(RULES).some((path) => path.startsWith(`${childPath}.`)) || RULES[childPath] || KEYED_LISTS[childPath];
        const childLabel = known || !(isObject(b[child]) || isObject(a[child])) ? label : joinLabel(label, ruleFor(childPath, child).label);
        const leafLabel = isObject(b[child]) || isObject(a[child]) ? childLabel : joinLabel(label, ruleFor(childPath, child).label);
        this.walk(b[child], a[child], `${field}.${child}`, childPath, leafLabel, child);
      }
      return;
    }
    this.leaf(before, after, field, ruleFor(rulePath, key), label);
  }

  private keyedList(
    before: unknown[],
    after: unknown[],
    field: string,
    rulePath: string,
    keyed: { key: string; name: (key: string) => string },
  ): void {
    const keyOf = (item: unknown, index: number, all: unknown[]): string => {
      const value = isObject(item) ? item[keyed.key] : undefined;
      const text = typeof value === 'string' && value.trim() ? value : `#${index + 1}`;
      // A repeated name is told apart by its place among the items of that name.
      const repeat = all.slice(0, index).filter((other) => isObject(other) && other[keyed.key] === value).length;
      return repeat ? `${text} (${repeat + 1})` : text;
    };
    const b = new Map(before.map((item, index) => [keyOf(item, index, before), item]));
    const a = new Map(after.map((item, index) => [keyOf(item, index, after), item]));
    for (const key of unionKeys(Object.fromEntries(b), Object.fromEntries(a))) {
      const was = b.get(key);
      const now = a.get(key);
      const name = keyed.name(key);
      if (was === undefined || now === undefined) {
        this.items.push({
          field: `${field}[${key}]`,
          label: name,
          quantity: null,
          before: null,
          after: null,
          beforeText: was === undefined ? null : 'present',
          afterText: now === undefined ? 'removed' : 'added',
        });
      }
      const strip = (item: unknown) => (isObject(item) ? Object.fromEntries(Object.entries(item).filter(([k]) => k !== keyed.key)) : {});
      this.walk(strip(was), strip(now), `${field}[${key}]`, rulePath, name, key);
    }
  }

  private leaf(before: unknown, after: unknown, field: string, rule: LeafRule, label: string): void {
    const numeric = (value: unknown) => typeof value === 'number' && Number.isFinite(value);
    if (!rule.words && (numeric(before) || before == null) && (numeric(after) || after == null)) {
      const scale = rule.scale ?? ((value: number) => value);
      this.items.push({
        field,
        label,
        quantity: rule.quantity,
        before: numeric(before) ? scale(before as number) : null,
        after: numeric(after) ? scale(after as number) : null,
        beforeText: null,
        afterText: null,
      });
      return;
    }
    const words = (value: unknown): string | null => {
      if (value === undefined || value === null) return null;
      if (rule.words) return rule.words(value, this.context) || null;
      if (Array.isArray(value)) return value.map((item) => (typeof item === 'object' ? JSON.stringify(item) : String(item))).join(', ');
      if (typeof value === 'boolean') return value ? 'yes' : 'no';
      if (typeof value === 'object') return JSON.stringify(value);
      return String(value).replace(/_/g, ' ');
    };
    this.items.push({ field, label, quantity: null, before: null, after: null, beforeText: words(before), afterText: words(after) });
  }
}

function joinLabel(prefix: string, label: string): string {
  if (!prefix) return label.charAt(0).toUpperCase() + label.slice(1);
  return prefix.endsWith(': ') ? `${prefix}${label}` : `${prefix}: ${label}`;
}

function unionKeys(a: Record<string, unknown>, b: Record<string, unknown>): string[] {
  return [...new Set([...Object.keys(a), ...Object.keys(b)])];
}

/**
 * Every difference between two design inputs (and the chosen mounts), in the order of the
 * input: equipment, mount points, running conditions, requirements, then anything else.
 */
export function inputChanges(
  before: { input: object; chosen: string | null },
  after: { input: object; chosen: string | null },
  context: ChangeContext,
): InputChange[] {
  const walker = new ChangeWalker(context);
  const b = before.input as Record<string, unknown>;
  const a = after.input as Record<string, unknown>;
  for (const section of unionKeys(b, a)) {
    walker.walk(b[section], a[section], section, section, sectionPrefix(section), section);
  }
  if (before.chosen !== after.chosen) {
    walker.items.push({
      field: 'chosen',
      label: 'Chosen mounts',
      quantity: null,
      before: null,
      after: null,
      beforeText: before.chosen,
      afterText: after.chosen,
    });
  }
  return walker.items;
}

// ---------------------------------------------------------------------------------------------
// Reading a change in someone's units

/** kg·m² → lb·ft² (1 lb = 0.45359237 kg, 1 ft = 0.3048 m, exact; NIST SP 811). */
const LB_FT2_PER_KG_M2 = (1 / KG_PER_LB) * (1 / (12 * M_PER_IN)) ** 2;

const NONE = '—';

function numberText(value: number, significant: number): string {
  if (Math.abs(value) >= 10 ** significant) return new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 }).format(value);
  if (value === 0) return '0';
  return new Intl.NumberFormat('en-US', { maximumSignificantDigits: significant }).format(value);
}

function display(quantity: ChangeQuantity | null, value: number, system: UnitSystem): { value: number; unit: string } {
  switch (quantity) {
    case null:
    case 'count':
      return { value, unit: '' };
    case 'percent':
      return { value, unit: ' %' };
    case 'inertia':
      return system === 'SI' ? { value, unit: ' kg·m²' } : { value: value * LB_FT2_PER_KG_M2, unit: ' lb·ft²' };
    default:
      return { value: toDisplay(quantity, value, system), unit: ` ${unitLabel(quantity, system)}` };
  }
}

/** A change as one reader sees it: before and after in their units, with just enough digits to tell them apart. */
export function formatInputChange(change: InputChange, system: UnitSystem): { label: string; before: string; after: string } {
  if (change.before === null && change.after === null && (change.beforeText !== null || change.afterText !== null)) {
    return { label: change.label, before: change.beforeText ?? NONE, after: change.afterText ?? NONE };
  }
  const b = change.before === null ? null : display(change.quantity, change.before, system);
  const a = change.after === null ? null : display(change.quantity, change.after, system);
  let significant = 3;
  const text = (shown: { value: number; unit: string } | null) => (shown ? `${numberText(shown.value, significant)}${shown.unit}` : NONE);
  while (b && a && text(b) === text(a) && significant < 12) significant++;
  return { label: change.label, before: text(b), after: text(a) };
}

/** The changes as plain lines, e.g. "Mount point B: x position: 0.800 m → 0.850 m". */
export function changeLines(changes: readonly InputChange[], system: UnitSystem): string[] {
  return changes.map((change) => {
    const shown = formatInputChange(change, system);
    return `${shown.label}: ${shown.before} → ${shown.after}`;
  });
}
