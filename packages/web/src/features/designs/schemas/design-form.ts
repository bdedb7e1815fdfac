import { getIn, setIn, type FormikErrors } from 'formik';
import * as yup from 'yup';

import type { Units } from '@/lib/units';
import {
  MOUNT_TYPES,
  type Criteria,
  type DesignComponent,
  type DesignInput,
  type MountPoint,
  type MountType,
  type OperatingConditions,
  type RestraintInput,
} from '@/types/design-api';
import type { Model2Operating } from '@/types/model2-api';

import {
  model2OperatingFields,
  parseModel2Operating,
  skipBandValues,
  sourceValues,
  type SkipBandValues,
  type SourceValues,
} from './sources-form';

/**
 * The design form holds what the user typed, as text in the user's units; `toDesignInput`
 * turns it into the SI input the server stores. Limits mirror the server's checks (which have
 * the final say) so that most mistakes are caught while typing.
 */
export const DESIGN_LIMITS = {
  componentNameLength: 100,
  labelLength: 40,
  mountPoints: { min: 3, max: 64 },
  components: 200,
  orders: 10,
  maxOrder: 100,
  vaneCount: 200,
  extraFrequencies: 20,
  maxIsolationPct: 99.9,
  /** A mount is never loaded beyond its rating (the server refuses more). */
  maxUtilization: 1,
  ambientTempC: { min: -100, max: 400 },
  /** ± % on the catalog stiffness (the server's limit). */
  stiffnessTolerancePct: 50,
  /** Seismic restraint (the server's RestraintInputDto; ASCE 7-16 §13.3.1). */
  restraint: { sdsG: { max: 4 }, ap: { min: 1, max: 2.5 }, rp: { min: 1, max: 12 }, gapMm: { max: 100 } },
} as const;

export interface ComponentValues {
  name: string;
  mass: string;
  x: string;
  y: string;
  z: string;
  /** Optional uniform-box dimensions; all three blank = a point mass. */
  lx: string;
  ly: string;
  lz: string;
  /** Optional second operating mass (drained, empty, without its liquid); blank: none. */
  altMass: string;
  /** Own inertia from the saved input, kept unchanged (kg·m²); not edited on this screen. */
  inertia?: DesignComponent['inertia'];
}

export interface MountPointValues {
  label: string;
  x: string;
  y: string;
  z: string;
  /** Vertical stiffness of the floor or steel under the point, in the user's stiffness unit; blank: rigid. */
  supportStiffness: string;
}

export type SpeedMode = 'fixed' | 'range';

export interface OperatingValues {
  speedMode: SpeedMode;
  speedRpm: string;
  speedMinRpm: string;
  speedMaxRpm: string;
  /** Shaft orders as a list, e.g. "1, 2". */
  orders: string;
  vaneCount: string;
  lineFrequencyHz: string;
  /** Further frequencies in Hz, e.g. "37.5, 75". */
  extraFrequenciesHz: string;
  /** Where each force acts and how big it is (the whole-machine model); none: a vertical force at the CG. */
  sources: SourceValues[];
  /** Speed bands the drive skips, in rpm. */
  skipBands: SkipBandValues[];
  /** Poles of the drive motor (blank: not given). */
  motorPoles: string;
}

export interface CriteriaValues {
  minIsolationPct: string;
  minUtilization: string;
  maxUtilization: string;
  /** In the user's temperature unit. */
  ambientTemp: string;
  weightMarginPct: string;
  /** ± % on the catalog stiffness; blank: the default of each mount type. */
  stiffnessTolerancePct: string;
  mountTypes: string[];
  /** Supplier ids as text (checkbox values). */
  supplierIds: string[];
}

/** Seismic restraint as typed; `enabled` false leaves it out of the input. */
export interface RestraintValues {
  enabled: boolean;
  sdsG: string;
  /** '1' or '1.5'. */
  importanceFactor: string;
  zOverH: string;
  /** Blank: the code's default for vibration-isolated components. */
  ap: string;
  rp: string;
  /** Nominal gap to the restraints, in the user's length unit (mm or in); blank: not specified. */
  snubberGap: string;
}

