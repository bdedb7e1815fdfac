import { Injectable } from '@nestjs/common';
import bcrypt from 'bcryptjs';

/** bcrypt work factor (common practice: 12 for interactive logins in the 2020s). */
export const BCRYPT_COST = 12;

/**
 * A cost-12 hash of a random value nobody knows. Comparing against it when an email is unknown
 * takes as long as a real check, so response time does not reveal which emails exist.
 */
const DUMMY_HASH = '$2b$12$WufLB939KtiztYSbr3Rs.urb7BvhDZpyBMW1.WbXjuJuHb5e00wMS';

@Injectable()
export class PasswordService {
  hash(password: string): Promise<string> {
    return bcrypt.hash(password, BCRYPT_COST);
  }

  /** True when `password` matches `hash`; with no hash, spends the same time and returns false. */
  async verify(password: string, hash: string | undefined): Promise<boolean> {
    const matches = await bcrypt.compare(password, hash ?? DUMMY_HASH);
    return hash !== undefined && matches;
  }
}
