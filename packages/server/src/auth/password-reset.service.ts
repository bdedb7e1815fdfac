import { createHash, randomBytes } from 'node:crypto';
import { BadRequestException, Injectable, Logger } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { DataSource, LessThan, type Repository } from 'typeorm';
import { AppConfig } from '../config/app-config.js';
import { publicLinks } from '../config/public-links.js';
import { MailService } from '../mail/mail.service.js';
import { User } from '../users/user.entity.js';
import { UsersService } from '../users/users.service.js';
import { PasswordResetToken } from './password-reset-token.entity.js';

/** How long a "forgot password" link works. */
export const RESET_LINK_LIFETIME_MS = 60 * 60 * 1000;

export const RESET_MESSAGES = {
  requested: 'If an account uses this address, a link to choose a new password is on its way. It works once, for one hour.',
  done: 'Your new password is set. Sign in with it.',
  invalid: 'This link to choose a new password has been used or has expired. Ask for a new one on the sign-in page.',
} as const;

/** SHA-256 of a token, hex: the only form a token is stored in. */
export const hashToken = (token: string): string => createHash('sha256').update(token, 'utf8').digest('hex');

/**
 * "Forgot password": a one-time link by e-mail (valid one hour, used once; only a hash of its
 * token is stored). The request answers the same whether or not the address belongs to anyone,
 * and does the same work on both paths before answering: the e-mail goes out afterwards.
 */
@Injectable()
export class PasswordResetService {
  private readonly logger = new Logger(PasswordResetService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(PasswordResetToken) private readonly tokens: Repository<PasswordResetToken>,
    private readonly users: UsersService,
    private readonly mail: MailService,
    private readonly config: AppConfig,
  ) {}

  async request(email: string, now = new Date()): Promise<string> {
    const token = randomBytes(32).toString('base64url');
    const tokenHash = hashToken(token);
    const user = await this.users.findByEmail(email);
    const account = user?.active ? user : null;
    // The same statements on both paths: expired links go, and an account's older links with them.
    await this.dataSource.transaction(async (em) => {
      await em.delete(PasswordResetToken, { expiresAt: LessThan(now) });
      await em.delete(PasswordResetToken, { userId: account?.id ?? -1 });
      if (account) {
        await em.insert(PasswordResetToken, {
          userId: account.id,
          tokenHash,
          expiresAt: new Date(now.getTime() + RESET_LINK_LIFETIME_MS),
          usedAt: null,
        });
      }
    });
    if (account) void this.sendLink(account, token);
    return RESET_MESSAGES.requested;
  }

  /** Sets the new password if the token is known, unused and not expired; the token is then spent. */
  async confirm(token: string, password: string, now = new Date()): Promise<string> {
    this.users.assertAcceptablePassword(password);
    const found = await this.tokens.findOne({ where: { tokenHash: hashToken(token) }, relations: { user: true } });
    if (!found || found.usedAt || found.expiresAt.getTime() <= now.getTime() || !found.user.active) {
      throw new BadRequestException(RESET_MESSAGES.invalid);
    }
    const user = found.user;
    const passwordHash = await this.users.hashPassword(password);
    await this.dataSource.transaction(async (em) => {
      // Single use: only the first of two requests with the same token finds it unused.
      const spent = await em
        .createQueryBuilder()
        .update(PasswordResetToken)
        .set({ usedAt: now })
        .where('id = :id AND "usedAt" IS NULL', { id: found.id })
        .execute();
      if (!spent.affected) throw new BadRequestException(RESET_MESSAGES.invalid);
      await em.update(User, { id: user.id }, { passwordHash, mustChangePassword: false });
    });
    return RESET_MESSAGES.done;
  }

  private async sendLink(user: User, token: string): Promise<void> {
    const links = publicLinks(this.config);
    const text = [
      `Hello ${user.name},`,
      '',
      'Someone — we hope you — asked to choose a new password for your Tacet account.',
      `Open this link to choose it (it works once, for one hour): ${links.passwordReset(token)}`,
      '',
      'If you did not ask, ignore this message: your password stays as it is.',
    ].join('\n');
    try {
      await this.mail.send({ to: user.email, subject: 'Choose a new Tacet password', text });
    } catch (error) {
      this.logger.warn(`The password link to ${user.email} was not sent: ${(error as Error).message}`);
    }
  }
}
