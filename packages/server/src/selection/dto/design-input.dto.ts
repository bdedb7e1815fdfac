import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsDefined,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsObject,
  IsOptional,
  IsPositive,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { measure } from '../../common/units/reader-words.js';
import { MOUNT_TYPES, type MountType } from '../../catalog/mount-rules.js';
import { RestraintInputDto } from './restraint.dto.js';
import { OperatingSourceDto, SkipBandDto } from './operating-source.dto.js';
import { IsAbove, IsEven, IsFiniteNumber, NotTogetherWith } from './validators.js';

/**
 * The engineering input of a selection and of a saved design (SI: kg, m, Hz, °C). These DTOs
 * are the server's final say on what is acceptable; the calculation library checks the rest
 * (e.g. collinear mount points) and its errors come back as 400 with the field named.
 */
export const SELECTION_LIMITS = {
  components: 200,
  mountPoints: { min: 3, max: 64 },
  frequencies: 50,
  orders: 10,
  extraFrequencies: 20,
  labelLength: 40,
  componentNameLength: 100,
  /** |coordinate| in m. */
  coordinate: 1000,
  massKg: 1e7,
  frequencyHz: 1e5,
  speedRpm: 1e6,
  vaneCount: 200,
  /** The highest utilisation window end: a mount is never loaded beyond its rating (docs/engineering/selection.md §17). */
  utilization: 1,
  /** Support stiffness under a mount point, N/mm. */
  supportStiffnessNPerMm: 1e9,
  /** Operating sources of the whole-machine model (docs/engineering/whole-machine.md). */
  sources: 12,
  skipBands: 10,
  /** Forces and rotor masses: N, kg. */
  amplitudeN: 1e8,
  motorPoles: 64,
  limit: { default: 20, max: 200 },
} as const;

const COORDINATE = SELECTION_LIMITS.coordinate;

export class Vec3Dto {
  @ApiProperty({ example: 0.06, description: 'm, along the skid' })
  @IsFiniteNumber()
  @Min(-COORDINATE)
  @Max(COORDINATE)
  x: number;

  @ApiProperty({ example: 0.015, description: 'm, lateral' })
  @IsFiniteNumber()
  @Min(-COORDINATE)
  @Max(COORDINATE)
  y: number;

  @ApiProperty({ example: 0.3775, description: 'm, up' })
  @IsFiniteNumber()
  @Min(-COORDINATE)
  @Max(COORDINATE)
  z: number;
}

export class BoxDto {
  @ApiProperty({ example: 1.2, description: 'm' })
  @IsFiniteNumber()
  @Min(0)
  @Max(COORDINATE)
  lx: number;

  @ApiProperty({ example: 0.6, description: 'm' })
  @IsFiniteNumber()
  @Min(0)
  @Max(COORDINATE)
  ly: number;

  @ApiProperty({ example: 0.5, description: 'm' })
  @IsFiniteNumber()
  @Min(0)
  @Max(COORDINATE)
  lz: number;
}

/**
 * Own inertia about the component's CG [kg·m²]. Products of inertia follow the tensor
 * convention of @tacet/vibration (ixy = −∫x·y dm).
 */
export class InertiaDto {
  @ApiProperty({ example: 12.5 })
  @IsFiniteNumber()
  @Min(0)
  ixx: number;

  @ApiProperty({ example: 40 })
  @IsFiniteNumber()
  @Min(0)
  iyy: number;

  @ApiProperty({ example: 38 })
  @IsFiniteNumber()
  @Min(0)
  izz: number;

  @ApiPropertyOptional({ example: 0 })
  @IsOptional()
  @IsFiniteNumber()
  ixy?: number;

  @ApiPropertyOptional({ example: 0 })
  @IsOptional()
  @IsFiniteNumber()
  ixz?: number;

  @ApiPropertyOptional({ example: 0 })
  @IsOptional()
  @IsFiniteNumber()
  iyz?: number;
}

export class ComponentDto {
  @ApiProperty({ example: 'Pump', maxLength: SELECTION_LIMITS.componentNameLength })
  @IsString()
  @IsNotEmpty()
  @MaxLength(SELECTION_LIMITS.componentNameLength)
  name: string;

