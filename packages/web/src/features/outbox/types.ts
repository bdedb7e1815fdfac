/**
 * The outbox as the API returns it (mirrors the server's `OutboxMessageSummaryDto` and
 * `OutboxMessageDto`, `GET /api/outbox` and `GET /api/outbox/:id`). Demo and test mode only.
 */
export interface OutboxAttachment {
  filename: string;
  /** Bytes. */
  size: number;
}

export interface OutboxMessageSummary {
  id: number;
  /** The To header as text, e.g. `Quotes <quotes@example.test>, sales@example.test`. */
  to: string;
  subject: string;
  /** ISO 8601 date-time. */
  receivedAt: string;
  attachments: OutboxAttachment[];
}

export interface OutboxMessage extends OutboxMessageSummary {
  from: string;
  /** The plain-text body. */
  text: string;
}
