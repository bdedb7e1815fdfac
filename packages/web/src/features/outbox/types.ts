/**
 * The outbox as the API returns it (`GET /api/outbox`, `GET /api/outbox/:id`; demo and test mode
 * only). Aliases of the types generated from the server's OpenAPI document (`@/api/schema`).
 */
import type { ApiSchemas } from '@/api/schema';

/** An attachment's file name and size in bytes. */
export type OutboxAttachment = ApiSchemas['OutboxAttachmentDto'];

/** One captured message in the list; `to` is the To header as text, `receivedAt` ISO 8601. */
export type OutboxMessageSummary = ApiSchemas['OutboxMessageSummaryDto'];

/** One captured message with its sender and plain-text body. */
export type OutboxMessage = ApiSchemas['OutboxMessageDto'];
