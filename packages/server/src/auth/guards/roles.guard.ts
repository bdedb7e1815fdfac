import { ForbiddenException, Injectable, UnauthorizedException, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ROLES_KEY } from '../../common/decorators/roles.decorator.js';
import type { Role } from '../../common/roles.js';

/** Global guard (after JwtAuthGuard): enforces `@Roles(...)`; admins pass everywhere. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, [context.getHandler(), context.getClass()]);
    if (!roles) return true;
    const user = context.switchToHttp().getRequest().user as { role: Role } | undefined;
    if (!user) throw new UnauthorizedException('Sign-in required');
    if (user.role === 'admin' || roles.includes(user.role)) return true;
    throw new ForbiddenException('Your role does not allow this');
  }
}
