import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { User } from '../../users/user.entity.js';

/** The signed-in user (an active `User` row loaded by the JWT strategy). */
export const CurrentUser = createParamDecorator(
  (_data: unknown, context: ExecutionContext): User => context.switchToHttp().getRequest().user,
);