export interface DesignFormValues {
  components: ComponentValues[];
  mountPoints: MountPointValues[];
  operating: OperatingValues;
  criteria: CriteriaValues;
  restraint: RestraintValues;
}

/** Restraint boxes of a design without restraint: off, with the usual starting values. */
export const NO_RESTRAINT: RestraintValues = {
  enabled: false,
  sdsG: '',
  importanceFactor: '1',
  zOverH: '0',
  ap: '',
  rp: '',
  snubberGap: '',
};

// ---- SI → text ----

/** A number for an input box: six significant figures, no trailing zeros, no float noise. */
export function numberText(value: number | undefined | null): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return '';
  return String(Number(value.toPrecision(6)));
}

function listText(values: readonly number[] | undefined): string {
  return (values ?? []).map((v) => numberText(v)).join(', ');
}

export function blankComponent(): ComponentValues {
  return { name: '', mass: '', x: '', y: '', z: '', lx: '', ly: '', lz: '', altMass: '' };
}

export function blankMountPoint(label = ''): MountPointValues {
  return { label, x: '', y: '', z: '', supportStiffness: '' };
}

/** The saved SI input → what the form shows in the user's units. */
export function toFormValues(input: DesignInput, units: Units): DesignFormValues {
  const position = (v: number) => numberText(units.toDisplay('position', v));
  const { criteria } = input;
  const operating = input.operating as OperatingConditions & Model2Operating;
  return {
    components: input.components.map((c) => ({
      name: c.name,
      mass: numberText(units.toDisplay('mass', c.massKg)),
      x: position(c.cg.x),
      y: position(c.cg.y),
      z: position(c.cg.z),
      lx: c.box ? position(c.box.lx) : '',
      ly: c.box ? position(c.box.ly) : '',
      lz: c.box ? position(c.box.lz) : '',
      altMass: c.altMassKg === undefined ? '' : numberText(units.toDisplay('mass', c.altMassKg)),
      ...(c.inertia ? { inertia: c.inertia } : {}),
    })),
    mountPoints: input.mountPoints.map((p) => ({
      label: p.label,
      x: position(p.x),
      y: position(p.y),
      z: position(p.z),
      // The API takes N/mm; the units convert from N/m.
      supportStiffness:
        p.supportStiffnessNPerMm === undefined ? '' : numberText(units.toDisplay('stiffness', p.supportStiffnessNPerMm * 1000)),
    })),
    operating: {
      speedMode: operating.speedRangeRpm ? 'range' : 'fixed',
      speedRpm: numberText(operating.speedRpm),
      speedMinRpm: numberText(operating.speedRangeRpm?.min),
      speedMaxRpm: numberText(operating.speedRangeRpm?.max),
      orders: listText(operating.orders),
      vaneCount: numberText(operating.vaneCount),
      lineFrequencyHz: numberText(operating.lineFrequencyHz),
      extraFrequenciesHz: listText(operating.extraFrequenciesHz),
      sources: (operating.sources ?? []).map((source) => sourceValues(source, units)),
      skipBands: (operating.skipBandsRpm ?? []).map(skipBandValues),
      motorPoles: numberText(operating.motorPoles),
    },
    criteria: {
      minIsolationPct: numberText(criteria.minIsolationPct),
      minUtilization: numberText(criteria.minUtilization),
      maxUtilization: numberText(criteria.maxUtilization),
      ambientTemp: criteria.ambientTempC === undefined ? '' : numberText(units.toDisplay('temperature', criteria.ambientTempC)),
      weightMarginPct: numberText(criteria.weightMarginPct),
      stiffnessTolerancePct: numberText(criteria.stiffnessTolerancePct),
      mountTypes: [...(criteria.mountTypes ?? [])],
      supplierIds: (criteria.supplierIds ?? []).map(String),
    },
    restraint: input.restraint ? restraintValues(input.restraint, units) : { ...NO_RESTRAINT },
  };
}

