import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Design } from '../designs/design.entity.js';
import { DesignsModule } from '../designs/designs.module.js';
import { ReviewModule } from '../review/review.module.js';
import { Supplier } from '../suppliers/supplier.entity.js';
import { VerificationsModule } from '../verifications/verifications.module.js';
import { PurchasingController } from './purchasing.controller.js';
import { PurchasingService } from './purchasing.service.js';
import { RfqEvent } from './rfq-event.entity.js';
import { RfqLine } from './rfq-line.entity.js';
import { Rfq } from './rfq.entity.js';
import { RfqsController } from './rfqs.controller.js';
import { RfqsService } from './rfqs.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Rfq, RfqEvent, RfqLine, Supplier, Design]), DesignsModule, ReviewModule, VerificationsModule],
  controllers: [PurchasingController, RfqsController],
  providers: [PurchasingService, RfqsService],
})
export class PurchasingModule {}
