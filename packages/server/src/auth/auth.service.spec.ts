import { jest } from '@jest/globals';
import { UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { buildUser, fakePasswords } from '../../test/factories/user.factory.js';
import type { PasswordService } from '../users/password.service.js';
import type { UsersService } from '../users/users.service.js';
import { AuthService, LOGIN_FAILED } from './auth.service.js';

describe('AuthService.login', () => {
  const secret = 's'.repeat(32);
  const active = buildUser({ id: 5, email: 'erin@example.test', role: 'engineer', passwordHash: 'hashed:right password' });
  const inactive = buildUser({ id: 6, email: 'gone@example.test', active: false, passwordHash: 'hashed:right password' });

  function makeService() {
    const users = { findByEmail: jest.fn(async (email: string) => [active, inactive].find((u) => u.email === email) ?? null) };
    const passwords = fakePasswords();
    const verify = jest.spyOn(passwords, 'verify');
    const jwt = new JwtService({ secret, signOptions: { expiresIn: '12h' } });
    const service = new AuthService(users as unknown as UsersService, passwords as unknown as PasswordService, jwt);
    return { service, verify, jwt };
  }

  it('returns a token carrying {sub, role} and the signed-in user', async () => {
    const { service, jwt } = makeService();
    const result = await service.login({ email: 'erin@example.test', password: 'right password' });
    expect(result.user).toEqual({
      id: 5,
      email: 'erin@example.test',
      name: active.name,
      role: 'engineer',
      unitSystem: 'SI',
      mustChangePassword: false,
    });
    const payload = jwt.verify<{ sub: number; role: string; exp: number; iat: number }>(result.accessToken);
    expect(payload).toMatchObject({ sub: 5, role: 'engineer' });
    expect(payload.exp - payload.iat).toBe(12 * 3600);
  });

  it.each<[string, string, string]>([
    ['a wrong password', 'erin@example.test', 'wrong password'],
    ['an unknown email', 'nobody@example.test', 'right password'],
    ['a deactivated account', 'gone@example.test', 'right password'],
  ])('gives the same 401 for %s, after exactly one password comparison', async (_case, email, password) => {
    const { service, verify } = makeService();
    await expect(service.login({ email, password })).rejects.toThrow(new UnauthorizedException(LOGIN_FAILED));
    expect(verify).toHaveBeenCalledTimes(1);
  });
});