function restraintValues(restraint: RestraintInput, units: Units): RestraintValues {
  return {
    enabled: true,
    sdsG: numberText(restraint.sdsG),
    importanceFactor: String(restraint.importanceFactor),
    zOverH: numberText(restraint.zOverH),
    ap: numberText(restraint.ap),
    rp: numberText(restraint.rp),
    snubberGap: restraint.snubberGapMm === undefined ? '' : numberText(units.toDisplay('deflection', restraint.snubberGapMm / 1000)),
  };
}

// ---- text → SI ----

/** Text → finite number; blank or not a number → undefined. */
export function parseNumber(text: string | undefined): number | undefined {
  const trimmed = (text ?? '').trim();
  if (trimmed === '') return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : undefined;
}

/** "1, 2; 3" → [1, 2, 3]; undefined when any entry is not a number. */
export function parseList(text: string | undefined): number[] | undefined {
  const parts = (text ?? '')
    .split(/[,;\s]+/)
    .map((part) => part.trim())
    .filter(Boolean);
  const values = parts.map((part) => Number(part));
  return values.every((v) => Number.isFinite(v)) ? values : undefined;
}

function isBlank(text: string | undefined): boolean {
  return (text ?? '').trim() === '';
}

/** The equipment in SI, or null while any row is incomplete or not a number. */
export function parseComponents(rows: readonly ComponentValues[], units: Units): DesignComponent[] | null {
  const out: DesignComponent[] = [];
  for (const row of rows) {
    const mass = parseNumber(row.mass);
    const x = parseNumber(row.x);
    const y = parseNumber(row.y);
    const z = parseNumber(row.z);
    if (mass === undefined || x === undefined || y === undefined || z === undefined) return null;
    const component: DesignComponent = {
      name: row.name.trim(),
      massKg: units.toSi('mass', mass),
      cg: { x: units.toSi('position', x), y: units.toSi('position', y), z: units.toSi('position', z) },
    };
    if (!(isBlank(row.lx) && isBlank(row.ly) && isBlank(row.lz))) {
      const lx = parseNumber(row.lx);
      const ly = parseNumber(row.ly);
      const lz = parseNumber(row.lz);
      if (lx === undefined || ly === undefined || lz === undefined) return null;
      component.box = { lx: units.toSi('position', lx), ly: units.toSi('position', ly), lz: units.toSi('position', lz) };
    }
    if (!isBlank(row.altMass)) {
      const altMass = parseNumber(row.altMass);
      if (altMass === undefined) return null;
      component.altMassKg = units.toSi('mass', altMass);
    }
    if (row.inertia) component.inertia = row.inertia;
    out.push(component);
  }
  return out;
}

/** The mount points in SI, or null while any row is incomplete. */
export function parseMountPoints(rows: readonly MountPointValues[], units: Units): MountPoint[] | null {
  const out: MountPoint[] = [];
  for (const row of rows) {
    const x = parseNumber(row.x);
    const y = parseNumber(row.y);
    const z = parseNumber(row.z);
    if (x === undefined || y === undefined || z === undefined) return null;
    const point: MountPoint = {
      label: row.label.trim(),
      x: units.toSi('position', x),
      y: units.toSi('position', y),
      z: units.toSi('position', z),
    };
    if (!isBlank(row.supportStiffness)) {
      const stiffness = parseNumber(row.supportStiffness);
      if (stiffness === undefined) return null;
      point.supportStiffnessNPerMm = units.toSi('stiffness', stiffness) / 1000;
    }
    out.push(point);
  }
  return out;
}

