import { ApiPropertyOptional, PartialType, PickType } from '@nestjs/swagger';
import type { UnitSystem } from '@tacet/vibration';
import { IsBoolean, IsIn } from 'class-validator';
import { PresentOptional } from '../../common/decorators/present-optional.decorator.js';
import { UNIT_SYSTEMS } from '../user.entity.js';
import { CreateUserDto } from './create-user.dto.js';

/**
 * What an admin may change on a user (email is fixed; DELETE deactivates): name and role as on
 * a new user, optional, `null` refused (`skipNullProperties: false`). The unit system is its
 * own field: on a new user it is optional with a default, here `null` is refused.
 */
export class UpdateUserDto extends PartialType(PickType(CreateUserDto, ['name', 'role'] as const), { skipNullProperties: false }) {
  @ApiPropertyOptional()
  @PresentOptional()
  @IsBoolean()
  active?: boolean;

  @ApiPropertyOptional({ enum: UNIT_SYSTEMS, enumName: 'UnitSystem' })
  @PresentOptional()
  @IsIn(UNIT_SYSTEMS)
  unitSystem?: UnitSystem;
}
