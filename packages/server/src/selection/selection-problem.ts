import { BadRequestException } from '@nestjs/common';
import {
  disturbingFrequencies,
  inputProblemWords,
  isInsideConvexHull,
  isolationDb,
  isVibrationInputError,
  massProperties,
  mountLoads,
  prepareMountLayout,
  resolveOperatingSources,
  verticalSourcesAt,
  seismicDesignForce,
  transmissibilityFromEfficiency,
  VibrationInputError,
  type AssemblyComponent,
  type InertiaTensor,
  type MountLayout,
  type ResolvedOperating,
} from '@tacet/vibration';
import type { FieldError } from '../common/filters/all-exceptions.filter.js';
import { messageInWords } from '../common/words.js';
import type { MountType } from '../catalog/mount-rules.js';
import {
  SELECTION_LIMITS,
  type Component,
  type Criteria,
  type MountPoint,
  type OperatingConditions,
  type Vec3,
} from './dto/design-input.dto.js';
import type { RestraintInput } from './dto/restraint.dto.js';
import { formatHz } from './selection-format.js';
import type { LabelledFrequency } from './selection.types.js';

/**
 * The weight margin when the criteria give none, %: equipment weights from data sheets are
 * commonly quoted to about ±10 % before the final equipment is known (common practice, no
 * single source; docs/engineering/selection.md §17).
 */
export const DEFAULT_WEIGHT_MARGIN_PCT = 10;

/** What a selection needs, as the API receives it (frequency labels are optional). */
export interface SelectionInput {
  components: readonly Component[];
  mountPoints: readonly MountPoint[];
  frequencies: readonly { frequencyHz: number; label?: string }[];
  /** The operating conditions (sources, speeds, skip bands); absent: a vertical force through the CG at each frequency. */
  operating?: OperatingConditions;
  criteria: Criteria;
  /** Seismic restraint to check (docs/engineering/seismic-restraint.md); absent: not checked. */
  restraint?: RestraintInput;
}

/**
 * Everything about the machine and the criteria that does not depend on the mount: computed
 * once per request with @tacet/vibration, then shared by every candidate.
 */
export interface SelectionProblem {
  points: readonly MountPoint[];
  pointCount: number;
  layout: MountLayout;
  components: AssemblyComponent[];
  massKg: number;
  weightN: number;
  cg: Vec3;
  inertia: InertiaTensor;
  /** Loads with equal stiffness at every point (identical mounts give exactly these), N. */
  equalLoadsN: Float64Array;
  minLoadN: number;
  maxLoadN: number;
  frequenciesHz: Float64Array;
  frequencyLabels: (string | undefined)[];
  /** The sources of the whole-machine verdict and the speeds they run over (docs/engineering/forcing.md §7). */
  forcing: ResolvedOperating;
  criteria: Criteria;
  /**
   * Compliance of the support under each point, 1/k_s [m/N] (0: rigid, no `supportStiffnessNPerMm`):
   * in series with the mount vertically (docs/engineering/selection.md §15).
   */
  supportCompliance: Float64Array;
  /** Some point stands on a flexible support. */
  hasSupport: boolean;
  /** The allowance on the weight the overload checks use, % (the criteria's, or the default). */
  weightMarginPct: number;
  /** 1 + weightMarginPct/100: applied to loads in the overload checks (utilisation above the window, deflection). */
  marginFactor: number;
  /** Highest transmissibility that still meets minIsolationPct. */
  transmissibilityTarget: number;
  /** The same target in dB (for the score). */
  isolationDbTarget: number;
  /** The CG lies inside the polygon of the mount points. */
  cgInside: boolean;
  /** Seismic restraint to check; undefined: not checked. */
  restraint: RestraintInput | undefined;
  /**
   * The second mass case, when some component gives `altMassKg` (docs/engineering/selection.md §18):
   * its mass properties and equal-stiffness loads; the verdict covers both cases.
   */
  alt: AltMassCase | undefined;
}