/** Operating conditions (rpm and Hz need no conversion), or null while incomplete. */
export function parseOperating(values: OperatingValues): OperatingConditions | null {
  const orders = parseList(values.orders);
  if (!orders) return null;
  const operating: OperatingConditions = { orders };
  if (values.speedMode === 'range') {
    const min = parseNumber(values.speedMinRpm);
    const max = parseNumber(values.speedMaxRpm);
    if (min === undefined || max === undefined) return null;
    operating.speedRangeRpm = { min, max };
  } else if (!isBlank(values.speedRpm)) {
    const speed = parseNumber(values.speedRpm);
    if (speed === undefined) return null;
    operating.speedRpm = speed;
  }
  for (const key of ['vaneCount', 'lineFrequencyHz'] as const) {
    if (isBlank(values[key])) continue;
    const value = parseNumber(values[key]);
    if (value === undefined) return null;
    operating[key] = value;
  }
  if (!isBlank(values.extraFrequenciesHz)) {
    const extra = parseList(values.extraFrequenciesHz);
    if (!extra) return null;
    operating.extraFrequenciesHz = extra;
  }
  return operating;
}

/** The form keeps the ticked kinds as text; the API takes only the catalog's kinds. */
function isMountType(value: string): value is MountType {
  return (MOUNT_TYPES as readonly string[]).includes(value);
}

/** Criteria in SI, or null while a required figure is missing. */
export function parseCriteria(values: CriteriaValues, units: Units): Criteria | null {
  const minIsolationPct = parseNumber(values.minIsolationPct);
  const minUtilization = parseNumber(values.minUtilization);
  const maxUtilization = parseNumber(values.maxUtilization);
  if (minIsolationPct === undefined || minUtilization === undefined || maxUtilization === undefined) return null;
  const criteria: Criteria = { minIsolationPct, minUtilization, maxUtilization };
  if (!isBlank(values.ambientTemp)) {
    const temp = parseNumber(values.ambientTemp);
    if (temp === undefined) return null;
    criteria.ambientTempC = units.toSi('temperature', temp);
  }
  if (!isBlank(values.weightMarginPct)) {
    const margin = parseNumber(values.weightMarginPct);
    if (margin === undefined) return null;
    criteria.weightMarginPct = margin;
  }
  if (!isBlank(values.stiffnessTolerancePct)) {
    const tolerance = parseNumber(values.stiffnessTolerancePct);
    if (tolerance === undefined) return null;
    criteria.stiffnessTolerancePct = tolerance;
  }
  const mountTypes = values.mountTypes.filter(isMountType);
  if (mountTypes.length > 0) criteria.mountTypes = mountTypes;
  if (values.supplierIds.length > 0) criteria.supplierIds = values.supplierIds.map(Number);
  return criteria;
}

/**
 * Seismic restraint in SI (gap in mm, as the API takes it): undefined when it is off, null while
 * a required figure is missing.
 */
export function parseRestraint(values: RestraintValues, units: Units): RestraintInput | undefined | null {
  if (!values.enabled) return undefined;
  const sdsG = parseNumber(values.sdsG);
  const importanceFactor = parseNumber(values.importanceFactor);
  const zOverH = parseNumber(values.zOverH);
  if (sdsG === undefined || zOverH === undefined || (importanceFactor !== 1 && importanceFactor !== 1.5)) return null;
  const restraint: RestraintInput = { sdsG, importanceFactor, zOverH };
  for (const key of ['ap', 'rp'] as const) {
    if (isBlank(values[key])) continue;
    const value = parseNumber(values[key]);
    if (value === undefined) return null;
    restraint[key] = value;
  }
  if (!isBlank(values.snubberGap)) {
    const gap = parseNumber(values.snubberGap);
    if (gap === undefined) return null;
    restraint.snubberGapMm = units.toSi('deflection', gap) * 1000;
  }
  return restraint;
}

/** The whole form in SI, or null while any part is incomplete. Validate with the schema first. */
export function toDesignInput(values: DesignFormValues, units: Units): DesignInput | null {
  const components = parseComponents(values.components, units);
  const mountPoints = parseMountPoints(values.mountPoints, units);
  const basic = parseOperating(values.operating);
  const model2 = parseModel2Operating(values.operating, units);
  const criteria = parseCriteria(values.criteria, units);
  const restraint = parseRestraint(values.restraint, units);
  if (!components || !mountPoints || !basic || !model2 || !criteria || restraint === null) return null;
  const operating: OperatingConditions & Model2Operating = { ...basic, ...model2 };
  return { components, mountPoints, operating, criteria, ...(restraint ? { restraint } : {}) };
}

