import { createSecretKey } from 'node:crypto';
import { Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import passportJwt from 'passport-jwt';
import { AppConfig } from '../config/app-config.js';
import type { User } from '../users/user.entity.js';
import { UsersService } from '../users/users.service.js';
import { JWT_ALGORITHM, type JwtPayload } from './jwt-payload.js';

const { ExtractJwt, Strategy } = passportJwt;

/** Verifies the bearer token and loads its user; a deactivated or vanished user is refused. */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    config: AppConfig,
    private readonly users: UsersService,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // A KeyObject, not the string: jsonwebtoken would otherwise first try (and fail) to read the
      // string as a public key on every request, at about a millisecond each.
      secretOrKey: createSecretKey(Buffer.from(config.jwtSecret, 'utf8')) as unknown as string,
      algorithms: [JWT_ALGORITHM],
      ignoreExpiration: false,
    });
  }

  async validate(payload: Partial<JwtPayload>): Promise<User> {
    const user = Number.isInteger(payload.sub) ? await this.users.findActiveById(payload.sub as number) : null;
    if (!user) throw new UnauthorizedException('Sign-in required');
    return user;
  }
}
