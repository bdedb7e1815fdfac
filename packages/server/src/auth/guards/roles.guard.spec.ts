import { ForbiddenException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { Roles } from '../../common/decorators/roles.decorator.js';
import type { Role } from '../../common/roles.js';
import { RolesGuard } from './roles.guard.js';

class Routes {
  @Roles('catalog_manager')
  restricted(): void {}

  open(): void {}
}

function contextFor(handler: keyof Routes, role: Role): ExecutionContext {
  return {
    getHandler: () => Routes.prototype[handler],
    getClass: () => Routes,
    switchToHttp: () => ({ getRequest: () => ({ user: { role } }) }),
  } as unknown as ExecutionContext;
}

describe('RolesGuard', () => {
  const guard = new RolesGuard(new Reflector());

  it('lets a listed role through and refuses the others with 403', () => {
    expect(guard.canActivate(contextFor('restricted', 'catalog_manager'))).toBe(true);
    expect(() => guard.canActivate(contextFor('restricted', 'viewer'))).toThrow(new ForbiddenException('Your role does not allow this'));
  });

  it('lets admin through everywhere', () => {
    expect(guard.canActivate(contextFor('restricted', 'admin'))).toBe(true);
  });

  it('lets any signed-in role through a route without @Roles', () => {
    expect(guard.canActivate(contextFor('open', 'viewer'))).toBe(true);
  });
});