// ---- validation (yup) ----

const blankToUndefined = (value: unknown, original: unknown) =>
  typeof original === 'string' && original.trim() === '' ? undefined : value;

function requiredNumber(what: string) {
  return yup.number().transform(blankToUndefined).typeError(`${what} must be a number`).required(`Enter ${what}`);
}

function optionalNumber(what: string) {
  return yup.number().transform(blankToUndefined).typeError(`${what} must be a number`).optional();
}

function listOf(what: string, { positive = true, max }: { positive?: boolean; max?: number } = {}) {
  return yup
    .string()
    .test('numbers', `${what}: give numbers separated by commas`, (text) => parseList(text) !== undefined)
    .test('positive', `${what} must all be more than 0`, (text) => !positive || (parseList(text) ?? []).every((v) => v > 0))
    .test('count', `${what}: give at most ${max} values`, (text) => max === undefined || (parseList(text) ?? []).length <= max);
}

const componentSchema = yup
  .object({
    name: yup
      .string()
      .trim()
      .required('Name the component')
      .max(DESIGN_LIMITS.componentNameLength, `Keep the name to ${DESIGN_LIMITS.componentNameLength} characters`),
    mass: requiredNumber('the mass').positive('The mass must be more than 0'),
    x: requiredNumber('x'),
    y: requiredNumber('y'),
    z: requiredNumber('z'),
    lx: optionalNumber('Length').min(0, 'Dimensions cannot be negative'),
    ly: optionalNumber('Width').min(0, 'Dimensions cannot be negative'),
    lz: optionalNumber('Height').min(0, 'Dimensions cannot be negative'),
    altMass: optionalNumber('The second mass').positive('The second mass must be more than 0'),
  })
  .test('box', 'Give all three box dimensions, or none', function (row) {
    const given = [row.lx, row.ly, row.lz].filter((v) => v !== undefined).length;
    if (given === 0 || given === 3) return true;
    const missing = (['lx', 'ly', 'lz'] as const).find((key) => row[key] === undefined) ?? 'lx';
    return this.createError({ path: `${this.path}.${missing}`, message: 'Give all three box dimensions, or none' });
  });

const mountPointSchema = yup.object({
  label: yup
    .string()
    .trim()
    .required('Label the point')
    .max(DESIGN_LIMITS.labelLength, `Keep the label to ${DESIGN_LIMITS.labelLength} characters`),
  x: requiredNumber('x'),
  y: requiredNumber('y'),
  z: requiredNumber('z'),
  supportStiffness: optionalNumber('The support stiffness').positive('The support stiffness must be more than 0'),
});

