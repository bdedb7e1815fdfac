import { Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { PasswordService } from '../users/password.service.js';
import { UsersService } from '../users/users.service.js';
import type { LoginDto } from './dto/login.dto.js';
import type { LoginResponseDto } from './dto/login-response.dto.js';
import type { JwtPayload } from './jwt-payload.js';

/** Same answer for a wrong password, an unknown email and a deactivated account. */
export const LOGIN_FAILED = 'Email or password is incorrect';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly passwords: PasswordService,
    private readonly jwt: JwtService,
  ) {}

  async login({ email, password }: LoginDto): Promise<LoginResponseDto> {
    const user = await this.users.findByEmail(email);
    // Always one bcrypt comparison, so timing does not tell whether the email exists.
    const passwordMatches = await this.passwords.verify(password, user?.passwordHash);
    if (!user || !passwordMatches || !user.active) throw new UnauthorizedException(LOGIN_FAILED);
    const payload: JwtPayload = { sub: user.id, role: user.role };
    return {
      accessToken: await this.jwt.signAsync(payload),
      user: {
        id: user.id,
        email: user.email,
        name: user.name,
        role: user.role,
        unitSystem: user.unitSystem,
        mustChangePassword: user.mustChangePassword,
      },
    };
  }
}