/** The machine in its second mass case (components with `altMassKg` take it, the others keep their mass). */
export interface AltMassCase {
  components: AssemblyComponent[];
  massKg: number;
  weightN: number;
  cg: Vec3;
  inertia: InertiaTensor;
  equalLoadsN: Float64Array;
  cgInside: boolean;
}

/** What the SQL prefilter reads: only rows that could serve at least one point. */
export interface PrefilterBounds {
  minRatedLoadN: number;
  maxRatedLoadN: number;
  ambientTempC?: number;
  mountTypes?: readonly MountType[];
  supplierIds?: readonly number[];
}

/** A design component → the calculation library's component (own inertia wins over a box). */
export function toAssemblyComponent(component: Component): AssemblyComponent {
  const base = { name: component.name, massKg: component.massKg, cg: { ...component.cg } };
  if (component.inertia) {
    const j = component.inertia;
    return { ...base, ownInertia: { xx: j.ixx, yy: j.iyy, zz: j.izz, xy: j.ixy ?? 0, xz: j.ixz ?? 0, yz: j.iyz ?? 0 } };
  }
  if (component.box) {
    return { ...base, shape: 'box', dimensions: { x: component.box.lx, y: component.box.ly, z: component.box.lz } };
  }
  return base;
}

/** Renames a calculation-library field path to the API's: `points[2].x` → `mountPoints.2.x`. */
function apiField(field: string): string {
  const renamed = field.replace(/^points\b/, 'mountPoints').replace(/^machine\b/, 'operating');
  return renamed.replace(/\[(\d+)\]/g, '.$1');
}

/**
 * A calculation-library refusal as a 400 naming the field (`prefix` places it inside the body,
 * e.g. `input` for a design).
 */
export function vibrationInputToBadRequest(error: VibrationInputError, prefix = ''): BadRequestException {
  const own = error.message.startsWith(`${error.field}: `) ? error.message.slice(error.field.length + 2) : error.message;
  const field = prefix ? `${prefix}.${apiField(error.field)}` : apiField(error.field);
  const errors: FieldError[] = [{ field, message: messageInWords(inputProblemWords(field, own)) }];
  return new BadRequestException({ message: 'Validation failed', errors });
}

/** Runs `compute`, turning a VibrationInputError into a 400 that names the field. */
export function withInputErrors<T>(compute: () => T, prefix = ''): T {
  try {
    return compute();
  } catch (error) {
    if (isVibrationInputError(error)) throw vibrationInputToBadRequest(error, prefix);
    throw error;
  }
}

/**
 * Mass properties, layout, equal-stiffness loads and targets.
 * @throws VibrationInputError (mass ≤ 0, fewer than 3 or collinear mount points...) with API field paths
 */
export function prepareProblem(input: SelectionInput): SelectionProblem {
  const components = input.components.map(toAssemblyComponent);
  const mass = massProperties(components);
  const layout = prepareMountLayout(input.mountPoints);
  const loads = mountLoads({ points: input.mountPoints, stiffnessNPerM: 1, weightN: mass.weightN, cg: mass.cg });
  const frequenciesHz = new Float64Array(input.frequencies.length);
  input.frequencies.forEach((f, i) => {
    if (!(f.frequencyHz > 0) || !Number.isFinite(f.frequencyHz)) {
      throw new VibrationInputError(`disturbingFrequenciesHz[${i}]`, 'must be a finite number > 0', 'not-positive');
    }
    frequenciesHz[i] = f.frequencyHz;
  });
  const criteria = input.criteria;
  const weightMarginPct = criteria.weightMarginPct ?? DEFAULT_WEIGHT_MARGIN_PCT;
  const supportCompliance = new Float64Array(
    input.mountPoints.map((p) => (p.supportStiffnessNPerMm ? 1 / (p.supportStiffnessNPerMm * 1000) : 0)),
  );
  const transmissibilityTarget = transmissibilityFromEfficiency(criteria.minIsolationPct);
  return {
    points: input.mountPoints,
    pointCount: layout.pointCount,
    layout,
    components,
    massKg: mass.massKg,
    weightN: mass.weightN,
    cg: mass.cg,
    inertia: mass.inertia,
    equalLoadsN: new Float64Array(loads.loadsN),
    minLoadN: Math.min(...loads.loadsN),
    maxLoadN: Math.max(...loads.loadsN),
    frequenciesHz,
    frequencyLabels: input.frequencies.map((f) => f.label),
    forcing: input.operating ? resolveOperatingSources(input.operating, mass.cg) : verticalSourcesAt(Array.from(frequenciesHz), mass.cg),
    criteria,
    supportCompliance,
    hasSupport: supportCompliance.some((c) => c > 0),
    weightMarginPct,
    marginFactor: 1 + weightMarginPct / 100,
    transmissibilityTarget,
    isolationDbTarget: isolationDb(transmissibilityTarget),
    cgInside: isInsideConvexHull(mass.cg, input.mountPoints),
    restraint: input.restraint ? checkedRestraint(input.restraint, mass.weightN) : undefined,
    alt: altMassCase(input),
  };
}

