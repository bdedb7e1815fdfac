import { Injectable, Logger } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import type { Role } from '../common/roles.js';
import { DEMO_PASSWORD } from '../config/environment.js';
import { DEMO_SEED_ORDER, DemoSeed, type DemoSeedStep } from '../demo/demo-seed-step.js';
import { PasswordService } from './password.service.js';
import { User } from './user.entity.js';

/** The demo accounts (invented people); all use DEMO_PASSWORD. */
export const DEMO_ACCOUNTS: ReadonlyArray<{ email: string; name: string; role: Role }> = [
  { email: 'admin@tacet.test', name: 'Ada Admin', role: 'admin' },
  { email: 'catalog@tacet.test', name: 'Cato Catalog', role: 'catalog_manager' },
  { email: 'engineer@tacet.test', name: 'Erin Engineer', role: 'engineer' },
  { email: 'checker@tacet.test', name: 'Chris Checker', role: 'engineer' },
  { email: 'buyer@tacet.test', name: 'Bea Buyer', role: 'purchaser' },
  { email: 'viewer@tacet.test', name: 'Vic Viewer', role: 'viewer' },
];

/** Creates the demo accounts that are missing (existing ones are left as they are). */
@Injectable()
@DemoSeed({ order: DEMO_SEED_ORDER.users })
export class DemoUsersSeed implements DemoSeedStep {
  private readonly logger = new Logger(DemoUsersSeed.name);

  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly passwords: PasswordService,
  ) {}

  async run(): Promise<void> {
    const existing = new Set((await this.users.find({ select: { email: true } })).map((u) => u.email));
    const missing = DEMO_ACCOUNTS.filter((account) => !existing.has(account.email));
    if (missing.length === 0) return;
    // One hash serves every account: they share a published password anyway.
    const passwordHash = await this.passwords.hash(DEMO_PASSWORD);
    await this.users
      .createQueryBuilder()
      .insert()
      .into(User)
      .values(missing.map((account) => ({ ...account, passwordHash, unitSystem: 'SI' as const, active: true })))
      .orIgnore() // another instance seeding at the same moment
      .execute();
    this.logger.log(`Created ${missing.length} demo account(s)`);
  }
}
