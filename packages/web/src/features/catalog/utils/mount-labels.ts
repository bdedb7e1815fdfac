import type { DampingModel, MountType } from '../types';

/** Mount types in words, in the order the filter lists them. */
export const MOUNT_TYPE_LABELS: Record<MountType, string> = {
  elastomer_pad: 'Elastomer pad',
  elastomer_mount: 'Elastomer mount',
  open_spring: 'Open spring',
  housed_spring: 'Housed spring',
  restrained_spring: 'Restrained spring',
  air_spring: 'Air spring',
  wire_rope: 'Wire rope',
};

export function mountTypeLabel(type: string): string {
  return (MOUNT_TYPE_LABELS as Record<string, string>)[type] ?? type.replace(/_/g, ' ');
}

export const DAMPING_MODEL_LABELS: Record<DampingModel, string> = {
  viscous: 'viscous',
  hysteretic: 'hysteretic',
};