  @ApiProperty({ example: 300, description: 'operating mass, kg (> 0)' })
  @IsFiniteNumber()
  @IsPositive()
  @Max(SELECTION_LIMITS.massKg)
  massKg: number;

  @ApiProperty({ type: Vec3Dto, description: 'centre of gravity, m' })
  @IsDefined()
  @ValidateNested()
  @Type(() => Vec3Dto)
  cg: Vec3Dto;

  @ApiPropertyOptional({
    example: 240,
    description:
      'a second operating mass of the component, kg (e.g. drained, or without its liquid); the verdict covers both mass cases, ' +
      'with the CG of the assembly moving accordingly (the component keeps its own CG and shape)',
  })
  @IsOptional()
  @IsFiniteNumber()
  @IsPositive({ message: `altMassKg must be a mass above ${measure('mass', 0)} (leave it out when the component has one mass)` })
  @Max(SELECTION_LIMITS.massKg)
  altMassKg?: number;

  @ApiPropertyOptional({ type: BoxDto, description: 'uniform box dimensions for its own inertia, m' })
  @IsOptional()
  @ValidateNested()
  @Type(() => BoxDto)
  box?: BoxDto;

  @ApiPropertyOptional({ type: InertiaDto, description: 'own inertia about its CG, kg·m² (wins over box)' })
  @IsOptional()
  @ValidateNested()
  @Type(() => InertiaDto)
  inertia?: InertiaDto;
}

export class MountPointDto {
  @ApiProperty({ example: 'A', maxLength: SELECTION_LIMITS.labelLength })
  @IsString()
  @IsNotEmpty()
  @MaxLength(SELECTION_LIMITS.labelLength)
  label: string;

  @ApiProperty({ example: 0.8, description: 'm' })
  @IsFiniteNumber()
  @Min(-COORDINATE)
  @Max(COORDINATE)
  x: number;

  @ApiProperty({ example: 0.45, description: 'm' })
  @IsFiniteNumber()
  @Min(-COORDINATE)
  @Max(COORDINATE)
  y: number;

  @ApiProperty({ example: 0, description: 'm, height of the mount elastic centre' })
  @IsFiniteNumber()
  @Min(-COORDINATE)
  @Max(COORDINATE)
  z: number;

  @ApiPropertyOptional({
    example: 5000,
    description:
      'vertical stiffness of the support under the point (floor, steel), N/mm, in series with the mount; absent: rigid. ' +
      'Less than about 10× the mount stiffness gets a warning (rule of thumb)',
  })
  @IsOptional()
  @IsFiniteNumber()
  @IsPositive({ message: `supportStiffnessNPerMm must be a stiffness above ${measure('stiffness', 0)} (leave it out for a rigid support)` })
  @Max(SELECTION_LIMITS.supportStiffnessNPerMm)
  supportStiffnessNPerMm?: number;
}

export class SpeedRangeDto {
  @ApiProperty({ example: 900, description: 'rpm; governs 1×' })
  @IsFiniteNumber()
  @IsPositive()
  @Max(SELECTION_LIMITS.speedRpm)
  min: number;

  @ApiProperty({ example: 1480, description: 'rpm' })
  @IsFiniteNumber()
  @IsPositive()
  @Max(SELECTION_LIMITS.speedRpm)
  @IsAbove('min', true)
  max: number;
}

export class OperatingConditionsDto {
  @ApiPropertyOptional({ example: 1480, description: 'fixed speed, rpm' })
  @IsOptional()
  @IsFiniteNumber()
  @IsPositive()
  @Max(SELECTION_LIMITS.speedRpm)
  speedRpm?: number;

  @ApiPropertyOptional({ type: SpeedRangeDto, description: 'variable-speed drive, rpm (instead of speedRpm)' })
  @IsOptional()
  @NotTogetherWith('speedRpm')
  @ValidateNested()
  @Type(() => SpeedRangeDto)
  speedRangeRpm?: SpeedRangeDto;

