import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { createTransport, type Transporter } from 'nodemailer';
import { AppConfig } from '../config/app-config.js';
import { MailCatcherService } from './mail-catcher.service.js';
import { MailNotConfiguredError, MailSendError } from './mail.errors.js';

export interface MailAttachment {
  filename: string;
  /** A string is sent as UTF-8. */
  content: Buffer | string;
  contentType: string;
}

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
  /** Where replies go (e.g. the purchaser who sent a request for quotation). */
  replyTo?: string;
  attachments?: MailAttachment[];
}

export interface SentMail {
  /** The `Message-ID` header of the message as sent. */
  messageId: string;
}

/**
 * How long to wait for a mail server before giving up, so that a request that sends mail
 * fails in seconds rather than nodemailer's minutes.
 */
export const MAIL_TIMEOUTS = { connectionTimeout: 15_000, greetingTimeout: 15_000, socketTimeout: 60_000 } as const;

/** Which way mail goes in this instance. */
export type MailRoute = 'smtp-url' | 'local-catcher' | 'none';

/**
 * Sends e-mail through nodemailer: to the server in SMTP_URL when set, otherwise (demo and
 * test mode) over SMTP to the local mail catcher, whose messages the outbox shows. Outside
 * those modes without SMTP_URL every send fails with MailNotConfiguredError. Each message
 * opens its own connection (no pool), so nothing stays open between sends.
 */
@Injectable()
export class MailService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger(MailService.name);
  private transport?: Transporter;

  constructor(
    private readonly config: AppConfig,
    private readonly catcher: MailCatcherService,
  ) {}

  get route(): MailRoute {
    if (this.config.smtpUrl) return 'smtp-url';
    return this.config.mailCatcher ? 'local-catcher' : 'none';
  }

  async onModuleInit(): Promise<void> {
    const route = this.route;
    if (route === 'smtp-url') {
      // The URL's own settings (host, port, secure, auth) win over the timeouts' defaults.
      this.transport = createTransport({ url: this.config.smtpUrl, ...MAIL_TIMEOUTS });
      this.logger.log('E-mail goes to the SMTP server named by SMTP_URL');
    } else if (route === 'local-catcher') {
      const { host, port } = await this.catcher.start();
      this.transport = createTransport({ host, port, secure: false, ignoreTLS: true, ...MAIL_TIMEOUTS });
    } else {
      this.logger.warn('No mail server is configured (SMTP_URL): sending e-mail will fail');
    }
  }

  onModuleDestroy(): void {
    this.transport?.close();
    this.transport = undefined;
  }

  /**
   * Sends one message from MAIL_FROM. Resolves once the mail server has accepted it for every
   * recipient; otherwise rejects with a MailSendError carrying the reason (a
   * MailNotConfiguredError when there is no mail server at all). Never swallows a failure.
   */
  async send(mail: OutgoingMail): Promise<SentMail> {
    const transport = this.transport;
    if (!transport) {
      if (this.route === 'none') throw new MailNotConfiguredError();
      throw new MailSendError('the mail transport is not running (the server is starting or shutting down)', {
        code: 'ENOTRUNNING',
      });
    }
    const recipients = Array.isArray(mail.to) ? mail.to.join(', ') : mail.to;
    try {
      const info = (await transport.sendMail({
        from: this.config.mailFrom,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        replyTo: mail.replyTo,
        attachments: mail.attachments?.map(({ filename, content, contentType }) => ({ filename, content, contentType })),
      })) as { messageId: string; rejected?: unknown[] };
      const rejected = (info.rejected ?? []).map((address) =>
        typeof address === 'string' ? address : ((address as { address?: string }).address ?? String(address)),
      );
      if (rejected.length > 0) {
        throw new MailSendError(`the mail server refused ${rejected.join(', ')} (other recipients accepted it)`, {
          code: 'EENVELOPE',
        });
      }
      return { messageId: info.messageId };
    } catch (error) {
      const failure = MailSendError.from(error);
      this.logger.warn(`Sending "${mail.subject}" to ${recipients} failed: ${failure.reason}`);
      throw failure;
    }
  }
}
