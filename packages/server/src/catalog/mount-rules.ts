/**
 * The rules every stored mount obeys, shared by the CSV import (row validator) and the
 * mount DTOs, so that a row the import accepts is exactly a mount the API accepts.
 */

/** Kinds of resilient mount (our own names, see catalog/FORMAT.md). */
export const MOUNT_TYPES = [
  'elastomer_pad',
  'elastomer_mount',
  'open_spring',
  'housed_spring',
  'restrained_spring',
  'air_spring',
  'wire_rope',
] as const;

export type MountType = (typeof MOUNT_TYPES)[number];

/** viscous ↔ damping ratio ζ; hysteretic (structural) ↔ loss factor η. */
export const DAMPING_MODELS = ['viscous', 'hysteretic'] as const;

export type DampingModel = (typeof DAMPING_MODELS)[number];

export const MOUNT_LIMITS = {
  supplierNameMaxLength: 120,
  partNumberMaxLength: 80,
  seriesMaxLength: 80,
  /** Dynamic-to-static stiffness ratio, inclusive. */
  dynamicStiffnessRatio: { min: 1, max: 5 },
  /** Viscous damping ratio ζ, exclusive on both ends (0 < ζ < 1: under-damped). */
  dampingRatio: { min: 0, max: 1 },
  /** Loss factor η: 0 < η ≤ 2. */
  lossFactor: { min: 0, max: 2 },
  /** Operating temperature, °C, inclusive. */
  temperatureC: { min: -80, max: 250 },
  /** Whole days, inclusive. */
  leadTimeDays: { min: 0, max: 730 },
  defaultCurrency: 'USD',
} as const;

/** Three-letter ISO 4217 code (stored upper-case). */
export const CURRENCY_PATTERN = /^[A-Za-z]{3}$/;

/** The damping model a mount is computed with. */
export const dampingModelOf = (mount: { dampingRatio: number | null }): DampingModel =>
  mount.dampingRatio !== null ? 'viscous' : 'hysteretic';

/** The values that must agree with each other (the single-field rules are checked elsewhere). */
export interface MountCrossFieldValues {
  dampingRatio: number | null;
  lossFactor: number | null;
  tempMinC: number | null;
  tempMaxC: number | null;
}

/** A broken rule between fields, named by the field it is reported on. */
export type CrossFieldRule = 'damping_missing' | 'damping_both' | 'temperature_order';

export interface CrossFieldProblem {
  field: keyof MountCrossFieldValues;
  rule: CrossFieldRule;
}

/**
 * Rules between fields: exactly one of damping ratio and loss factor; the minimum operating
 * temperature below the maximum. Each caller words the problem in its own names.
 */
export function crossFieldProblems(values: MountCrossFieldValues): CrossFieldProblem[] {
  const problems: CrossFieldProblem[] = [];
  if (values.dampingRatio === null && values.lossFactor === null) {
    problems.push({ field: 'dampingRatio', rule: 'damping_missing' });
  } else if (values.dampingRatio !== null && values.lossFactor !== null) {
    problems.push({ field: 'lossFactor', rule: 'damping_both' });
  }
  if (values.tempMinC !== null && values.tempMaxC !== null && !(values.tempMinC < values.tempMaxC)) {
    problems.push({ field: 'tempMinC', rule: 'temperature_order' });
  }
  return problems;
}
