import { Injectable, NotFoundException } from '@nestjs/common';
import type { CapturedAttachment, CapturedMail } from './captured-mail-store.js';
import { OutboxMessageDto, OutboxMessageSummaryDto } from './dto/outbox-message.dto.js';
import { MailCatcherService } from './mail-catcher.service.js';

export const OUTBOX_UNAVAILABLE = 'The outbox exists only in demo and test mode';

/** The admin's view of the local mail catcher; a 404 wherever the catcher does not run. */
@Injectable()
export class OutboxService {
  constructor(private readonly catcher: MailCatcherService) {}

  /** Captured messages, newest first. */
  list(): OutboxMessageSummaryDto[] {
    return this.messages().map((message) => OutboxMessageSummaryDto.from(message));
  }

  findOne(id: number): OutboxMessageDto {
    return OutboxMessageDto.from(this.message(id));
  }

  /** Attachment `index` (0-based, in the order of the message's attachment list). */
  attachment(id: number, index: number): CapturedAttachment {
    const attachment = this.message(id).attachments[index];
    if (!attachment) throw new NotFoundException(`Message ${id} in the outbox has no attachment ${index}`);
    return attachment;
  }

  private messages(): CapturedMail[] {
    if (!this.catcher.running) throw new NotFoundException(OUTBOX_UNAVAILABLE);
    return this.catcher.store.list();
  }

  private message(id: number): CapturedMail {
    if (!this.catcher.running) throw new NotFoundException(OUTBOX_UNAVAILABLE);
    const message = this.catcher.store.get(id);
    if (!message) throw new NotFoundException(`No message ${id} in the outbox (it keeps the last 500)`);
    return message;
  }
}
