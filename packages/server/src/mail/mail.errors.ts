/**
 * Why a message could not be sent, for the caller to record (e.g. on a request for quotation)
 * and show. `reason` is the mail server's or the network's own words; `code` is nodemailer's
 * error code where there is one (`ECONNECTION`, `ESOCKET`, `EENVELOPE`, `EMESSAGE`...).
 */
export class MailSendError extends Error {
  readonly code?: string;
  /** The SMTP reply code when the server refused the message (e.g. 550). */
  readonly responseCode?: number;

  constructor(
    readonly reason: string,
    options: { code?: string; responseCode?: number; cause?: unknown } = {},
  ) {
    super(`The e-mail could not be sent: ${reason}`, { cause: options.cause });
    this.name = 'MailSendError';
    this.code = options.code;
    this.responseCode = options.responseCode;
  }

  /** Wraps whatever nodemailer threw, keeping its code and reply code. */
  static from(error: unknown): MailSendError {
    if (error instanceof MailSendError) return error;
    const details = (typeof error === 'object' && error !== null ? error : {}) as {
      message?: unknown;
      code?: unknown;
      responseCode?: unknown;
    };
    const reason = typeof details.message === 'string' && details.message ? details.message : String(error);
    return new MailSendError(reason, {
      code: typeof details.code === 'string' ? details.code : undefined,
      responseCode: typeof details.responseCode === 'number' ? details.responseCode : undefined,
      cause: error,
    });
  }
}

/**
 * No mail server is configured: outside demo and test mode SMTP_URL must be set. A
 * MailSendError, so callers that record failed sends need only one `catch`.
 */
export class MailNotConfiguredError extends MailSendError {
  constructor() {
    super('no mail server is configured (set SMTP_URL; only demo and test mode have a local mail catcher)', {
      code: 'ENOTCONFIGURED',
    });
    this.name = 'MailNotConfiguredError';
  }
}
