import * as yup from 'yup';

import type { Units } from '@/lib/units';
import type { DesignComponent } from '@/types/design-api';
import {
  SOURCE_AXES,
  SOURCE_KINDS,
  type Model2Operating,
  type OperatingSource,
  type SkipBand,
  type SourceAxis,
  type SourceKind,
} from '@/types/model2-api';

/**
 * The disturbing sources, skip bands and motor poles of the running conditions, as typed (text,
 * in the user's units) and in SI for the API. Limits mirror the server's checks, which have the
 * final say.
 */
export const SOURCE_LIMITS = {
  sources: 12,
  skipBands: 10,
  labelLength: 40,
  maxOrder: 100,
  /** Balance grades of ISO 21940-11 run from G 0.4 to G 4000 mm/s. */
  balanceGrade: { min: 0.4, max: 4000 },
  motorPoles: { min: 2, max: 64 },
} as const;

/** The usual grade for pump impellers, fans and motor rotors (ISO 21940-11, common practice). */
export const DEFAULT_BALANCE_GRADE = 6.3;

export interface SourceValues {
  label: string;
  kind: SourceKind;
  x: string;
  y: string;
  z: string;
  axis: SourceAxis;
  /** Blank: order 1 (or the fixed frequency when one is given). */
  order: string;
  /** A fixed frequency in Hz instead of an order (forces only). */
  frequencyHz: string;
  /** In the user's mass unit (unbalance). */
  rotorMass: string;
  /** mm/s in both unit systems: the grade is quoted so everywhere. */
  balanceGrade: string;
  /** In the user's force unit (force). */
  amplitude: string;
}

export interface SkipBandValues {
  min: string;
  max: string;
}

export function blankSource(label = ''): SourceValues {
  return {
    label,
    kind: 'unbalance',
    x: '',
    y: '',
    z: '',
    axis: 'x',
    order: '1',
    frequencyHz: '',
    rotorMass: '',
    balanceGrade: String(DEFAULT_BALANCE_GRADE),
    amplitude: '',
  };
}

export function blankSkipBand(): SkipBandValues {
  return { min: '', max: '' };
}

/** A number for an input box: six significant figures, no float noise. */
function text(value: number | undefined): string {
  if (value === undefined || !Number.isFinite(value)) return '';
  return String(Number(value.toPrecision(6)));
}

function parse(value: string | undefined): number | undefined {
  const trimmed = (value ?? '').trim();
  if (trimmed === '') return undefined;
  const n = Number(trimmed);
  return Number.isFinite(n) ? n : undefined;
}

const blank = (value: string | undefined) => (value ?? '').trim() === '';

// ---- SI → text ----

export function sourceValues(source: OperatingSource, units: Units): SourceValues {
  const position = (v: number) => text(units.toDisplay('position', v));
  return {
    label: source.label,
    kind: source.kind,
    x: position(source.at.x),
    y: position(source.at.y),
    z: position(source.at.z),
    axis: source.axis,
    order: text(source.order),
    frequencyHz: text(source.frequencyHz),
    rotorMass: source.rotorMassKg === undefined ? '' : text(units.toDisplay('mass', source.rotorMassKg)),
    balanceGrade: source.kind === 'unbalance' ? text(source.balanceGradeMmPerS ?? DEFAULT_BALANCE_GRADE) : String(DEFAULT_BALANCE_GRADE),
    amplitude: source.amplitudeN === undefined ? '' : text(units.toDisplay('force', source.amplitudeN)),
  };
}

export function skipBandValues(band: SkipBand): SkipBandValues {
  return { min: text(band.min), max: text(band.max) };
}

// ---- text → SI ----

