import { ApiPropertyOptional } from '@nestjs/swagger';
import type { UnitSystem } from '@tacet/vibration';
import { IsBoolean, IsIn, IsNotEmpty, IsOptional, IsString, MaxLength } from 'class-validator';
import { ROLES, type Role } from '../../common/roles.js';
import { UNIT_SYSTEMS } from '../user.entity.js';
import { Trim } from './dto-transforms.js';

/** What an admin may change on a user (email is fixed; DELETE deactivates). */
export class UpdateUserDto {
  @ApiPropertyOptional({ maxLength: 200 })
  @IsOptional()
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  name?: string;

  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @IsIn(ROLES)
  role?: Role;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean()
  active?: boolean;

  @ApiPropertyOptional({ enum: UNIT_SYSTEMS })
  @IsOptional()
  @IsIn(UNIT_SYSTEMS)
  unitSystem?: UnitSystem;
}
