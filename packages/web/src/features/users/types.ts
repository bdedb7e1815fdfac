import type { SessionUser } from '@/lib/auth';
import type { Role } from '@/lib/authorization';
import type { UnitSystem } from '@tacet/vibration';

/**
 * A user account as the API returns it. Mirrors the server's OpenAPI `User` schema
 * (`GET /api/users`, `/api/users/:id`, `/api/auth/me`); the password hash is never sent.
 */
export interface User extends SessionUser {
  active: boolean;
  /** ISO 8601 date-time. */
  createdAt: string;
  /** ISO 8601 date-time. */
  updatedAt: string;
}

/** Body of `POST /api/users` (mirrors the server's `CreateUserDto`). */
export interface CreateUserInput {
  email: string;
  name: string;
  role: Role;
  password: string;
  unitSystem?: UnitSystem;
}

/** Body of `PATCH /api/users/:id` (mirrors the server's `UpdateUserDto`). */
export interface UpdateUserInput {
  name?: string;
  role?: Role;
  active?: boolean;
  unitSystem?: UnitSystem;
}
