import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { UnitSystem } from '@tacet/vibration';
import { IsEmail, IsIn, IsNotEmpty, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { ROLES, type Role } from '../../common/roles.js';
import { PASSWORD_MIN_LENGTH } from '../../config/environment.js';
import { UNIT_SYSTEMS } from '../user.entity.js';
import { NormalizeEmail, Trim } from './dto-transforms.js';

export class CreateUserDto {
  @ApiProperty({ example: 'new.person@example.test', maxLength: 200 })
  @NormalizeEmail()
  @IsEmail()
  @MaxLength(200)
  email: string;

  @ApiProperty({ example: 'New Person', maxLength: 200 })
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  name: string;

  @ApiProperty({ enum: ROLES, enumName: 'Role' })
  @IsIn(ROLES)
  role: Role;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: 200 })
  @IsString()
  @MinLength(PASSWORD_MIN_LENGTH)
  @MaxLength(200)
  password: string;

  @ApiPropertyOptional({ enum: UNIT_SYSTEMS, enumName: 'UnitSystem', default: 'SI' })
  @IsOptional()
  @IsIn(UNIT_SYSTEMS)
  unitSystem?: UnitSystem;
}
