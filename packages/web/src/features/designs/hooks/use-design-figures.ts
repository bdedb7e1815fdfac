import {
  disturbingFrequencies,
  governingFrequency,
  isVibrationInputError,
  massProperties,
  mountLoads,
  transmissibilityFromEfficiency,
  type AssemblyComponent,
  type DisturbingFrequency,
  type MassProperties,
  type MountLoadsResult,
  INPUT_LABELS,
  inputProblemWords,
} from '@tacet/vibration';
import { useState } from 'react';

import type { Units } from '@/lib/units';
import type { DesignComponent, MountPoint, OperatingConditions } from '@/types/design-api';

import type { DrawnSource } from '../components/source-marks';
import {
  parseComponents,
  parseCriteria,
  parseMountPoints,
  parseNumber,
  parseOperating,
  type DesignFormValues,
} from '../schemas/design-form';

/** Any equal value gives the same loads: with equal mounts the loads do not depend on the stiffness. */
const EQUAL_STIFFNESS_N_PER_M = 1e6;

/** A warning beside the mount layout; `pointIndex` names the point concerned. */
export interface LayoutWarning {
  code: 'cg-outside-mount-polygon' | 'mount-lift-off' | 'mount-overloaded' | 'too-few-mounts' | 'collinear-mounts' | 'input';
  pointIndex?: number;
  /** The force a lifting point would have to pull with [N] (negative load). */
  loadN?: number;
  message: string;
}

export interface DisturbingLine extends DisturbingFrequency {
  /** The lowest, which governs the isolation. */
  governing: boolean;
}

/** Everything the browser computes from the current (unsaved) input, in SI. */
export interface DesignFigures {
  components: DesignComponent[] | null;
  mountPoints: MountPoint[] | null;
  mass: MassProperties | null;
  /** Why the mass properties cannot be shown yet. */
  massProblem: string | null;
  /** Loads with equal stiffness at every point. */
  loads: MountLoadsResult | null;
  layoutWarnings: LayoutWarning[];
  frequencies: DisturbingLine[] | null;
  frequencyProblem: string | null;
  governing: DisturbingLine | null;
  /** T at the minimum isolation asked for, or null while the criterion is blank. */
  targetTransmissibility: number | null;
  minIsolationPct: number | null;
  /** The sources whose position is complete, for the drawings (SI). */
  sources: DrawnSource[];
}

/** Sources with a complete position, for the drawings; rows still being typed are left out. */
export function drawnSources(values: DesignFormValues, units: Units): DrawnSource[] {
  const out: DrawnSource[] = [];
  values.operating.sources.forEach((row, index) => {
    const x = parseNumber(row.x);
    const y = parseNumber(row.y);
    const z = parseNumber(row.z);
    if (x === undefined || y === undefined || z === undefined) return;
    out.push({
      label: row.label.trim() || `Source ${index + 1}`,
      kind: row.kind,
      axis: row.axis,
      at: { x: units.toSi('position', x), y: units.toSi('position', y), z: units.toSi('position', z) },
    });
  });
  return out;
}

/** Shape used by `massProperties`: a box when dimensions are given, own inertia when known. */
export function toAssemblyComponents(components: readonly DesignComponent[]): AssemblyComponent[] {
  return components.map((c) => {
    const base = {
      name: c.name,
      massKg: c.massKg,
      cg: c.cg,
      ...(c.inertia
        ? {
            ownInertia: {
              xx: c.inertia.ixx,
              yy: c.inertia.iyy,
              zz: c.inertia.izz,
              xy: c.inertia.ixy ?? 0,
              xz: c.inertia.ixz ?? 0,
              yz: c.inertia.iyz ?? 0,
            },
          }
        : {}),
    };
    return c.box ? { ...base, shape: 'box' as const, dimensions: { x: c.box.lx, y: c.box.ly, z: c.box.lz } } : base;
  });
}

function problemText(error: unknown): string {
  if (isVibrationInputError(error)) return inputProblemWords(error.field, error.message);
  return error instanceof Error ? error.message : 'The figures cannot be computed from this input.';
}

/** Disturbing frequencies of the operating conditions, lowest first, with the given extras. */
export function frequenciesOf(operating: OperatingConditions): DisturbingLine[] {
  const extras: DisturbingFrequency[] = (operating.extraFrequenciesHz ?? []).map((frequencyHz) => ({
    frequencyHz,
    label: INPUT_LABELS.furtherFrequencies.replace(/ies$/, 'y'),
    source: 'shaft',
    order: 1,
  }));
  const hasMachine = operating.speedRpm !== undefined || operating.speedRangeRpm !== undefined || operating.lineFrequencyHz !== undefined;
  const derived = hasMachine
    ? disturbingFrequencies({
        speedRpm: operating.speedRpm,
        speedRangeRpm: operating.speedRangeRpm,
        orders: operating.orders,
        vaneCount: operating.vaneCount,
        lineFrequencyHz: operating.lineFrequencyHz,
      })
    : [];
  const all = [...derived, ...extras].sort((a, b) => a.frequencyHz - b.frequencyHz);
  if (all.length === 0) return [];
  const governing = governingFrequency(all);
  return all.map((f) => ({ ...f, governing: f === governing }));
}

