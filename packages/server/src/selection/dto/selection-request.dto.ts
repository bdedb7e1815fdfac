import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsDefined,
  IsInt,
  IsOptional,
  IsPositive,
  IsString,
  Max,
  ValidateIf,
  Min,
  ValidateNested,
} from 'class-validator';
import { ComponentDto, CriteriaDto, MountPointDto, OperatingConditionsDto, SELECTION_LIMITS } from './design-input.dto.js';
import { RestraintInputDto } from './restraint.dto.js';
import { MAX_ID } from '../../common/ids.js';
import { IsFiniteNumber, NotTogetherWith } from './validators.js';

/** `limit`: passing candidates returned (and up to as many failing ones). */
export class SelectionLimitDto {
  @ApiPropertyOptional({ example: 20, default: SELECTION_LIMITS.limit.default, maximum: SELECTION_LIMITS.limit.max })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(SELECTION_LIMITS.limit.max)
  limit?: number;
}

/** Body of the stateless `POST /api/selection`. */
export class SelectionRequestDto extends SelectionLimitDto {
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
  @ArrayUnique((point: MountPointDto) => point?.label, { message: 'mountPoints must have unique labels' })
  @ValidateNested({ each: true })
  @Type(() => MountPointDto)
  mountPoints: MountPointDto[];

  @ApiPropertyOptional({
    type: [Number],
    example: [24.67, 49.33, 100],
    description: 'Hz, each > 0: a vertical force through the CG at each (give this or operating)',
  })
  @ValidateIf((body: SelectionRequestDto) => body.operating === undefined || body.disturbingFrequenciesHz !== undefined)
  @IsDefined({ message: 'Give the operating conditions or the disturbing frequencies' })
  @NotTogetherWith('operating', { message: 'Give either the operating conditions or the disturbing frequencies, not both' })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(SELECTION_LIMITS.frequencies)
  @IsFiniteNumber({ each: true })
  @IsPositive({ each: true })
  @Max(SELECTION_LIMITS.frequencyHz, { each: true })
  disturbingFrequenciesHz?: number[];

  @ApiPropertyOptional({
    type: OperatingConditionsDto,
    description:
      "the machine's operating conditions, as in a design (sources, speed range, skip bands); instead of disturbingFrequenciesHz",
  })
  @IsOptional()
  @ValidateNested()
  @Type(() => OperatingConditionsDto)
  operating?: OperatingConditionsDto;

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

/** Body of `POST /api/selection/curves`: a selection request and the candidate to draw. */
export class SelectionCurvesRequestDto extends SelectionRequestDto {
  @ApiPropertyOptional({ example: 12, description: 'the uniform candidate of this mount (give this or seriesId)' })
  @ValidateIf((body: SelectionCurvesRequestDto) => body.seriesId === undefined || body.mountId !== undefined)
  @IsDefined({ message: 'Say which candidate to draw: a mount or a series' })
  @NotTogetherWith('seriesId', { message: 'Give either a mount or a series, not both' })
  @IsInt({ message: 'The mount must be given by its number' })
  @IsPositive({ message: 'The mount must be given by its number' })
  @Max(MAX_ID, { message: 'There is no mount with that number' })
  mountId?: number;

  @ApiPropertyOptional({ example: '3:LV', description: 'the series candidate `${supplierId}:${series}`' })
  @IsOptional()
  @IsString({ message: 'The series must look like "<supplier number>:<series>"' })
  seriesId?: string;
}