/** One source in SI, or null while a figure it needs is missing or not a number. */
export function parseSource(row: SourceValues, units: Units): OperatingSource | null {
  const x = parse(row.x);
  const y = parse(row.y);
  const z = parse(row.z);
  if (x === undefined || y === undefined || z === undefined) return null;
  const source: OperatingSource = {
    label: row.label.trim(),
    kind: row.kind,
    at: { x: units.toSi('position', x), y: units.toSi('position', y), z: units.toSi('position', z) },
    axis: row.axis,
  };
  if (!blank(row.order)) {
    const order = parse(row.order);
    if (order === undefined) return null;
    source.order = order;
  }
  if (row.kind === 'unbalance') {
    const mass = parse(row.rotorMass);
    if (mass === undefined) return null;
    source.rotorMassKg = units.toSi('mass', mass);
    if (!blank(row.balanceGrade)) {
      const grade = parse(row.balanceGrade);
      if (grade === undefined) return null;
      source.balanceGradeMmPerS = grade;
    }
  } else {
    const amplitude = parse(row.amplitude);
    if (amplitude === undefined) return null;
    source.amplitudeN = units.toSi('force', amplitude);
    if (!blank(row.frequencyHz)) {
      const frequency = parse(row.frequencyHz);
      if (frequency === undefined) return null;
      source.frequencyHz = frequency;
      // A fixed frequency replaces the order.
      delete source.order;
    }
  }
  return source;
}

/**
 * The whole-machine part of the operating conditions in SI (only what was given), or null while
 * a row is incomplete.
 */
export function parseModel2Operating(
  values: { sources: readonly SourceValues[]; skipBands: readonly SkipBandValues[]; motorPoles: string },
  units: Units,
): Model2Operating | null {
  const out: Model2Operating = {};
  if (values.sources.length > 0) {
    const sources: OperatingSource[] = [];
    for (const row of values.sources) {
      const source = parseSource(row, units);
      if (!source) return null;
      sources.push(source);
    }
    out.sources = sources;
  }
  if (values.skipBands.length > 0) {
    const bands: SkipBand[] = [];
    for (const row of values.skipBands) {
      const min = parse(row.min);
      const max = parse(row.max);
      if (min === undefined || max === undefined) return null;
      bands.push({ min, max });
    }
    out.skipBandsRpm = bands;
  }
  if (!blank(values.motorPoles)) {
    const poles = parse(values.motorPoles);
    if (poles === undefined) return null;
    out.motorPoles = poles;
  }
  return out;
}

// ---- proposals from the equipment ----

/** Rotating machines whose impeller or wheel is an unbalance source. */
const IMPELLER_WORDS = /pump|fan|blower|impeller|compressor|turbine|wheel/i;
/** Electric machines whose rotor is an unbalance source. */
const ROTOR_WORDS = /motor|generator|alternator/i;

/**
 * Share of a component's mass that turns, for a first proposal only: about a tenth for a pump or
 * fan (impeller and shaft), about a third for an electric motor (rotor). Rules of thumb from
 * memory, to be replaced by the maker's figure.
 */
export const ROTATING_SHARE = { impeller: 0.1, rotor: 0.3 } as const;

/**
 * Unbalance sources proposed from the equipment: one per pump, fan or motor, at the component's
 * centre of gravity, shaft along x (along the skid, as the equipment is laid out), order 1,
 * balance grade G 6.3, rotor mass a share of the component's mass (ROTATING_SHARE). Components
 * that are neither (frames, bases, piping) propose nothing.
 */
export function proposeSources(components: readonly DesignComponent[], units: Units): SourceValues[] {
  const out: SourceValues[] = [];
  for (const component of components) {
    const name = component.name.trim();
    const share = IMPELLER_WORDS.test(name) ? ROTATING_SHARE.impeller : ROTOR_WORDS.test(name) ? ROTATING_SHARE.rotor : null;
    if (share === null) continue;
    const what = share === ROTATING_SHARE.impeller ? 'impeller' : 'rotor';
    const label = `${name} ${what}`.slice(0, SOURCE_LIMITS.labelLength);
    out.push({
      ...blankSource(label),
      x: text(units.toDisplay('position', component.cg.x)),
      y: text(units.toDisplay('position', component.cg.y)),
      z: text(units.toDisplay('position', component.cg.z)),
      rotorMass: text(units.toDisplay('mass', component.massKg * share)),
    });
  }
  return out;
}