const operatingSchema = yup
  .object({
    speedMode: yup.mixed<SpeedMode>().oneOf(['fixed', 'range']).required(),
    speedRpm: optionalNumber('The speed').when('speedMode', {
      is: 'fixed',
      then: (s) => s.positive('The speed must be more than 0'),
    }),
    speedMinRpm: optionalNumber('The lowest speed').when('speedMode', {
      is: 'range',
      then: (s) => s.required('Enter the lowest speed').positive('The lowest speed must be more than 0'),
    }),
    speedMaxRpm: optionalNumber('The highest speed').when(['speedMode', 'speedMinRpm'], ([mode, min], s) =>
      mode === 'range'
        ? s
            .required('Enter the highest speed')
            .positive('The highest speed must be more than 0')
            .min(typeof min === 'number' ? min : 0, 'The highest speed cannot be below the lowest')
        : s,
    ),
    orders: listOf('Orders', { max: DESIGN_LIMITS.orders }).test(
      'max-order',
      `Orders above ${DESIGN_LIMITS.maxOrder} are not accepted`,
      (text) => (parseList(text) ?? []).every((v) => v <= DESIGN_LIMITS.maxOrder),
    ),
    vaneCount: optionalNumber('The vane count')
      .integer('The vane count is a whole number')
      .min(1, 'The vane count must be at least 1')
      .max(DESIGN_LIMITS.vaneCount, `At most ${DESIGN_LIMITS.vaneCount} vanes`),
    lineFrequencyHz: optionalNumber('The supply frequency').positive('The supply frequency must be more than 0'),
    extraFrequenciesHz: listOf('Further frequencies', { max: DESIGN_LIMITS.extraFrequencies }),
    ...model2OperatingFields,
  })
  .test('source', 'Give a speed or a supply frequency: there is nothing to isolate from otherwise', function (values) {
    const hasSpeed = values.speedMode === 'range' ? true : values.speedRpm !== undefined;
    const hasOther = values.lineFrequencyHz !== undefined || (parseList(values.extraFrequenciesHz) ?? []).length > 0;
    if (hasSpeed || hasOther) return true;
    return this.createError({
      path: `${this.path}.speedRpm`,
      message: 'Give a speed or a supply frequency: there is nothing to isolate from otherwise',
    });
  });

const criteriaSchema = yup.object({
  minIsolationPct: requiredNumber('the minimum isolation')
    .positive('The minimum isolation must be more than 0 %')
    .max(DESIGN_LIMITS.maxIsolationPct, `The minimum isolation must be at most ${DESIGN_LIMITS.maxIsolationPct} %`),
  minUtilization: requiredNumber('the lowest utilisation')
    .positive('The lowest utilisation must be more than 0')
    .max(DESIGN_LIMITS.maxUtilization, `At most ${DESIGN_LIMITS.maxUtilization}`),
  maxUtilization: requiredNumber('the highest utilisation')
    .positive('The highest utilisation must be more than 0')
    .max(DESIGN_LIMITS.maxUtilization, `At most ${DESIGN_LIMITS.maxUtilization}: a mount is never loaded beyond its rating`)
    .when('minUtilization', ([min], s) =>
      typeof min === 'number' ? s.moreThan(min, 'The highest utilisation must be above the lowest') : s,
    ),
  ambientTemp: optionalNumber('The ambient temperature'),
  weightMarginPct: optionalNumber('The weight margin')
    .min(0, 'The weight margin cannot be negative')
    .max(100, 'The weight margin must be at most 100 %'),
  mountTypes: yup.array(yup.string().required()).required(),
  supplierIds: yup.array(yup.string().required()).required(),
  stiffnessTolerancePct: optionalNumber('The stiffness tolerance')
    .min(0, 'The stiffness tolerance cannot be negative')
    .max(DESIGN_LIMITS.stiffnessTolerancePct, `The stiffness tolerance is at most ${DESIGN_LIMITS.stiffnessTolerancePct} %`),
});

