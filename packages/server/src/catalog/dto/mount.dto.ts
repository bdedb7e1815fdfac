import { ApiProperty } from '@nestjs/swagger';
import type { Mount } from '../mount.entity.js';
import { DAMPING_MODELS, MOUNT_TYPES, dampingModelOf, type DampingModel, type MountType } from '../mount-rules.js';

export class MountSupplierDto {
  @ApiProperty({ example: 3 })
  id: number;

  @ApiProperty({ example: 'Quillmere Isolation' })
  name: string;
}

const nullableNumber = (description: string) => ApiProperty({ type: Number, nullable: true, description });

/** A catalog mount. SI units except where the name carries the unit. */
export class MountDto {
  @ApiProperty({ example: 42 })
  id: number;

  @ApiProperty({ type: MountSupplierDto })
  supplier: MountSupplierDto;

  @ApiProperty({ example: 'QM-S1-02400' })
  partNumber: string;

  @ApiProperty({ type: String, nullable: true, example: 'S1' })
  series: string | null;

  @ApiProperty({ enum: MOUNT_TYPES, enumName: 'MountType' })
  mountType: MountType;

  @ApiProperty({ description: 'Rated static load, N', example: 2400 })
  ratedLoadN: number;

  @ApiProperty({ description: 'Vertical static stiffness, N/m', example: 72500 })
  verticalStiffnessNPerM: number;

  @nullableNumber('Horizontal static stiffness, N/m')
  horizontalStiffnessNPerM: number | null;

  @nullableNumber('Dynamic-to-static stiffness ratio (null: the supplier gives none)')
  dynamicStiffnessRatio: number | null;

  @ApiProperty({ enum: DAMPING_MODELS, enumName: 'DampingModel', description: 'viscous ↔ dampingRatio, hysteretic ↔ lossFactor' })
  dampingModel: DampingModel;

  @nullableNumber('Viscous damping ratio ζ (viscous model only)')
  dampingRatio: number | null;

  @nullableNumber('Loss factor η (hysteretic model only)')
  lossFactor: number | null;

  @nullableNumber('Maximum static deflection, mm')
  maxDeflectionMm: number | null;

  @nullableNumber('Lowest operating temperature, °C')
  tempMinC: number | null;

  @nullableNumber('Highest operating temperature, °C')
  tempMaxC: number | null;

  @nullableNumber('Free height, mm')
  heightMm: number | null;

  @nullableNumber('Horizontal restraint rating (strength level), N; null where the supplier gives none')
  restraintCapacityN: number | null;

  @nullableNumber('Uplift rating (strength level), N; null where the supplier gives none')
  upliftCapacityN: number | null;

  @nullableNumber('Price of one mount in `currency`')
  unitPrice: number | null;

  @ApiProperty({ example: 'USD' })
  currency: string;

  @nullableNumber('Lead time, days')
  leadTimeDays: number | null;

  @ApiProperty({ description: 'false: retired (hidden from selection)' })
  active: boolean;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: String, format: 'date-time' })
  updatedAt: string;

  /** `mount.supplier` must be loaded. */
  static from(mount: Mount): MountDto {
    return Object.assign(new MountDto(), {
      id: mount.id,
      supplier: { id: mount.supplier.id, name: mount.supplier.name },
      partNumber: mount.partNumber,
      series: mount.series,
      mountType: mount.mountType,
      ratedLoadN: mount.ratedLoadN,
      verticalStiffnessNPerM: mount.verticalStiffnessNPerM,
      horizontalStiffnessNPerM: mount.horizontalStiffnessNPerM,
      dynamicStiffnessRatio: mount.dynamicStiffnessRatio,
      dampingModel: dampingModelOf(mount),
      dampingRatio: mount.dampingRatio,
      lossFactor: mount.lossFactor,
      maxDeflectionMm: mount.maxDeflectionMm,
      tempMinC: mount.tempMinC,
      tempMaxC: mount.tempMaxC,
      heightMm: mount.heightMm,
      restraintCapacityN: mount.restraintCapacityN,
      upliftCapacityN: mount.upliftCapacityN,
      unitPrice: mount.unitPrice,
      currency: mount.currency,
      leadTimeDays: mount.leadTimeDays,
      active: mount.active,
      createdAt: mount.createdAt.toISOString(),
      updatedAt: mount.updatedAt.toISOString(),
    });
  }
}

export class MountPageDto {
  @ApiProperty({ type: [MountDto] })
  items: MountDto[];

  @ApiProperty({ description: 'Mounts matching the filters (all pages)', example: 137 })
  total: number;
}
