import { User } from '../../src/users/user.entity.js';

let nextId = 1000;

/** A User entity for unit tests (not persisted). */
export function buildUser(overrides: Partial<User> = {}): User {
  const id = overrides.id ?? nextId++;
  return Object.assign(new User(), {
    id,
    email: `user${id}@example.test`,
    name: `User ${id}`,
    passwordHash: 'hashed:correct horse battery',
    role: 'engineer',
    unitSystem: 'SI',
    active: true,
    mustChangePassword: false,
    createdAt: new Date('2026-01-01T00:00:00Z'),
    updatedAt: new Date('2026-01-01T00:00:00Z'),
    ...overrides,
  } satisfies Partial<User>);
}

/** A PasswordService stand-in: `hashed:<password>`, no bcrypt cost in unit tests. */
export const fakePasswords = () => ({
  hash: async (password: string) => `hashed:${password}`,
  verify: async (password: string, hash: string | undefined) => hash === `hashed:${password}`,
});
