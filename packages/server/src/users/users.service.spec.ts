import { jest } from '@jest/globals';
import { BadRequestException, ConflictException, NotFoundException } from '@nestjs/common';
import { QueryFailedError, type Repository } from 'typeorm';
import { buildUser, fakePasswords } from '../../test/factories/user.factory.js';
import { AppConfig } from '../config/app-config.js';
import type { PasswordService } from './password.service.js';
import type { User } from './user.entity.js';
import { UsersService } from './users.service.js';

/** An in-memory stand-in for Repository<User> with the calls UsersService makes. */
function fakeRepository(rows: User[] = []) {
  return {
    find: jest.fn(async () => [...rows]),
    findOneBy: jest.fn(
      async (where: Partial<User>) =>
        rows.find((row) => Object.entries(where).every(([key, value]) => row[key as keyof User] === value)) ?? null,
    ),
    existsBy: jest.fn(async (where: Partial<User>) =>
      rows.some((row) => Object.entries(where).every(([key, value]) => row[key as keyof User] === value)),
    ),
    create: jest.fn((values: Partial<User>) => buildUser({ id: rows.length + 1, ...values })),
    merge: jest.fn((user: User, ...parts: Partial<User>[]) => Object.assign(user, ...parts)),
    save: jest.fn(async (user: User) => user),
  };
}

const config = (demo: boolean) => new AppConfig({ demo } as AppConfig);

function makeService(rows: User[] = [], demo = false) {
  const repository = fakeRepository(rows);
  const service = new UsersService(repository as unknown as Repository<User>, fakePasswords() as unknown as PasswordService, config(demo));
  return { service, repository };
}

describe('UsersService', () => {
  const admin = buildUser({ id: 1, role: 'admin', email: 'admin@example.test' });

  describe('create', () => {
    const dto = { email: '  New.Person@Example.TEST ', name: 'New Person', role: 'viewer' as const, password: 'long enough 1' };

    it('stores a trimmed, lower-cased email, a hash and the defaults', async () => {
      const { service, repository } = makeService([admin]);
      const user = await service.create(dto);
      expect(user).toMatchObject({
        email: 'new.person@example.test',
        role: 'viewer',
        unitSystem: 'SI',
        active: true,
        passwordHash: 'hashed:long enough 1',
      });
      expect(repository.save).toHaveBeenCalledTimes(1);
    });

    it('refuses a duplicate email (any case) with 409', async () => {
      const { service } = makeService([admin]);
      await expect(service.create({ ...dto, email: 'ADMIN@example.test' })).rejects.toThrow(
        new ConflictException('A user with this email already exists'),
      );
    });

    it('turns a unique-index race into 409 too', async () => {
      const { service, repository } = makeService([admin]);
      repository.save.mockRejectedValueOnce(
        new QueryFailedError('INSERT', [], Object.assign(new Error('UNIQUE'), { code: 'SQLITE_CONSTRAINT_UNIQUE' })),
      );
      await expect(service.create(dto)).rejects.toBeInstanceOf(ConflictException);
    });

    it('refuses the demo password outside demo mode only', async () => {
      await expect(makeService([]).service.create({ ...dto, password: 'tacet-demo' })).rejects.toBeInstanceOf(BadRequestException);
      await expect(makeService([], true).service.create({ ...dto, password: 'tacet-demo' })).resolves.toBeDefined();
    });
  });

  describe('update and deactivate', () => {
    it('changes only the fields sent', async () => {
      const target = buildUser({ id: 2, name: 'Old', role: 'viewer' });
      const { service } = makeService([admin, target]);
      const updated = await service.update(admin, 2, { role: 'purchaser', name: undefined });
      expect(updated).toMatchObject({ name: 'Old', role: 'purchaser', active: true });
    });

    it('does not let an admin deactivate themselves or drop their own admin role', async () => {
      const { service } = makeService([admin]);
      await expect(service.update(admin, 1, { active: false })).rejects.toThrow('You cannot deactivate your own account');
      await expect(service.update(admin, 1, { role: 'engineer' })).rejects.toThrow('You cannot remove your own admin role');
      await expect(service.deactivate(admin, 1)).rejects.toBeInstanceOf(ConflictException);
      await expect(service.update(admin, 1, { role: 'admin', name: 'Still Admin' })).resolves.toMatchObject({
        name: 'Still Admin',
      });
    });

    it('deactivates instead of deleting', async () => {
      const target = buildUser({ id: 2 });
      const { service, repository } = makeService([admin, target]);
      await expect(service.deactivate(admin, 2)).resolves.toMatchObject({ id: 2, active: false });
      expect(repository.save).toHaveBeenCalledWith(expect.objectContaining({ id: 2, active: false }));
    });

    it('answers 404 for an unknown id', async () => {
      const { service } = makeService([admin]);
      await expect(service.findOne(99)).rejects.toBeInstanceOf(NotFoundException);
      await expect(service.update(admin, 99, {})).rejects.toBeInstanceOf(NotFoundException);
      await expect(service.deactivate(admin, 99)).rejects.toBeInstanceOf(NotFoundException);
    });
  });

  describe('own account', () => {
    it('updates name and unit system', async () => {
      const me = buildUser({ id: 3 });
      const { service } = makeService([me]);
      await expect(service.updateProfile(me, { unitSystem: 'US' })).resolves.toMatchObject({
        unitSystem: 'US',
        name: me.name,
      });
    });

    it('changes the password only with the right current password', async () => {
      const me = buildUser({ id: 3, passwordHash: 'hashed:old password 1' });
      const { service } = makeService([me]);
      await expect(service.changePassword(me, { currentPassword: 'wrong password', newPassword: 'new password 1' })).rejects.toThrow(
        new BadRequestException('Current password is incorrect'),
      );
      await service.changePassword(me, { currentPassword: 'old password 1', newPassword: 'new password 1' });
      expect(me.passwordHash).toBe('hashed:new password 1');
    });

    it('refuses the demo password as a new password outside demo mode', async () => {
      const me = buildUser({ id: 3, passwordHash: 'hashed:old password 1' });
      const { service } = makeService([me]);
      await expect(service.changePassword(me, { currentPassword: 'old password 1', newPassword: 'tacet-demo' })).rejects.toBeInstanceOf(
        BadRequestException,
      );
      expect(me.passwordHash).toBe('hashed:old password 1');
    });
  });

  it('finds users by email case-insensitively and only active ones by id', async () => {
    const inactive = buildUser({ id: 4, email: 'gone@example.test', active: false });
    const { service } = makeService([admin, inactive]);
    await expect(service.findByEmail(' Gone@Example.test')).resolves.toBe(inactive);
    await expect(service.findActiveById(4)).resolves.toBeNull();
    await expect(service.findActiveById(1)).resolves.toBe(admin);
  });
});
