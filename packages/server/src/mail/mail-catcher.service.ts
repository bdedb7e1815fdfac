import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject, type Attachment, type ParsedMail } from 'mailparser';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import { AppConfig } from '../config/app-config.js';
import { CapturedMailStore, type CapturedMail } from './captured-mail-store.js';

/** The catcher listens on the loopback interface only, on a port the system picks. */
export const MAIL_CATCHER_HOST = '127.0.0.1';

/** Largest message the catcher accepts (SMTP SIZE extension); larger ones get a 552 reply. */
export const MAIL_CATCHER_MAX_BYTES = 25 * 1024 * 1024;

/** How long closing waits for a client that is still connected before cutting it off. */
const CLOSE_GRACE_MS = 1000;

export interface MailCatcherAddress {
  host: string;
  port: number;
}

/** `Name <address>` (or the bare address) for each mailbox of an address header, groups flattened. */
function addressText(value: AddressObject | AddressObject[] | undefined): string {
  if (!value) return '';
  const mailboxes = (Array.isArray(value) ? value : [value]).flatMap((header) => header.value).flatMap((entry) => entry.group ?? [entry]);
  return mailboxes
    .filter((mailbox) => mailbox.address)
    .map((mailbox) => (mailbox.name ? `${mailbox.name} <${mailbox.address}>` : mailbox.address))
    .join(', ');
}

/** The attachment's MIME type with its charset, if it declared one (mailparser keeps them apart). */
function contentTypeOf(attachment: Attachment): string {
  const type = attachment.contentType || 'application/octet-stream';
  const header = attachment.headers.get('content-type') as { params?: { charset?: unknown } } | undefined;
  const charset = header?.params?.charset;
  return typeof charset === 'string' && /^[\w.:-]+$/.test(charset) ? `${type}; charset=${charset.toLowerCase()}` : type;
}

/** A parsed message as the store keeps it; header values fall back to the SMTP envelope. */
export function toCapturedMail(parsed: ParsedMail, session: SMTPServerSession, receivedAt: Date): Omit<CapturedMail, 'id'> {
  const envelope = {
    mailFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : null,
    rcptTo: session.envelope.rcptTo.map((recipient) => recipient.address),
  };
  return {
    messageId: parsed.messageId,
    from: addressText(parsed.from) || envelope.mailFrom || '',
    to: addressText(parsed.to) || envelope.rcptTo.join(', '),
    subject: parsed.subject ?? '',
    text: parsed.text ?? '',
    receivedAt,
    attachments: parsed.attachments.map((attachment, index) => ({
      filename: attachment.filename || `attachment-${index + 1}`,
      contentType: contentTypeOf(attachment),
      size: attachment.content.length,
      content: attachment.content,
    })),
    envelope,
  };
}

/**
 * The local mail catcher of demo and test mode: a real SMTP server (smtp-server) on
 * 127.0.0.1 that accepts every message without authentication, parses it (mailparser) and
 * keeps the last 500 in memory for the outbox. Started with the module when the configuration
 * asks for it (`AppConfig.mailCatcher`), closed on shutdown. It never relays anything.
 */
@Injectable()
export class MailCatcherService implements OnModuleInit, OnModuleDestroy {
  readonly store = new CapturedMailStore();
  private readonly logger = new Logger(MailCatcherService.name);
  private server?: SMTPServer;
  private starting?: Promise<MailCatcherAddress>;
  private listeningAt?: MailCatcherAddress;

  constructor(private readonly config: AppConfig) {}

  /** Whether this configuration runs the catcher (demo or test mode without SMTP_URL). */
  get enabled(): boolean {
    return this.config.mailCatcher;
  }

  /** Where it listens, while it runs. */
  get address(): MailCatcherAddress | undefined {
    return this.listeningAt;
  }

  get running(): boolean {
    return this.listeningAt !== undefined;
  }

  async onModuleInit(): Promise<void> {
    if (this.enabled) await this.start();
  }

  async onModuleDestroy(): Promise<void> {
    await this.stop();
  }

  /** Starts listening (once; later calls get the same address). */
  start(): Promise<MailCatcherAddress> {
    if (!this.enabled) {
      return Promise.reject(new Error('The local mail catcher runs only in demo and test mode without SMTP_URL'));
    }
    this.starting ??= this.listen().catch((error: unknown) => {
      this.starting = undefined;
      throw error;
    });
    return this.starting;
  }

  /** Stops listening; clients still connected are cut off after a short grace period. */
  async stop(): Promise<void> {
    await this.starting?.catch(() => undefined);
    const server = this.server;
    this.server = undefined;
    this.starting = undefined;
    this.listeningAt = undefined;
    if (!server) return;
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  private async listen(): Promise<MailCatcherAddress> {
    const server = new SMTPServer({
      banner: 'Tacet local mail catcher (demo and test mode); nothing is relayed',
      disabledCommands: ['STARTTLS'],
      authOptional: true,
      size: MAIL_CATCHER_MAX_BYTES,
      closeTimeout: CLOSE_GRACE_MS,
      logger: false,
      onData: (stream, session, callback) => {
        this.receive(stream, session).then(
          () => callback(),
          (error: unknown) => callback(error instanceof Error ? error : new Error(String(error))),
        );
      },
    });
    // A client that drops its connection is not the catcher's problem; without a listener
    // such an error would crash the process.
    server.on('error', (error: Error) => this.logger.warn(`Mail catcher: ${error.message}`));
    await new Promise<void>((resolve, reject) => {
      server.server.once('error', reject);
      server.listen(0, MAIL_CATCHER_HOST, () => {
        server.server.off('error', reject);
        resolve();
      });
    });
    const { port } = server.server.address() as AddressInfo;
    this.server = server;
    this.listeningAt = { host: MAIL_CATCHER_HOST, port };
    this.logger.log(`Local mail catcher listening on ${MAIL_CATCHER_HOST}:${port}; admins read it at /admin/outbox`);
    return this.listeningAt;
  }

  private async receive(stream: SMTPServerDataStream, session: SMTPServerSession): Promise<void> {
    const parsed = await simpleParser(stream);
    // Over the SIZE limit the server answers 552 whatever happens here: keep nothing.
    if (stream.sizeExceeded) return;
    this.store.add(toCapturedMail(parsed, session, new Date()));
  }
}