// ---- validation (yup) ----

const blankToUndefined = (value: unknown, original: unknown) =>
  typeof original === 'string' && original.trim() === '' ? undefined : value;

function number(what: string) {
  return yup.number().transform(blankToUndefined).typeError(`${what} must be a number`);
}

const sourceSchema = yup.object({
  label: yup
    .string()
    .trim()
    .required('Name the source')
    .max(SOURCE_LIMITS.labelLength, `Keep the name to ${SOURCE_LIMITS.labelLength} characters`),
  kind: yup
    .mixed<SourceKind>()
    .oneOf([...SOURCE_KINDS], 'Choose unbalance or force')
    .required(),
  x: number('x').required('Enter x'),
  y: number('y').required('Enter y'),
  z: number('z').required('Enter z'),
  axis: yup
    .mixed<SourceAxis>()
    .oneOf([...SOURCE_AXES], 'Choose the axis x, y or z')
    .required(),
  order: number('The order')
    .positive('The order must be more than 0')
    .max(SOURCE_LIMITS.maxOrder, `Orders above ${SOURCE_LIMITS.maxOrder} are not accepted`),
  frequencyHz: number('The frequency').positive('The frequency must be more than 0'),
  rotorMass: yup.mixed().when('kind', {
    is: 'unbalance',
    then: () => number('The rotor mass').required('Enter the rotor mass').positive('The rotor mass must be more than 0'),
    otherwise: () => yup.mixed(),
  }),
  balanceGrade: yup.mixed().when('kind', {
    is: 'unbalance',
    then: () =>
      number('The balance grade')
        .min(
          SOURCE_LIMITS.balanceGrade.min,
          `The balance grade is from G ${SOURCE_LIMITS.balanceGrade.min} to G ${SOURCE_LIMITS.balanceGrade.max}`,
        )
        .max(
          SOURCE_LIMITS.balanceGrade.max,
          `The balance grade is from G ${SOURCE_LIMITS.balanceGrade.min} to G ${SOURCE_LIMITS.balanceGrade.max}`,
        ),
    otherwise: () => yup.mixed(),
  }),
  amplitude: yup.mixed().when('kind', {
    is: 'force',
    then: () => number('The force').required('Enter the force').positive('The force must be more than 0'),
    otherwise: () => yup.mixed(),
  }),
});

const skipBandSchema = yup.object({
  min: number('The band start').required('Enter where the band starts').positive('Speeds must be more than 0'),
  max: number('The band end')
    .required('Enter where the band ends')
    .when('min', ([min], s) => (typeof min === 'number' ? s.moreThan(min, 'The band must end above where it starts') : s)),
});

/** The schema of the sources, skip bands and motor poles (fields of the running conditions). */
export const model2OperatingFields = {
  sources: yup
    .array(sourceSchema)
    .max(SOURCE_LIMITS.sources, `At most ${SOURCE_LIMITS.sources} sources`)
    .test('unique-labels', 'Each source needs its own name', (rows) => {
      const labels = (rows ?? []).map((row) => row.label?.trim()).filter(Boolean);
      return new Set(labels).size === labels.length;
    })
    .required(),
  skipBands: yup.array(skipBandSchema).max(SOURCE_LIMITS.skipBands, `At most ${SOURCE_LIMITS.skipBands} skip bands`).required(),
  motorPoles: number('The number of motor poles')
    .integer('The number of poles is a whole number')
    .min(SOURCE_LIMITS.motorPoles.min, `A motor has at least ${SOURCE_LIMITS.motorPoles.min} poles`)
    .max(SOURCE_LIMITS.motorPoles.max, `At most ${SOURCE_LIMITS.motorPoles.max} poles`)
    .test('even', 'A motor has an even number of poles', (poles) => poles === undefined || poles % 2 === 0),
};