/** Mass, CG, equal-stiffness loads and warnings of a layout. */
function layoutFigures(points: MountPoint[], mass: MassProperties): { loads: MountLoadsResult | null; warnings: LayoutWarning[] } {
  try {
    const loads = mountLoads({
      points,
      stiffnessNPerM: EQUAL_STIFFNESS_N_PER_M,
      weightN: mass.weightN,
      cg: { x: mass.cg.x, y: mass.cg.y },
    });
    const warnings: LayoutWarning[] = loads.warnings.map((w) => ({
      code: w.code,
      pointIndex: w.pointIndex,
      loadN: w.pointIndex === undefined ? undefined : loads.loadsN[w.pointIndex],
      message: w.message,
    }));
    return { loads, warnings };
  } catch (error) {
    if (isVibrationInputError(error) && (error.code === 'too-few-mounts' || error.code === 'collinear-mounts')) {
      return { loads: null, warnings: [{ code: error.code, message: error.message }] };
    }
    return { loads: null, warnings: [{ code: 'input', message: problemText(error) }] };
  }
}

/** Computes the live figures (all with `@tacet/vibration`) from the form values. */
export function computeDesignFigures(values: DesignFormValues, units: Units): DesignFigures {
  const components = parseComponents(values.components, units);
  const mountPoints = parseMountPoints(values.mountPoints, units);

  let mass: MassProperties | null = null;
  let massProblem: string | null = null;
  if (!components) massProblem = 'Complete every row of the equipment table to see the totals.';
  else if (components.length === 0) massProblem = 'Add the components of the machine to see the totals.';
  else {
    try {
      mass = massProperties(toAssemblyComponents(components));
    } catch (error) {
      massProblem = problemText(error);
    }
  }

  let loads: MountLoadsResult | null = null;
  let layoutWarnings: LayoutWarning[] = [];
  if (mass && mountPoints) ({ loads, warnings: layoutWarnings } = layoutFigures(mountPoints, mass));

  let frequencies: DisturbingLine[] | null = null;
  let frequencyProblem: string | null = null;
  const operating = parseOperating(values.operating);
  if (!operating) frequencyProblem = 'Complete the running conditions to see the disturbing frequencies.';
  else {
    try {
      frequencies = frequenciesOf(operating);
      if (frequencies.length === 0) {
        frequencies = null;
        frequencyProblem = 'Give a speed or a supply frequency to see the disturbing frequencies.';
      }
    } catch (error) {
      frequencyProblem = problemText(error);
    }
  }

  const criteria = parseCriteria(values.criteria, units);
  let targetTransmissibility: number | null = null;
  if (criteria) {
    try {
      targetTransmissibility = transmissibilityFromEfficiency(criteria.minIsolationPct);
    } catch {
      targetTransmissibility = null;
    }
  }

  return {
    components,
    mountPoints,
    mass,
    massProblem,
    loads,
    layoutWarnings,
    frequencies,
    frequencyProblem,
    governing: frequencies?.find((f) => f.governing) ?? null,
    targetTransmissibility,
    minIsolationPct: criteria?.minIsolationPct ?? null,
    sources: drawnSources(values, units),
  };
}

const SHARED_PARTS = ['components', 'mountPoints', 'mass', 'loads', 'layoutWarnings', 'frequencies', 'sources'] as const;

/**
 * Keeps the previous object for every part whose content did not change, so that drawings and
 * charts fed from an unchanged part are not redrawn while the user types elsewhere.
 */
export function shareUnchanged(previous: DesignFigures | null, next: DesignFigures): DesignFigures {
  if (!previous) return next;
  const out = { ...next } as Record<string, unknown>;
  for (const key of SHARED_PARTS) {
    if (JSON.stringify(previous[key]) === JSON.stringify(next[key])) out[key] = previous[key];
  }
  const shared = out as unknown as DesignFigures;
  shared.governing = shared.frequencies?.find((f) => f.governing) ?? null;
  return shared;
}

/**
 * The live figures, recomputed only when the form values or units change. The figures of the
 * previous values are kept in state (React's "storing information from previous renders") so
 * that unchanged parts keep their identity.
 */
export function useDesignFigures(values: DesignFormValues, units: Units): DesignFigures {
  const [last, setLast] = useState(() => ({ values, units, figures: computeDesignFigures(values, units) }));
  if (last.values === values && last.units === units) return last.figures;
  const next = { values, units, figures: shareUnchanged(last.figures, computeDesignFigures(values, units)) };
  setLast(next);
  return next.figures;
}