/** Seismic restraint: checked only when it is on; the gap limit is stated in the user's unit. */
function restraintSchema(units: Units) {
  const R = DESIGN_LIMITS.restraint;
  const gapMax = units.toDisplay('deflection', R.gapMm.max / 1000);
  const gapUnit = units.label('deflection');
  // Off: the boxes keep what was typed and are not checked.
  const whenOn = (schema: yup.NumberSchema<number | undefined>, required: string | null) =>
    yup.mixed().when('enabled', { is: true, then: () => (required ? schema.required(required) : schema), otherwise: () => yup.mixed() });
  const number = (what: string) => yup.number().transform(blankToUndefined).typeError(`${what} must be a number`);
  return yup.object({
    enabled: yup.boolean().required(),
    sdsG: whenOn(
      number('S_DS')
        .moreThan(0, 'S_DS must be more than 0 g')
        .max(R.sdsG.max, `S_DS must be at most ${R.sdsG.max} g: give it in g, not in %`),
      'Enter S_DS, in g',
    ),
    importanceFactor: yup.string().oneOf(['1', '1.5'], 'The importance factor I_p is 1.0 or 1.5').required(),
    zOverH: whenOn(
      number('z/h').min(0, 'z/h is from 0 (grade) to 1 (roof)').max(1, 'z/h is from 0 (grade) to 1 (roof)'),
      'Enter z/h, from 0 to 1',
    ),
    ap: whenOn(
      number('a_p').min(R.ap.min, `a_p is from ${R.ap.min} to ${R.ap.max}`).max(R.ap.max, `a_p is from ${R.ap.min} to ${R.ap.max}`),
      null,
    ),
    rp: whenOn(
      number('R_p').min(R.rp.min, `R_p is from ${R.rp.min} to ${R.rp.max}`).max(R.rp.max, `R_p is from ${R.rp.min} to ${R.rp.max}`),
      null,
    ),
    snubberGap: whenOn(
      number('The gap')
        .min(0, 'The gap cannot be negative')
        .max(gapMax, `The gap must be at most ${Number(gapMax.toPrecision(3))} ${gapUnit}`),
      null,
    ),
  });
}

/** Temperature limits depend on the unit system, so the schema is built per user. */
export function designFormSchema(units: Units) {
  const lowest = units.toDisplay('temperature', DESIGN_LIMITS.ambientTempC.min);
  const highest = units.toDisplay('temperature', DESIGN_LIMITS.ambientTempC.max);
  const unit = units.label('temperature');
  return yup.object({
    components: yup
      .array(componentSchema)
      .min(1, 'Add at least one component')
      .max(DESIGN_LIMITS.components, `At most ${DESIGN_LIMITS.components} components`)
      .required(),
    mountPoints: yup
      .array(mountPointSchema)
      .min(DESIGN_LIMITS.mountPoints.min, `Give at least ${DESIGN_LIMITS.mountPoints.min} mount points`)
      .max(DESIGN_LIMITS.mountPoints.max, `At most ${DESIGN_LIMITS.mountPoints.max} mount points`)
      .test('unique-labels', 'Each mount point needs its own label', (rows) => {
        const labels = (rows ?? []).map((row) => row.label?.trim()).filter(Boolean);
        return new Set(labels).size === labels.length;
      })
      .required(),
    operating: operatingSchema,
    criteria: criteriaSchema.shape({
      ambientTemp: optionalNumber('The ambient temperature')
        .min(lowest, `The ambient temperature must be at least ${Math.round(lowest)} ${unit}`)
        .max(highest, `The ambient temperature must be at most ${Math.round(highest)} ${unit}`),
    }),
    restraint: restraintSchema(units),
  });
}

// ---- errors in words ----

/** API leaf names whose form field is named otherwise (`massKg` → `mass`). */
const FORM_FIELD_OF: Record<string, string> = {
  massKg: 'mass',
  altMassKg: 'altMass',
  supportStiffnessNPerMm: 'supportStiffness',
  ambientTempC: 'ambientTemp',
  snubberGapMm: 'snubberGap',
  snubberGapM: 'snubberGap',
};

/**
 * The server's field problems of a design save, placed at the form's fields
 * (`input.components.1.massKg` → `components.1.mass`, `input.components.1.cg.x` →
 * `components.1.x`, `input.operating.extraFrequenciesHz.2` → `operating.extraFrequenciesHz`);
 * one message per field, the first. Problems the form has no field for are left out.
 */