/** The second mass case of the input, or undefined when no component gives `altMassKg`. */
function altMassCase(input: SelectionInput): AltMassCase | undefined {
  if (!input.components.some((c) => c.altMassKg !== undefined && c.altMassKg !== null)) return undefined;
  const components = input.components.map((c) => toAssemblyComponent({ ...c, massKg: c.altMassKg ?? c.massKg }));
  const mass = massProperties(components);
  const loads = mountLoads({ points: input.mountPoints, stiffnessNPerM: 1, weightN: mass.weightN, cg: mass.cg });
  return {
    components,
    massKg: mass.massKg,
    weightN: mass.weightN,
    cg: mass.cg,
    inertia: mass.inertia,
    equalLoadsN: new Float64Array(loads.loadsN),
    cgInside: isInsideConvexHull(mass.cg, input.mountPoints),
  };
}

/**
 * The restraint input, checked once by the calculation (the DTO checks it first; this catches
 * what only the formula knows), with errors placed under `restraint.`.
 */
function checkedRestraint(restraint: RestraintInput, weightN: number): RestraintInput {
  try {
    seismicDesignForce({
      ...restraint,
      snubberGapM: restraint.snubberGapMm === undefined || restraint.snubberGapMm === null ? null : restraint.snubberGapMm / 1000,
      weightN,
    });
  } catch (error) {
    if (isVibrationInputError(error)) {
      const field = error.field === 'snubberGapM' ? 'snubberGapMm' : error.field;
      throw new VibrationInputError(`restraint.${field}`, error.message.slice(error.field.length + 2), error.code);
    }
    throw error;
  }
  return restraint;
}

/**
 * The SQL prefilter: a size is worth reading when its rated load suits at least one point of
 * the equal-stiffness solution, i.e. P_r ∈ [F_min·margin/u_max, F_max/u_min], and it suits the
 * temperature, types and suppliers asked for. (Series loads re-solved with the picked sizes
 * shift a little; a size just outside this window would sit at the edge of the utilisation
 * window anyway.)
 */
export function prefilterBounds(problem: SelectionProblem): PrefilterBounds {
  const { criteria } = problem;
  return {
    minRatedLoadN: (Math.max(problem.minLoadN, 0) * problem.marginFactor) / criteria.maxUtilization,
    maxRatedLoadN: problem.maxLoadN / criteria.minUtilization,
    ambientTempC: criteria.ambientTempC,
    mountTypes: criteria.mountTypes?.length ? criteria.mountTypes : undefined,
    supplierIds: criteria.supplierIds?.length ? criteria.supplierIds : undefined,
  };
}

/**
 * The disturbing frequencies of a design's operating conditions (lowest first), with labels:
 * shaft orders (with the sources' orders), vane pass and twice the supply frequency (following the
 * speed with motor poles on a drive) from @tacet/vibration, plus the extra frequencies and the
 * sources' fixed frequencies. These feed the quick figures (the bounce estimate); the verdict
 * sweeps the sources over the running range (engine/whole-machine-check.ts).
 * @throws VibrationInputError with `operating.`-prefixed field paths
 */
