/** One attachment of a captured message, with its bytes. */
export interface CapturedAttachment {
  filename: string;
  contentType: string;
  /** Bytes of the decoded content. */
  size: number;
  content: Buffer;
}

/** A message as the local mail catcher received it over SMTP, parsed. */
export interface CapturedMail {
  id: number;
  /** The `Message-ID` header, as the sender's `send()` reported it. */
  messageId?: string;
  /** `From` header as text (falls back to the SMTP envelope). */
  from: string;
  /** `To` header as text (falls back to the SMTP envelope's recipients). */
  to: string;
  subject: string;
  text: string;
  receivedAt: Date;
  attachments: CapturedAttachment[];
  /** What the SMTP client said in `MAIL FROM` / `RCPT TO`, as the session recorded it. */
  envelope: { mailFrom: string | null; rcptTo: string[] };
}

/** How many messages the catcher keeps; older ones are dropped first. */
export const CAPTURED_MAIL_LIMIT = 500;

/**
 * The catcher's in-memory store: the last `limit` messages, each with an id that is never
 * reused while the process runs.
 */
export class CapturedMailStore {
  private readonly messages: CapturedMail[] = [];
  private nextId = 1;

  constructor(private readonly limit = CAPTURED_MAIL_LIMIT) {
    if (!Number.isInteger(limit) || limit < 1) throw new RangeError('limit must be a positive integer');
  }

  add(message: Omit<CapturedMail, 'id'>): CapturedMail {
    const stored: CapturedMail = { id: this.nextId++, ...message };
    this.messages.push(stored);
    if (this.messages.length > this.limit) this.messages.splice(0, this.messages.length - this.limit);
    return stored;
  }

  /** Newest first (by arrival; ids grow with arrival). */
  list(): CapturedMail[] {
    return [...this.messages].reverse();
  }

  get(id: number): CapturedMail | undefined {
    return this.messages.find((message) => message.id === id);
  }

  get size(): number {
    return this.messages.length;
  }

  clear(): void {
    this.messages.length = 0;
  }
}
