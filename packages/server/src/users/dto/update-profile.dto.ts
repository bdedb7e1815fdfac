import { ApiPropertyOptional } from '@nestjs/swagger';
import type { UnitSystem } from '@tacet/vibration';
import { IsIn, IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { PresentOptional } from '../../common/decorators/present-optional.decorator.js';
import { UNIT_SYSTEMS } from '../user.entity.js';
import { Trim } from './dto-transforms.js';

/** What every user may change on their own account. */
export class UpdateProfileDto {
  @ApiPropertyOptional({ maxLength: 200 })
  @PresentOptional()
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  name?: string;

  @ApiPropertyOptional({ enum: UNIT_SYSTEMS, enumName: 'UnitSystem' })
  @PresentOptional()
  @IsIn(UNIT_SYSTEMS)
  unitSystem?: UnitSystem;
}