export function designFrequencies(operating: OperatingConditions): LabelledFrequency[] {
  checkOperating(operating);
  const sources = operating.sources ?? [];
  let list: LabelledFrequency[];
  try {
    const hasSource = operating.speedRpm !== undefined || operating.speedRangeRpm !== undefined || operating.lineFrequencyHz !== undefined;
    const orders = [...operating.orders];
    for (const source of sources) {
      const order = source.order ?? 1;
      if (source.frequencyHz === undefined && !orders.includes(order)) orders.push(order);
    }
    list = hasSource
      ? disturbingFrequencies({
          speedRpm: operating.speedRpm,
          speedRangeRpm: operating.speedRangeRpm ? { ...operating.speedRangeRpm } : undefined,
          orders,
          vaneCount: operating.vaneCount,
          lineFrequencyHz: operating.lineFrequencyHz,
          motorPoles: operating.speedRangeRpm ? operating.motorPoles : undefined,
        }).map(({ frequencyHz, label }) => ({ frequencyHz, label }))
      : [];
  } catch (error) {
    if (isVibrationInputError(error) && !error.field.startsWith('operating')) {
      const field = error.field === 'machine' ? 'operating' : `operating.${error.field}`;
      const own =
        error.field === 'machine'
          ? error.message.slice(error.field.length + 2).replace(/^gives /, 'give ')
          : error.message.slice(error.field.length + 2);
      throw new VibrationInputError(field, own, error.code);
    }
    throw error;
  }
  for (const hz of operating.extraFrequenciesHz ?? []) list.push({ frequencyHz: hz, label: `further ${formatHz(hz)}` });
  for (const source of sources) {
    const hz = source.frequencyHz;
    if (hz !== undefined && !list.some((f) => f.frequencyHz === hz))
      list.push({ frequencyHz: hz, label: `${source.label} ${formatHz(hz)}` });
  }
  if (list.length === 0) {
    throw new VibrationInputError(
      'operating',
      'give no disturbing frequency: set a speed, a supply frequency or further frequencies',
      'empty',
    );
  }
  if (list.length > SELECTION_LIMITS.frequencies) {
    throw new VibrationInputError('operating', `give ${list.length} disturbing frequencies; at most ${SELECTION_LIMITS.frequencies}`);
  }
  return list.sort((a, b) => a.frequencyHz - b.frequencyHz);
}

/**
 * What the DTO cannot see field by field: a source turning with the shaft needs a speed, skip
 * bands need a speed range and must leave some of it to run at.
 * @throws VibrationInputError with `operating.`-prefixed field paths
 */
export function checkOperating(operating: OperatingConditions): void {
  const hasSpeed = operating.speedRpm !== undefined || operating.speedRangeRpm !== undefined;
  (operating.sources ?? []).forEach((source, i) => {
    if (!hasSpeed && source.frequencyHz === undefined) {
      const what = source.kind === 'unbalance' ? 'an unbalance turns with the shaft' : 'a force at an order of the shaft speed';
      throw new VibrationInputError(`operating.sources.${i}`, `${what}: give the speed or the speed range`, 'empty');
    }
  });
  const bands = operating.skipBandsRpm ?? [];
  if (bands.length === 0) return;
  const range = operating.speedRangeRpm;
  if (!range) throw new VibrationInputError('operating.skipBandsRpm', 'skip bands need a speed range (a drive)', 'empty');
  const sorted = [...bands].sort((a, b) => a.min - b.min);
  let covered = range.min;
  for (const band of sorted) {
    if (band.min > covered) break;
    covered = Math.max(covered, band.max);
  }
  if (covered >= range.max) {
    throw new VibrationInputError('operating.skipBandsRpm', 'the skip bands leave no running speed in the speed range', 'empty');
  }
}
