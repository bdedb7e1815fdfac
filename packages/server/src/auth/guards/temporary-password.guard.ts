import { ForbiddenException, Injectable, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ALLOW_TEMPORARY_PASSWORD_KEY } from '../../common/decorators/allow-temporary-password.decorator.js';

export const TEMPORARY_PASSWORD_MESSAGE = 'You signed in with a temporary password: choose a new password before you go on';

/**
 * Global guard (after JwtAuthGuard): someone whose admin set a temporary password may only read
 * their account and choose a new password, until they have.
 */
@Injectable()
export class TemporaryPasswordGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const user = context.switchToHttp().getRequest().user as { mustChangePassword?: boolean } | undefined;
    if (!user?.mustChangePassword) return true;
    const allowed = this.reflector.getAllAndOverride<boolean>(ALLOW_TEMPORARY_PASSWORD_KEY, [context.getHandler(), context.getClass()]);
    if (allowed) return true;
    throw new ForbiddenException(TEMPORARY_PASSWORD_MESSAGE);
  }
}
