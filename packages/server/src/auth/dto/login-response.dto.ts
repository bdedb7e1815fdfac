import { ApiProperty, PickType } from '@nestjs/swagger';
import { UserDto } from '../../users/dto/user.dto.js';

export class SignedInUserDto extends PickType(UserDto, ['id', 'email', 'name', 'role', 'unitSystem', 'mustChangePassword'] as const) {}

export class LoginResponseDto {
  @ApiProperty({ description: 'JWT for `Authorization: Bearer <token>`; valid for 12 hours' })
  accessToken: string;

  @ApiProperty({ type: SignedInUserDto })
  user: SignedInUserDto;
}
