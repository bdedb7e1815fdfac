import type { ApiSchemas } from '@/api/schema';
import type { SessionUser } from '@/lib/auth';
import type { Role } from '@/lib/authorization';

/** One invented person per role, as the session knows them. */
export const TEST_USERS: Record<Role, SessionUser> = {
  admin: { id: 1, email: 'admin@tacet.test', name: 'Ada Admin', role: 'admin', unitSystem: 'SI', mustChangePassword: false },
  catalog_manager: {
    id: 2,
    email: 'catalog@tacet.test',
    name: 'Cato Catalog',
    role: 'catalog_manager',
    unitSystem: 'SI',
    mustChangePassword: false,
  },
  engineer: { id: 3, email: 'engineer@tacet.test', name: 'Erin Engineer', role: 'engineer', unitSystem: 'SI', mustChangePassword: false },
  purchaser: { id: 5, email: 'buyer@tacet.test', name: 'Bea Buyer', role: 'purchaser', unitSystem: 'US', mustChangePassword: false },
  viewer: { id: 6, email: 'viewer@tacet.test', name: 'Vic Viewer', role: 'viewer', unitSystem: 'SI', mustChangePassword: false },
};

/** An account as `GET /api/users` lists it (the server's `UserDto`). */
export type UserRecord = ApiSchemas['UserDto'];

let nextId = 100;

export function makeUser(overrides: Partial<UserRecord> = {}): UserRecord {
  const id = overrides.id ?? nextId++;
  return {
    id,
    email: `person${id}@tacet.test`,
    name: `Person ${id}`,
    role: 'viewer',
    unitSystem: 'SI',
    active: true,
    mustChangePassword: false,
    createdAt: '2025-01-06T09:00:00.000Z',
    updatedAt: '2025-01-06T09:00:00.000Z',
    ...overrides,
  };
}

export function userRecordFor(role: Role, overrides: Partial<UserRecord> = {}): UserRecord {
  return makeUser({ ...TEST_USERS[role], ...overrides });
}
