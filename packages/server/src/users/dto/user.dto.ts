import { ApiProperty } from '@nestjs/swagger';
import type { UnitSystem } from '@tacet/vibration';
import { ROLES, type Role } from '../../common/roles.js';
import { UNIT_SYSTEMS, type User } from '../user.entity.js';

/** A user as the API shows it (never the password hash). */
export class UserDto {
  @ApiProperty({ example: 7 })
  id: number;

  @ApiProperty({ example: 'erin@example.test' })
  email: string;

  @ApiProperty({ example: 'Erin Engineer' })
  name: string;

  @ApiProperty({ enum: ROLES, enumName: 'Role' })
  role: Role;

  @ApiProperty({ enum: UNIT_SYSTEMS, enumName: 'UnitSystem' })
  unitSystem: UnitSystem;

  @ApiProperty()
  active: boolean;

  @ApiProperty({ description: 'Signed in with a temporary password an admin set: a new one must be chosen first' })
  mustChangePassword: boolean;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: String, format: 'date-time' })
  updatedAt: string;

  static from(user: User): UserDto {
    return Object.assign(new UserDto(), {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
      unitSystem: user.unitSystem,
      active: user.active,
      mustChangePassword: user.mustChangePassword,
      createdAt: user.createdAt.toISOString(),
      updatedAt: user.updatedAt.toISOString(),
    });
  }
}
