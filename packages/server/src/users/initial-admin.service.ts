import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, type Repository } from 'typeorm';
import { AppConfig } from '../config/app-config.js';
import { ConfigError } from '../config/environment.js';
import { withStartupLock } from '../database/startup-lock.js';
import { PasswordService } from './password.service.js';
import { User } from './user.entity.js';
import { normalizeEmail } from './users.service.js';

/**
 * Outside demo mode, makes sure an active admin exists: when none does, the account named by
 * TACET_ADMIN_EMAIL / TACET_ADMIN_PASSWORD is created (or, if that email exists, re-activated
 * as admin with that password). Without those settings the boot fails with a clear message.
 */
@Injectable()
export class InitialAdminService implements OnApplicationBootstrap {
  private readonly logger = new Logger(InitialAdminService.name);

  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly passwords: PasswordService,
    private readonly config: AppConfig,
    private readonly dataSource: DataSource,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (this.config.demo) return;
    // Under the start-up lock: of processes starting at once on one PostgreSQL, one creates the admin.
    await withStartupLock(this.dataSource, () => this.ensureAdmin());
  }

  private async ensureAdmin(): Promise<void> {
    if (await this.users.existsBy({ role: 'admin', active: true })) return;
    const admin = this.config.initialAdmin;
    if (!admin) {
      throw new ConfigError(['No active admin exists: set TACET_ADMIN_EMAIL and TACET_ADMIN_PASSWORD to create the first admin']);
    }
    const email = normalizeEmail(admin.email);
    const passwordHash = await this.passwords.hash(admin.password);
    const existing = await this.users.findOneBy({ email });
    if (existing) {
      await this.users.save(this.users.merge(existing, { role: 'admin', active: true, passwordHash }));
      this.logger.warn(`No active admin existed: ${email} is now an active admin`);
      return;
    }
    await this.users.save(this.users.create({ email, name: 'Administrator', role: 'admin', unitSystem: 'SI', active: true, passwordHash }));
    this.logger.log(`Created the first admin, ${email}`);
  }
}
