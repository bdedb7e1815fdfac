import { SetMetadata } from '@nestjs/common';
import type { Role } from '../roles.js';

export const ROLES_KEY = 'tacet:roles';

/**
 * Restricts a route (or a controller) to the listed roles; checked by the global RolesGuard
 * after sign-in. Without it any signed-in user may call the route. `admin` may do everything,
 * so it always passes (listing it anyway keeps the intent readable).
 */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
