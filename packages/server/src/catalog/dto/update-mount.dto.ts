import type { MountType } from '../mount-rules.js';
import { MountField } from './mount-fields.js';

/**
 * A partial change. `null` clears an optional field. Setting dampingRatio (or lossFactor)
 * alone switches the damping model: the other one is cleared.
 */
export class UpdateMountDto {
  @MountField('supplierId', 'update')
  supplierId?: number;

  @MountField('partNumber', 'update')
  partNumber?: string;

  @MountField('series', 'update')
  series?: string | null;

  @MountField('mountType', 'update')
  mountType?: MountType;

  @MountField('ratedLoadN', 'update')
  ratedLoadN?: number;

  @MountField('verticalStiffnessNPerM', 'update')
  verticalStiffnessNPerM?: number;

  @MountField('horizontalStiffnessNPerM', 'update')
  horizontalStiffnessNPerM?: number | null;

  @MountField('dynamicStiffnessRatio', 'update')
  dynamicStiffnessRatio?: number;

  @MountField('dampingRatio', 'update')
  dampingRatio?: number | null;

  @MountField('lossFactor', 'update')
  lossFactor?: number | null;

  @MountField('maxDeflectionMm', 'update')
  maxDeflectionMm?: number | null;

  @MountField('tempMinC', 'update')
  tempMinC?: number | null;

  @MountField('tempMaxC', 'update')
  tempMaxC?: number | null;

  @MountField('heightMm', 'update')
  heightMm?: number | null;

  @MountField('unitPrice', 'update')
  unitPrice?: number | null;

  @MountField('currency', 'update')
  currency?: string;

  @MountField('leadTimeDays', 'update')
  leadTimeDays?: number | null;

  @MountField('active', 'update')
  active?: boolean;
}
