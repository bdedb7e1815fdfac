import { jest } from '@jest/globals';
import bcrypt from 'bcryptjs';
import { BCRYPT_COST, PasswordService } from './password.service.js';

describe('PasswordService', () => {
  const passwords = new PasswordService();

  it('hashes with bcrypt at cost 12 and verifies', async () => {
    const hash = await passwords.hash('correct horse battery');
    expect(bcrypt.getRounds(hash)).toBe(BCRYPT_COST);
    expect(BCRYPT_COST).toBe(12);
    await expect(passwords.verify('correct horse battery', hash)).resolves.toBe(true);
    await expect(passwords.verify('correct horse batterY', hash)).resolves.toBe(false);
  });

  it('returns false without a hash, after a comparison of the same cost (no timing hint)', async () => {
    const compare = jest.spyOn(bcrypt, 'compare');
    try {
      await expect(passwords.verify('anything at all', undefined)).resolves.toBe(false);
      expect(compare).toHaveBeenCalledTimes(1);
      const [, dummyHash] = compare.mock.calls[0] as [string, string];
      expect(bcrypt.getRounds(dummyHash)).toBe(BCRYPT_COST);
    } finally {
      compare.mockRestore();
    }
  });
});