  @ApiProperty({ type: [Number], example: [1, 2], description: 'shaft orders' })
  @IsArray()
  @ArrayMaxSize(SELECTION_LIMITS.orders)
  @IsFiniteNumber({ each: true })
  @IsPositive({ each: true })
  @Max(100, { each: true })
  orders: number[];

  @ApiPropertyOptional({ example: 6, description: 'pump vanes / fan blades → pass frequency' })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(SELECTION_LIMITS.vaneCount)
  vaneCount?: number;

  @ApiPropertyOptional({ example: 50, description: 'supply frequency, Hz → 2× line' })
  @IsOptional()
  @IsFiniteNumber()
  @IsPositive()
  @Max(1000)
  lineFrequencyHz?: number;

  @ApiPropertyOptional({ type: [Number], example: [], description: 'further disturbing frequencies, Hz' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(SELECTION_LIMITS.extraFrequencies)
  @IsFiniteNumber({ each: true })
  @IsPositive({ each: true })
  @Max(SELECTION_LIMITS.frequencyHz, { each: true })
  extraFrequenciesHz?: number[];

  @ApiPropertyOptional({
    type: [OperatingSourceDto],
    description:
      'where the forces act (whole-machine model); absent or empty: a vertical force through the CG at every disturbing frequency',
  })
  @IsOptional()
  @IsArray({ message: 'The sources must be a list' })
  @ArrayMaxSize(SELECTION_LIMITS.sources, { message: `At most ${SELECTION_LIMITS.sources} sources` })
  @ArrayUnique((source: OperatingSourceDto) => source?.label, { message: 'Each source needs its own label' })
  @IsObject({ each: true, message: 'Each source must be given by its fields (label, kind, where it acts, direction)' })
  @ValidateNested({ each: true })
  @Type(() => OperatingSourceDto)
  sources?: OperatingSourceDto[];

  @ApiPropertyOptional({ type: [SkipBandDto], description: 'speed bands the drive skips, rpm (with a speed range only)' })
  @IsOptional()
  @IsArray({ message: 'The skip bands must be a list' })
  @ArrayMaxSize(SELECTION_LIMITS.skipBands, { message: `At most ${SELECTION_LIMITS.skipBands} skip bands` })
  @IsObject({ each: true, message: 'Each skip band must be given by its lowest and highest speed' })
  @ValidateNested({ each: true })
  @Type(() => SkipBandDto)
  skipBandsRpm?: SkipBandDto[];

  @ApiPropertyOptional({
    example: 4,
    description:
      "motor poles on a drive: the motor's magnetic force follows the speed (2·poles·n/120 Hz) instead of twice the supply frequency",
  })
  @IsOptional()
  @IsInt({ message: 'The number of motor poles must be a whole number' })
  @Min(2, { message: 'A motor has at least 2 poles' })
  @Max(SELECTION_LIMITS.motorPoles, { message: `At most ${SELECTION_LIMITS.motorPoles} motor poles` })
  @IsEven({ message: 'The number of motor poles must be even' })
  motorPoles?: number;
}

export class CriteriaDto {
  @ApiProperty({ example: 90, description: 'minimum isolation efficiency at every disturbing frequency, % (0 < x < 100)' })
  @IsFiniteNumber()
  @IsPositive()
  @Max(99.9)
  minIsolationPct: number;

  @ApiProperty({ example: 0.5, description: 'lowest load / rated load at any point (0 < min < max)' })
  @IsFiniteNumber()
  @IsPositive()
  @Max(SELECTION_LIMITS.utilization)
  minUtilization: number;

  @ApiProperty({
    example: 1.0,
    description: `highest load / rated load at any point (≤ ${SELECTION_LIMITS.utilization}: never above the rating)`,
  })
  @IsFiniteNumber()
  @IsPositive()
  @Max(SELECTION_LIMITS.utilization, {
    message: `maxUtilization must be at most ${SELECTION_LIMITS.utilization}: a mount may not be loaded beyond its rated load (use weightMarginPct for uncertain weights)`,
  })
  @IsAbove('minUtilization')
  maxUtilization: number;

  @ApiPropertyOptional({ example: 25, description: '°C; mounts whose range does not cover it are left out' })
  @IsOptional()
  @IsFiniteNumber()
  @Min(-100)
  @Max(400)
  ambientTempC?: number;

  @ApiPropertyOptional({ enum: MOUNT_TYPES, enumName: 'MountType', isArray: true })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(MOUNT_TYPES.length)
  @IsIn(MOUNT_TYPES, { each: true })
  mountTypes?: MountType[];

  @ApiPropertyOptional({ type: [Number] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(200)
  @IsInt({ each: true })
  @IsPositive({ each: true })
  supplierIds?: number[];

  @ApiPropertyOptional({
    example: 10,
    description: 'allowance on the weight, %: the overload checks add it, the light case of springs takes it off (default 10)',
  })
  @IsOptional()
  @IsFiniteNumber()
  @Min(0)
  @Max(100)
  weightMarginPct?: number;

  @ApiPropertyOptional({
    example: 15,
    description:
      'stiffness tolerance of the catalog figures, ± %; the verdict is the worst over the band (default by mount type, docs/engineering/selection.md §20)',
  })
  @IsOptional()
  @IsFiniteNumber({ message: 'The stiffness tolerance must be a number' })
  @Min(0, { message: 'The stiffness tolerance cannot be negative' })
  @Max(50, { message: 'The stiffness tolerance is at most 50 %' })
  stiffnessTolerancePct?: number;

  @ApiPropertyOptional({
    example: 6,
    description:
      'largest steady peak motion at the mounts when start-up or coast-down passes a rigid-body mode below the running range, mm ' +
      '(default 6 mm, or the gap to the restraints when smaller; docs/engineering/start-up-passage.md §3)',
  })
  @IsOptional()
  @IsFiniteNumber({ message: 'The largest motion on start-up must be a number of millimetres' })
  @IsPositive({ message: `The largest motion on start-up must be more than ${measure('deflection', 0)}` })
  @Max(1000, { message: `The largest motion on start-up must be at most ${measure('deflection', 1)}` })
  maxResonantMotionMm?: number;
}

const uniqueLabel = (point: MountPointDto) => point?.label;

export class DesignInputDto {
  @ApiProperty({ type: [ComponentDto] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(SELECTION_LIMITS.components)
  @ValidateNested({ each: true })
  @Type(() => ComponentDto)
  components: ComponentDto[];

  @ApiProperty({ type: [MountPointDto] })
  @IsArray()
  @ArrayMinSize(SELECTION_LIMITS.mountPoints.min)
  @ArrayMaxSize(SELECTION_LIMITS.mountPoints.max)
  @ArrayUnique(uniqueLabel, { message: 'mountPoints must have unique labels' })
  @ValidateNested({ each: true })
  @Type(() => MountPointDto)
  mountPoints: MountPointDto[];

  @ApiProperty({ type: OperatingConditionsDto })
  @IsDefined()
  @ValidateNested()
  @Type(() => OperatingConditionsDto)
  operating: OperatingConditionsDto;

  @ApiProperty({ type: CriteriaDto })
  @IsDefined()
  @ValidateNested()
  @Type(() => CriteriaDto)
  criteria: CriteriaDto;

  @ApiPropertyOptional({ type: RestraintInputDto, description: 'seismic restraint (ASCE 7-16 §13.3.1); absent: not checked' })
  @IsOptional()
  @ValidateNested()
  @Type(() => RestraintInputDto)
  restraint?: RestraintInputDto;
}

/** The plain shapes (as stored in a design and sent by clients). */
export type Vec3 = { x: number; y: number; z: number };
export type Component = Omit<ComponentDto, never>;
export type MountPoint = Omit<MountPointDto, never>;
export type Criteria = Omit<CriteriaDto, never>;
export type OperatingConditions = Omit<OperatingConditionsDto, never>;
export type OperatingSource = Omit<OperatingSourceDto, never>;
export type SkipBand = Omit<SkipBandDto, never>;
export type DesignInput = Omit<DesignInputDto, never>;
