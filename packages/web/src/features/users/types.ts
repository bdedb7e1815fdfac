/**
 * User accounts as the API returns and takes them (`GET /api/users`, `/api/users/:id`,
 * `/api/auth/me`; the password hash is never sent). Aliases of the types generated from the
 * server's OpenAPI document (`@/api/schema`, `npm run api-types`).
 */
import type { ApiSchemas } from '@/api/schema';

export type User = ApiSchemas['UserDto'];

/** Body of `POST /api/users`. */
export type CreateUserInput = ApiSchemas['CreateUserDto'];

/** Body of `PATCH /api/users/:id`. */
export type UpdateUserInput = ApiSchemas['UpdateUserDto'];
