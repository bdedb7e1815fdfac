import bcrypt from 'bcryptjs';
import runPasswordTask from './password.worker.js';

/** The job the built server runs in its worker threads (PasswordService): plain bcrypt, checked both ways. */
describe('password worker task', () => {
  it('hashes with the given cost, and the hash checks with bcryptjs itself', () => {
    const hash = runPasswordTask({ op: 'hash', password: 'correct horse', cost: 4 }) as string;
    expect(hash).toMatch(/^\$2b\$04\$/);
    expect(bcrypt.compareSync('correct horse', hash)).toBe(true);
  });

  it('compares a password with a bcryptjs hash', () => {
    const hash = bcrypt.hashSync('correct horse', 4);
    expect(runPasswordTask({ op: 'compare', password: 'correct horse', hash })).toBe(true);
    expect(runPasswordTask({ op: 'compare', password: 'wrong horse', hash })).toBe(false);
  });
});
