import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import bcrypt from 'bcryptjs';
import { Piscina } from 'piscina';
import type { PasswordTask } from './password.worker.js';

/** bcrypt work factor (common practice: 12 for interactive logins in the 2020s). */
export const BCRYPT_COST = 12;

/**
 * A cost-12 hash of a random value nobody knows. Comparing against it when an email is unknown
 * takes as long as a real check, so response time does not reveal which emails exist.
 */
const DUMMY_HASH = '$2b$12$WufLB939KtiztYSbr3Rs.urb7BvhDZpyBMW1.WbXjuJuHb5e00wMS';

/** The compiled worker beside this file (dist); absent when the TypeScript sources run directly (tests). */
const WORKER_FILE = fileURLToPath(new URL('./password.worker.js', import.meta.url));

/**
 * Password hashing and checking with bcrypt (bcryptjs). A cost-12 hash is about half a second
 * of CPU: run on the event loop it would hold up every other request while people sign in, so
 * the built server runs it in a small pool of worker threads (piscina). Where the compiled
 * worker is missing (TypeScript sources under jest) it runs bcryptjs's async API in-thread.
 */
@Injectable()
export class PasswordService implements OnModuleDestroy {
  private readonly pool = existsSync(WORKER_FILE) ? new Piscina({ filename: WORKER_FILE, idleTimeout: 30_000 }) : null;

  hash(password: string): Promise<string> {
    return this.pool
      ? (this.pool.run({ op: 'hash', password, cost: BCRYPT_COST } satisfies PasswordTask) as Promise<string>)
      : bcrypt.hash(password, BCRYPT_COST);
  }

  /** True when `password` matches `hash`; with no hash, spends the same time and returns false. */
  async verify(password: string, hash: string | undefined): Promise<boolean> {
    const against = hash ?? DUMMY_HASH;
    const matches = this.pool
      ? ((await this.pool.run({ op: 'compare', password, hash: against } satisfies PasswordTask)) as boolean)
      : await bcrypt.compare(password, against);
    return hash !== undefined && matches;
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool?.destroy();
  }
}
