import type { MountType } from '../mount-rules.js';
import { MountField } from './mount-fields.js';

/** A new mount. Give exactly one of dampingRatio (viscous) and lossFactor (hysteretic). */
export class CreateMountDto {
  @MountField('supplierId')
  supplierId: number;

  @MountField('partNumber')
  partNumber: string;

  @MountField('series')
  series?: string | null;

  @MountField('mountType')
  mountType: MountType;

  @MountField('ratedLoadN')
  ratedLoadN: number;

  @MountField('verticalStiffnessNPerM')
  verticalStiffnessNPerM: number;

  @MountField('horizontalStiffnessNPerM')
  horizontalStiffnessNPerM?: number | null;

  @MountField('dynamicStiffnessRatio')
  dynamicStiffnessRatio?: number;

  @MountField('dampingRatio')
  dampingRatio?: number | null;

  @MountField('lossFactor')
  lossFactor?: number | null;

  @MountField('maxDeflectionMm')
  maxDeflectionMm?: number | null;

  @MountField('tempMinC')
  tempMinC?: number | null;

  @MountField('tempMaxC')
  tempMaxC?: number | null;

  @MountField('heightMm')
  heightMm?: number | null;

  @MountField('restraintCapacityN')
  restraintCapacityN?: number | null;

  @MountField('upliftCapacityN')
  upliftCapacityN?: number | null;

  @MountField('unitPrice')
  unitPrice?: number | null;

  @MountField('currency')
  currency?: string;

  @MountField('leadTimeDays')
  leadTimeDays?: number | null;
}
