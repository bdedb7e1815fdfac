import { ApiProperty } from '@nestjs/swagger';
import type { CapturedMail } from '../captured-mail-store.js';

export class OutboxAttachmentDto {
  @ApiProperty({ example: 'bom.csv' })
  filename: string;

  @ApiProperty({ example: 1824, description: 'Size of the decoded content in bytes' })
  size: number;
}

/** A message the local mail catcher received, as the outbox lists it. */
export class OutboxMessageSummaryDto {
  @ApiProperty({ example: 12, description: 'Id within this server run (the outbox lives in memory)' })
  id: number;

  @ApiProperty({ example: 'quotes@supplier.example.test', description: 'The To header as text' })
  to: string;

  @ApiProperty({ example: 'Request for quotation' })
  subject: string;

  @ApiProperty({ type: String, format: 'date-time' })
  receivedAt: string;

  @ApiProperty({ type: [OutboxAttachmentDto] })
  attachments: OutboxAttachmentDto[];

  static from(message: CapturedMail): OutboxMessageSummaryDto {
    return Object.assign(new OutboxMessageSummaryDto(), summaryOf(message));
  }
}

/** One captured message with its sender and plain-text body. */
export class OutboxMessageDto extends OutboxMessageSummaryDto {
  @ApiProperty({ example: 'Tacet <no-reply@tacet.test>' })
  from: string;

  @ApiProperty({ description: 'The plain-text body' })
  text: string;

  static from(message: CapturedMail): OutboxMessageDto {
    return Object.assign(new OutboxMessageDto(), summaryOf(message), { from: message.from, text: message.text });
  }
}

function summaryOf(message: CapturedMail) {
  return {
    id: message.id,
    to: message.to,
    subject: message.subject,
    receivedAt: message.receivedAt.toISOString(),
    attachments: message.attachments.map(({ filename, size }) => ({ filename, size })),
  };
}
