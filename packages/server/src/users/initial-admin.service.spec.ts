import { jest } from '@jest/globals';
import type { DataSource, Repository } from 'typeorm';
import { buildUser, fakePasswords } from '../../test/factories/user.factory.js';
import { AppConfig } from '../config/app-config.js';
import { ConfigError } from '../config/environment.js';
import { InitialAdminService } from './initial-admin.service.js';
import type { PasswordService } from './password.service.js';
import type { User } from './user.entity.js';

function setup(rows: User[], config: Partial<AppConfig>) {
  const matches = (row: User, where: Partial<User>) => Object.entries(where).every(([key, value]) => row[key as keyof User] === value);
  const repository = {
    existsBy: jest.fn(async (where: Partial<User>) => rows.some((row) => matches(row, where))),
    findOneBy: jest.fn(async (where: Partial<User>) => rows.find((row) => matches(row, where)) ?? null),
    create: jest.fn((values: Partial<User>) => buildUser(values)),
    merge: jest.fn((user: User, ...parts: Partial<User>[]) => Object.assign(user, ...parts)),
    save: jest.fn(async (user: User) => user),
  };
  const service = new InitialAdminService(
    repository as unknown as Repository<User>,
    fakePasswords() as unknown as PasswordService,
    new AppConfig({ demo: false, ...config } as AppConfig),
    { options: { type: 'better-sqlite3' } } as DataSource, // SQLite: the start-up lock just runs the work
  );
  (service as unknown as { logger: object }).logger = { log: () => undefined, warn: () => undefined };
  return { service, repository };
}

const initialAdmin = { email: 'Boss@Example.test', password: 'first admin password' };

describe('InitialAdminService', () => {
  it('creates the configured admin when no active admin exists', async () => {
    const { service, repository } = setup([], { initialAdmin });
    await service.onApplicationBootstrap();
    expect(repository.save).toHaveBeenCalledWith(
      expect.objectContaining({ email: 'boss@example.test', role: 'admin', active: true, passwordHash: 'hashed:first admin password' }),
    );
  });

  it('re-activates and promotes an existing account with that email', async () => {
    const existing = buildUser({ email: 'boss@example.test', role: 'viewer', active: false });
    const { service } = setup([existing], { initialAdmin });
    await service.onApplicationBootstrap();
    expect(existing).toMatchObject({ role: 'admin', active: true, passwordHash: 'hashed:first admin password' });
  });

  it('leaves everything alone when an active admin exists', async () => {
    const { service, repository } = setup([buildUser({ role: 'admin' })], { initialAdmin });
    await service.onApplicationBootstrap();
    expect(repository.save).not.toHaveBeenCalled();
  });

  it('stops the boot when no admin exists and none is configured', async () => {
    const { service } = setup([buildUser({ role: 'admin', active: false })], {});
    await expect(service.onApplicationBootstrap()).rejects.toBeInstanceOf(ConfigError);
  });

  it('does nothing in demo mode', async () => {
    const { service, repository } = setup([], { demo: true });
    await service.onApplicationBootstrap();
    expect(repository.existsBy).not.toHaveBeenCalled();
  });
});
