import { MOUNT_TYPE_LABELS as GLOSSARY_MOUNT_TYPES, mountTypeLabel } from '@tacet/vibration';

import type { DampingModel, MountType } from '../types';

/** Mount types in words (the glossary's), in the order the filter lists them. */
export const MOUNT_TYPE_LABELS: Record<MountType, string> = GLOSSARY_MOUNT_TYPES;

export { mountTypeLabel };

export const DAMPING_MODEL_LABELS: Record<DampingModel, string> = {
  viscous: 'viscous',
  hysteretic: 'hysteretic',
};
