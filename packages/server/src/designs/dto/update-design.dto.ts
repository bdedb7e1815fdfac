import { ApiProperty, ApiPropertyOptional, PartialType, PickType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, MaxLength, Min, ValidateNested } from 'class-validator';
import { IsId } from '../../common/decorators/is-id.decorator.js';
import { DesignInputDto } from '../../selection/dto/design-input.dto.js';
import { NotTogetherWith } from '../../selection/dto/validators.js';
import { CreateDesignDto } from './create-design.dto.js';

/**
 * A change to a draft. `version` is the one the client read; a stale one gets 409. Choosing a
 * candidate (`chosenMountId` or `chosenSeriesId`; `null` clears the choice) re-runs the
 * selection for it on the server. A new `input` without a choice clears the old choice. The name
 * is a new design's, optional, `null` refused (`skipNullProperties: false`); `input` is written
 * out: omitted here means unchanged, not a template.
 */
export class UpdateDesignDto extends PartialType(PickType(CreateDesignDto, ['name'] as const), { skipNullProperties: false }) {
  @ApiProperty({ example: 3 })
  @IsInt()
  @Min(1)
  version: number;

  @ApiPropertyOptional({ type: DesignInputDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => DesignInputDto)
  input?: DesignInputDto;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'a uniform candidate (one part number at every point)' })
  @IsOptional()
  @IsId()
  @NotTogetherWith('chosenSeriesId')
  chosenMountId?: number | null;

  @ApiPropertyOptional({ type: String, nullable: true, description: 'a series candidate, `${supplierId}:${series}`' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  chosenSeriesId?: string | null;
}
