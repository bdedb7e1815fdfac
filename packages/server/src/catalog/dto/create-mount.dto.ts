import type { MountType } from '../mount-rules.js';
import { MountField } from './mount-fields.js';

/** A new mount. Give exactly one of dampingRatio (viscous) and lossFactor (hysteretic). */
export class CreateMountDto {
  @MountField('supplierId', 'create')
  supplierId: number;

  @MountField('partNumber', 'create')
  partNumber: string;

  @MountField('series', 'create')
  series?: string | null;

  @MountField('mountType', 'create')
  mountType: MountType;

  @MountField('ratedLoadN', 'create')
  ratedLoadN: number;

  @MountField('verticalStiffnessNPerM', 'create')
  verticalStiffnessNPerM: number;

  @MountField('horizontalStiffnessNPerM', 'create')
  horizontalStiffnessNPerM?: number | null;

  @MountField('dynamicStiffnessRatio', 'create')
  dynamicStiffnessRatio?: number;

  @MountField('dampingRatio', 'create')
  dampingRatio?: number | null;

  @MountField('lossFactor', 'create')
  lossFactor?: number | null;

  @MountField('maxDeflectionMm', 'create')
  maxDeflectionMm?: number | null;

  @MountField('tempMinC', 'create')
  tempMinC?: number | null;

  @MountField('tempMaxC', 'create')
  tempMaxC?: number | null;

  @MountField('heightMm', 'create')
  heightMm?: number | null;

  @MountField('unitPrice', 'create')
  unitPrice?: number | null;

  @MountField('currency', 'create')
  currency?: string;

  @MountField('leadTimeDays', 'create')
  leadTimeDays?: number | null;
}
