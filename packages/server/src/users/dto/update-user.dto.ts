import { ApiPropertyOptional } from '@nestjs/swagger';
import type { UnitSystem } from '@tacet/vibration';
import { IsBoolean, IsIn, IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { PresentOptional } from '../../common/decorators/present-optional.decorator.js';
import { ROLES, type Role } from '../../common/roles.js';
import { UNIT_SYSTEMS } from '../user.entity.js';
import { Trim } from './dto-transforms.js';

/** What an admin may change on a user (email is fixed; DELETE deactivates). */
export class UpdateUserDto {
  @ApiPropertyOptional({ maxLength: 200 })
  @PresentOptional()
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  name?: string;

  @ApiPropertyOptional({ enum: ROLES, enumName: 'Role' })
  @PresentOptional()
  @IsIn(ROLES)
  role?: Role;

  @ApiPropertyOptional()
  @PresentOptional()
  @IsBoolean()
  active?: boolean;

  @ApiPropertyOptional({ enum: UNIT_SYSTEMS, enumName: 'UnitSystem' })
  @PresentOptional()
  @IsIn(UNIT_SYSTEMS)
  unitSystem?: UnitSystem;
}
