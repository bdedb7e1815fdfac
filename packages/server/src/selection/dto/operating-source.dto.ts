import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  IsDefined,
  IsIn,
  IsNotEmpty,
  IsOptional,
  IsPositive,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { measure } from '../../common/units/reader-words.js';
import { IsAbove, IsFiniteNumber, OnlyWhen } from './validators.js';

/**
 * An operating source of the whole-machine model and the drive's skip bands
 * (docs/engineering/forcing.md §7). The DTO checks each field; what depends on the rest of
 * the operating conditions (an unbalance needs a speed) is checked when the sources are resolved.
 */
export const SOURCE_KINDS = ['unbalance', 'force'] as const;
export type SourceKind = (typeof SOURCE_KINDS)[number];
export const SOURCE_AXES = ['x', 'y', 'z'] as const;
export type SourceAxis = (typeof SOURCE_AXES)[number];

/** |coordinate| in m (as the machine's points). */
const COORDINATE = 1000;
const LABEL_LENGTH = 40;

export class SourcePointDto {
  @ApiProperty({ example: 0.65, description: 'm, along the skid' })
  @IsFiniteNumber({ message: 'The position along the skid must be a number in metres' })
  @Min(-COORDINATE, { message: `The position must lie within ${measure('position', COORDINATE)} of the origin` })
  @Max(COORDINATE, { message: `The position must lie within ${measure('position', COORDINATE)} of the origin` })
  x: number;

  @ApiProperty({ example: 0, description: 'm, lateral' })
  @IsFiniteNumber({ message: 'The lateral position must be a number in metres' })
  @Min(-COORDINATE, { message: `The position must lie within ${measure('position', COORDINATE)} of the origin` })
  @Max(COORDINATE, { message: `The position must lie within ${measure('position', COORDINATE)} of the origin` })
  y: number;

  @ApiProperty({ example: 0.5, description: 'm, up' })
  @IsFiniteNumber({ message: 'The height must be a number in metres' })
  @Min(-COORDINATE, { message: `The position must lie within ${measure('position', COORDINATE)} of the origin` })
  @Max(COORDINATE, { message: `The position must lie within ${measure('position', COORDINATE)} of the origin` })
  z: number;
}

export class OperatingSourceDto {
  @ApiProperty({ example: 'Impeller', maxLength: LABEL_LENGTH })
  @IsString({ message: 'Each source needs a name' })
  @IsNotEmpty({ message: 'Each source needs a name' })
  @MaxLength(LABEL_LENGTH, { message: `A source name has at most ${LABEL_LENGTH} characters` })
  label: string;

  @ApiProperty({
    enum: SOURCE_KINDS,
    enumName: 'SourceKind',
    description: 'unbalance: m_r·e·ω² rotating in the plane normal to the axis; force: a harmonic force along the axis',
  })
  @IsIn(SOURCE_KINDS, { message: 'The kind of source must be an unbalance or a force' })
  kind: SourceKind;

  @ApiProperty({ type: SourcePointDto, description: 'where the force acts, m (same axes as the components)' })
  @IsDefined({ message: 'Say where the source acts' })
  @ValidateNested()
  @Type(() => SourcePointDto)
  at: SourcePointDto;

  @ApiProperty({ enum: SOURCE_AXES, enumName: 'SourceAxis', description: 'shaft axis of an unbalance; direction of a force' })
  @IsIn(SOURCE_AXES, { message: 'The axis must be along the skid (x), lateral (y) or vertical (z)' })
  axis: SourceAxis;

  @ApiPropertyOptional({ example: 1, default: 1, description: 'multiple of the shaft speed the source turns or acts at' })
  @IsOptional()
  @IsFiniteNumber({ message: 'The order must be a number' })
  @IsPositive({ message: 'The order must be greater than zero' })
  @Max(100, { message: 'The order is at most 100' })
  order?: number;

  @ApiPropertyOptional({ example: 45, description: 'kg, the rotor of an unbalance (required for an unbalance)' })
  @ValidateIf((source: OperatingSourceDto) => source.kind === 'unbalance' || source.rotorMassKg !== undefined)
  @IsDefined({ message: 'An unbalance needs the mass of its rotor' })
  @OnlyWhen('kind', ['unbalance'], { message: 'Only an unbalance has a rotor mass' })
  @IsFiniteNumber({ message: 'The rotor mass must be a number in kg' })
  @IsPositive({ message: 'The rotor mass must be greater than zero' })
  @Max(1e7, { message: `The rotor mass is at most ${measure('mass', 1e7)}` })
  rotorMassKg?: number;

  @ApiPropertyOptional({ example: 6.3, default: 6.3, description: 'mm/s, balance grade G = e·Ω (ISO 21940-11); unbalance only' })
  @IsOptional()
  @OnlyWhen('kind', ['unbalance'], { message: 'Only an unbalance has a balance grade' })
  @IsFiniteNumber({ message: 'The balance grade must be a number in mm/s' })
  @IsPositive({ message: 'The balance grade must be greater than zero' })
  @Max(4000, { message: 'The balance grade is at most 4000 mm/s' })
  balanceGradeMmPerS?: number;

  @ApiPropertyOptional({ example: 800, description: 'N, peak amplitude of a force (required for a force)' })
  @ValidateIf((source: OperatingSourceDto) => source.kind === 'force' || source.amplitudeN !== undefined)
  @IsDefined({ message: 'A force needs its amplitude' })
  @OnlyWhen('kind', ['force'], { message: 'Only a force has an amplitude; an unbalance follows from its rotor mass and balance grade' })
  @IsFiniteNumber({ message: 'The amplitude must be a number in N' })
  @IsPositive({ message: 'The amplitude must be greater than zero' })
  @Max(1e8, { message: `The amplitude is at most ${measure('force', 1e8)}` })
  amplitudeN?: number;

  @ApiPropertyOptional({ example: 100, description: 'Hz, a force at a fixed frequency (e.g. twice the supply) instead of an order' })
  @IsOptional()
  @OnlyWhen('kind', ['force'], { message: 'An unbalance turns with the shaft: give an order, not a frequency' })
  @IsFiniteNumber({ message: 'The frequency must be a number in Hz' })
  @IsPositive({ message: 'The frequency must be greater than zero' })
  @Max(1e5, { message: 'The frequency is at most 100 kHz' })
  frequencyHz?: number;
}

export class SkipBandDto {
  @ApiProperty({ example: 1100, description: 'rpm' })
  @IsFiniteNumber({ message: 'The lower end of a skip band must be a number in rpm' })
  @IsPositive({ message: 'The lower end of a skip band must be greater than zero' })
  @Max(1e6, { message: 'A skip band ends below 1,000,000 rpm' })
  min: number;

  @ApiProperty({ example: 1180, description: 'rpm' })
  @IsFiniteNumber({ message: 'The upper end of a skip band must be a number in rpm' })
  @IsPositive({ message: 'The upper end of a skip band must be greater than zero' })
  @Max(1e6, { message: 'A skip band ends below 1,000,000 rpm' })
  @IsAbove('min', false, { message: 'The upper end of a skip band must be above its lower end' })
  max: number;
}