export function serverErrorsToForm(problems: readonly { field: string; message: string }[]): FormikErrors<DesignFormValues> {
  let errors: FormikErrors<DesignFormValues> = {};
  for (const problem of problems) {
    const parts = problem.field
      .replace(/\[(\w+)\]/g, '.$1')
      .split('.')
      .filter(Boolean);
    if (parts[0] === 'input') parts.shift();
    const section = parts[0] as keyof DesignFormValues;
    if (!(section in SECTION_NAMES)) continue;
    const path =
      section === 'components' || section === 'mountPoints'
        ? parts.slice(0, 2).concat(
            parts
              .slice(2)
              .filter((p) => p !== 'cg' && p !== 'box')
              .slice(-1),
          )
        : parts.slice(0, 2).filter((p) => !/^\d+$/.test(p));
    if (path[path.length - 1] === 'speedRangeRpm') path[path.length - 1] = parts[2] === 'max' ? 'speedMaxRpm' : 'speedMinRpm';
    path[path.length - 1] = FORM_FIELD_OF[path[path.length - 1]] ?? path[path.length - 1];
    const at = path.join('.');
    if (getIn(errors, at) === undefined) errors = setIn(errors, at, problem.message);
  }
  return errors;
}

const SECTION_NAMES: Record<keyof DesignFormValues, string> = {
  components: 'Equipment',
  mountPoints: 'Mount layout',
  operating: 'Running conditions',
  criteria: 'Requirements',
  restraint: 'Seismic restraint',
};

/** Names of the rows of the lists inside a section (the sources and skip bands of the running conditions). */
const ROW_NAMES: Record<string, string> = { sources: 'source', skipBands: 'skip band' };

function describeRowErrors(
  where: string,
  rows: unknown[],
  values: DesignFormValues,
  section: keyof DesignFormValues,
  key: string,
): string[] {
  const out: string[] = [];
  const list = (values[section] as unknown as Record<string, { label?: string }[] | undefined>)[key] ?? [];
  rows.forEach((rowErrors, index) => {
    if (!rowErrors) return;
    const label = list[index]?.label?.trim();
    const at = `${where} ${index + 1}${label ? ` (${label})` : ''}`;
    if (typeof rowErrors === 'string') out.push(`${at}: ${rowErrors}`);
    else
      for (const message of Object.values(rowErrors as Record<string, unknown>))
        if (typeof message === 'string') out.push(`${at}: ${message}`);
  });
  return out;
}

/**
 * Formik's nested error object → one sentence per problem, naming where it is
 * ("Equipment, row 2 (Motor): The mass must be more than 0").
 */
export function describeErrors(errors: unknown, values: DesignFormValues): string[] {
  const out: string[] = [];
  if (!errors || typeof errors !== 'object') return out;
  for (const section of Object.keys(SECTION_NAMES) as (keyof DesignFormValues)[]) {
    const sectionErrors = (errors as Record<string, unknown>)[section];
    if (!sectionErrors) continue;
    const name = SECTION_NAMES[section];
    if (typeof sectionErrors === 'string') {
      out.push(`${name}: ${sectionErrors}`);
      continue;
    }
    if (Array.isArray(sectionErrors)) {
      sectionErrors.forEach((rowErrors, index) => {
        if (!rowErrors) return;
        const row = (values[section] as unknown as Record<string, string>[])[index];
        const rowName = row?.name || row?.label;
        const where = `${name}, row ${index + 1}${rowName ? ` (${rowName})` : ''}`;
        if (typeof rowErrors === 'string') out.push(`${where}: ${rowErrors}`);
        else for (const message of Object.values(rowErrors as Record<string, string>)) out.push(`${where}: ${message}`);
      });
      continue;
    }
    for (const [key, message] of Object.entries(sectionErrors as Record<string, unknown>)) {
      if (typeof message === 'string') out.push(`${name}: ${message}`);
      else if (Array.isArray(message)) out.push(...describeRowErrors(`${name}, ${ROW_NAMES[key] ?? 'row'}`, message, values, section, key));
    }
  }
  return out;
}

/** Which tab (section) has problems, for the tab badges. */
export function sectionsWithErrors(errors: unknown): Set<keyof DesignFormValues> {
  const out = new Set<keyof DesignFormValues>();
  if (!errors || typeof errors !== 'object') return out;
  for (const section of Object.keys(SECTION_NAMES) as (keyof DesignFormValues)[]) {
    if ((errors as Record<string, unknown>)[section]) out.add(section);
  }
  return out;
}
