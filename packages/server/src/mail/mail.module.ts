import { Global, Module } from '@nestjs/common';
import { MailCatcherService } from './mail-catcher.service.js';
import { MailService } from './mail.service.js';
import { OutboxController } from './outbox.controller.js';
import { OutboxService } from './outbox.service.js';

/**
 * E-mail for every feature: inject `MailService` (the module is global). In demo and test
 * mode the local mail catcher receives what is sent and `GET /api/outbox` shows it to admins.
 */
@Global()
@Module({
  controllers: [OutboxController],
  providers: [MailCatcherService, MailService, OutboxService],
  exports: [MailService],
})
export class MailModule {}
