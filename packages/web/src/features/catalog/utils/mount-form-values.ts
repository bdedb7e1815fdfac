import type { Quantity } from '@tacet/vibration';

import type { Units } from '@/lib/units';

import type { MountFormValues } from '../schemas/mount-schema';
import type { Mount, MountChanges, MountInput } from '../types';

/** An SI value as the form shows it: user units, six significant digits, no trailing zeros. */
function shown(units: Units, quantity: Quantity, si: number | null | undefined): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return '';
  return String(Number(units.toDisplay(quantity, si).toPrecision(6)));
}

function plain(value: number | null | undefined): string {
  return value === null || value === undefined ? '' : String(value);
}

export const EMPTY_MOUNT_FORM: MountFormValues = {
  supplierId: '',
  partNumber: '',
  series: '',
  mountType: '',
  ratedLoad: '',
  verticalStiffness: '',
  horizontalStiffness: '',
  dynamicStiffnessRatio: '',
  dampingModel: 'viscous',
  damping: '',
  maxDeflection: '',
  tempMin: '',
  tempMax: '',
  height: '',
  restraintCapacity: '',
  upliftCapacity: '',
  unitPrice: '',
  currency: 'USD',
  leadTimeDays: '',
};

export function mountToFormValues(mount: Mount, units: Units): MountFormValues {
  const viscous = mount.dampingRatio !== null;
  return {
    supplierId: String(mount.supplier.id),
    partNumber: mount.partNumber,
    series: mount.series ?? '',
    mountType: mount.mountType,
    ratedLoad: shown(units, 'force', mount.ratedLoadN),
    verticalStiffness: shown(units, 'stiffness', mount.verticalStiffnessNPerM),
    horizontalStiffness: shown(units, 'stiffness', mount.horizontalStiffnessNPerM),
    dynamicStiffnessRatio: plain(mount.dynamicStiffnessRatio),
    dampingModel: viscous ? 'viscous' : 'hysteretic',
    damping: plain(viscous ? mount.dampingRatio : mount.lossFactor),
    maxDeflection: shown(units, 'deflection', mount.maxDeflectionMm === null ? null : mount.maxDeflectionMm / 1000),
    tempMin: shown(units, 'temperature', mount.tempMinC),
    tempMax: shown(units, 'temperature', mount.tempMaxC),
    height: shown(units, 'deflection', mount.heightMm === null ? null : mount.heightMm / 1000),
    restraintCapacity: shown(units, 'force', mount.restraintCapacityN),
    upliftCapacity: shown(units, 'force', mount.upliftCapacityN),
    unitPrice: plain(mount.unitPrice),
    currency: mount.currency,
    leadTimeDays: plain(mount.leadTimeDays),
  };
}

function num(text: string): number | null {
  const trimmed = text.trim();
  return trimmed === '' ? null : Number(trimmed);
}

function si(units: Units, quantity: Quantity, text: string): number | null {
  const value = num(text);
  return value === null ? null : units.toSi(quantity, value);
}

function mm(units: Units, text: string): number | null {
  const metres = si(units, 'deflection', text);
  return metres === null ? null : metres * 1000;
}

/** The whole form as the body of `POST /api/mounts` (SI; empty optional boxes left out). */
export function formValuesToInput(values: MountFormValues, units: Units): MountInput {
  const viscous = values.dampingModel === 'viscous';
  const damping = num(values.damping);
  const input: MountInput = {
    supplierId: Number(values.supplierId),
    partNumber: values.partNumber.trim(),
    mountType: values.mountType as MountInput['mountType'],
    ratedLoadN: si(units, 'force', values.ratedLoad) as number,
    verticalStiffnessNPerM: si(units, 'stiffness', values.verticalStiffness) as number,
    currency: values.currency.trim().toUpperCase(),
  };
  if (viscous) input.dampingRatio = damping;
  else input.lossFactor = damping;
  const series = values.series.trim();
  if (series) input.series = series;
  const optional: Array<[keyof MountInput, number | null]> = [
    ['horizontalStiffnessNPerM', si(units, 'stiffness', values.horizontalStiffness)],
    ['dynamicStiffnessRatio', num(values.dynamicStiffnessRatio)],
    ['maxDeflectionMm', mm(units, values.maxDeflection)],
    ['tempMinC', si(units, 'temperature', values.tempMin)],
    ['tempMaxC', si(units, 'temperature', values.tempMax)],
    ['heightMm', mm(units, values.height)],
    ['restraintCapacityN', si(units, 'force', values.restraintCapacity)],
    ['upliftCapacityN', si(units, 'force', values.upliftCapacity)],
    ['unitPrice', num(values.unitPrice)],
    ['leadTimeDays', num(values.leadTimeDays)],
  ];
  for (const [key, value] of optional) {
    if (value !== null) (input as unknown as Record<string, number>)[key] = value;
  }
  return input;
}

/**
 * Only what the user changed, as the body of `PATCH /api/mounts/:id`. A box emptied sends
 * null; unchanged boxes are not sent, so a value shown rounded is never rewritten.
 */
export function formValuesToChanges(values: MountFormValues, initial: MountFormValues, units: Units): MountChanges {
  const changes: MountChanges = {};
  const changed = (key: keyof MountFormValues) => values[key].trim() !== initial[key].trim();
  if (changed('supplierId')) changes.supplierId = Number(values.supplierId);
  if (changed('partNumber')) changes.partNumber = values.partNumber.trim();
  if (changed('series')) changes.series = values.series.trim() || null;
  if (changed('mountType')) changes.mountType = values.mountType as MountInput['mountType'];
  if (changed('ratedLoad')) changes.ratedLoadN = si(units, 'force', values.ratedLoad) as number;
  if (changed('verticalStiffness')) changes.verticalStiffnessNPerM = si(units, 'stiffness', values.verticalStiffness) as number;
  if (changed('horizontalStiffness')) changes.horizontalStiffnessNPerM = si(units, 'stiffness', values.horizontalStiffness);
  if (changed('dynamicStiffnessRatio')) changes.dynamicStiffnessRatio = num(values.dynamicStiffnessRatio);
  if (changed('dampingModel') || changed('damping')) {
    const damping = num(values.damping);
    changes.dampingRatio = values.dampingModel === 'viscous' ? damping : null;
    changes.lossFactor = values.dampingModel === 'hysteretic' ? damping : null;
  }
  if (changed('maxDeflection')) changes.maxDeflectionMm = mm(units, values.maxDeflection);
  if (changed('tempMin')) changes.tempMinC = si(units, 'temperature', values.tempMin);
  if (changed('tempMax')) changes.tempMaxC = si(units, 'temperature', values.tempMax);
  if (changed('height')) changes.heightMm = mm(units, values.height);
  if (changed('restraintCapacity')) changes.restraintCapacityN = si(units, 'force', values.restraintCapacity);
  if (changed('upliftCapacity')) changes.upliftCapacityN = si(units, 'force', values.upliftCapacity);
  if (changed('unitPrice')) changes.unitPrice = num(values.unitPrice);
  if (changed('currency')) changes.currency = values.currency.trim().toUpperCase();
  if (changed('leadTimeDays')) changes.leadTimeDays = num(values.leadTimeDays);
  return changes;
}
