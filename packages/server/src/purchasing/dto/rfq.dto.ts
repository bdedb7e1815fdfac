import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsDate,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsPositive,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { IsId } from '../../common/decorators/is-id.decorator.js';
import { DESIGN_STATUSES, type DesignStatus } from '../../designs/design-status.js';
import { UserRefDto } from '../../projects/dto/project.dto.js';
import { SupplierRefDto } from '../../selection/dto/selection-response.dto.js';
import type { RfqEvent } from '../rfq-event.entity.js';
import type { RfqLine } from '../rfq-line.entity.js';
import { RFQ_RECORDABLE, RFQ_STATUSES, type RfqProgressStatus, type RfqStatus } from '../rfq-status.js';
import type { Rfq } from '../rfq.entity.js';

/** Most identical machines one request is for. */
export const MAX_MACHINES = 10_000;

export class CreateRfqDto {
  @ApiProperty() @IsId() supplierId: number;

  @ApiPropertyOptional({ maxLength: 2000, description: 'Added to the e-mail above the list of lines' })
  @IsOptional()
  @IsString()
  @MaxLength(2000)
  message?: string;

  @ApiPropertyOptional({
    minimum: 1,
    maximum: MAX_MACHINES,
    default: 1,
    description: 'Identical machines: every quantity is per machine × this',
  })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(MAX_MACHINES)
  machineCount?: number;
}

export class QuotedLineDto {
  @ApiProperty({ description: 'The line of the request (RfqLineDto.id)' }) @IsId() lineId: number;

  @ApiProperty({ description: 'Price of one piece, in the quote’s currency' })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsPositive()
  @Max(1e9)
  unitPrice: number;

  @ApiPropertyOptional({ minimum: 0, maximum: 3650, description: 'Days from order to delivery' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(3650)
  leadTimeDays?: number;
}

export class UpdateRfqDto {
  @ApiProperty({ enum: RFQ_RECORDABLE, enumName: 'RfqProgressStatus' }) @IsIn(RFQ_RECORDABLE) status: RfqProgressStatus;

  @ApiPropertyOptional({
    type: [QuotedLineDto],
    description: 'With status quoted: a unit price (and lead time) for every line of the request',
  })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => QuotedLineDto)
  lines?: QuotedLineDto[];

  @ApiPropertyOptional({ maxLength: 200, description: 'With status quoted: the supplier’s reference of the quote' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  reference?: string;

  @ApiPropertyOptional({ example: '2026-06-30', description: 'With status quoted: the last day the quote holds (YYYY-MM-DD)' })
  @IsOptional()
  @IsString()
  @Matches(/^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/, { message: 'validUntil must be a date such as 2026-06-30' })
  validUntil?: string;

  @ApiPropertyOptional({ example: 'USD', description: 'With status quoted: the quote’s currency (default: the catalog’s for these lines)' })
  @IsOptional()
  @IsString()
  @Matches(/^[A-Z]{3}$/, { message: 'currency must be a three-letter code such as USD' })
  currency?: string;

  @ApiPropertyOptional({ type: String, format: 'date-time', description: 'When the quote came; defaults to now' })
  @IsOptional()
  @Type(() => Date)
  @IsDate()
  quotedAt?: Date;

  @ApiPropertyOptional({ maxLength: 2000 }) @IsOptional() @IsString() @MaxLength(2000) note?: string;
}

export class RfqLineDto {
  @ApiProperty() id: number;
  @ApiProperty() partNumber: string;
  @ApiProperty({ description: 'Pieces for one machine' }) quantityPerMachine: number;
  @ApiProperty({ description: 'Pieces asked for (per machine × machines)' }) quantity: number;
  @ApiProperty({ type: [String], description: 'Mount points of one machine' }) mountPoints: string[];
  @ApiProperty({ type: Number, nullable: true, description: 'Quoted price of one piece' }) unitPrice: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Quoted lead time' }) leadTimeDays: number | null;

  static from(line: RfqLine): RfqLineDto {
    return Object.assign(new RfqLineDto(), {
      id: line.id,
      partNumber: line.partNumber,
      quantityPerMachine: line.quantityPerMachine,
      quantity: line.quantity,
      mountPoints: line.mountPoints,
      unitPrice: line.unitPrice,
      leadTimeDays: line.leadTimeDays,
    });
  }
}

export class RfqAttachmentDto {
  @ApiProperty({ example: 'North-Loop-P-3-rev1-quote-list.csv' }) filename: string;
  @ApiProperty({ example: 'text/csv' }) contentType: string;
  @ApiProperty({ description: 'bytes' }) size: number;
}

/** Exactly what a request for quotation would send, shown for confirmation before it goes. */
export class RfqPreviewDto {
  @ApiProperty({ type: SupplierRefDto }) supplier: SupplierRefDto;
  @ApiProperty({ description: 'The supplier’s contact e-mail' }) to: string;
  @ApiProperty({ description: 'Where the supplier’s reply goes: the purchaser sending it' }) replyTo: string;
  @ApiProperty() subject: string;
  @ApiProperty({ description: 'The message as the supplier reads it (the request number is given when it is sent)' }) text: string;
  @ApiProperty() machineCount: number;
  @ApiProperty({ type: [RfqLineDto], description: 'The lines asked for (ids 0: not yet recorded)' }) lines: RfqLineDto[];
  @ApiProperty({ type: [RfqAttachmentDto] }) attachments: RfqAttachmentDto[];
}

export class RfqEventDto {
  @ApiProperty({ type: String, format: 'date-time' }) at: string;
  @ApiProperty({ enum: RFQ_STATUSES, enumName: 'RfqStatus' }) status: RfqStatus;
  @ApiProperty({ type: UserRefDto }) user: UserRefDto;
  @ApiProperty({ type: String, nullable: true }) note: string | null;
}

export class RfqDto {
  @ApiProperty() id: number;
  @ApiProperty() designId: number;
  @ApiProperty({ type: SupplierRefDto }) supplier: SupplierRefDto;
  @ApiProperty({ enum: RFQ_STATUSES, enumName: 'RfqStatus' }) status: RfqStatus;
  @ApiProperty({ type: String, nullable: true }) messageId: string | null;
  @ApiProperty({ type: String, nullable: true }) failureReason: string | null;
  @ApiProperty({ description: 'Identical machines the request is for' }) machineCount: number;
  @ApiProperty({ type: [RfqLineDto], description: 'As asked, and as quoted once recorded' }) lines: RfqLineDto[];
  @ApiProperty({ type: Number, nullable: true, description: 'Total of the quote: Σ unit price × quantity' }) quotedPrice: number | null;
  @ApiProperty({ type: String, nullable: true }) quoteCurrency: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'The supplier’s reference' }) quoteReference: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'Last day the quote holds (YYYY-MM-DD)' }) quoteValidUntil: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) quotedAt: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) orderedAt: string | null;
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'Ordered: the delivery is due by (order date + the longest quoted lead time), YYYY-MM-DD',
  })
  dueBy: string | null;
  @ApiProperty({ type: UserRefDto }) createdBy: UserRefDto;
  @ApiProperty({ type: String, format: 'date-time' }) createdAt: string;
  @ApiProperty({ type: String, format: 'date-time' }) updatedAt: string;
  @ApiProperty({ type: [RfqEventDto], description: 'Oldest first' }) history: RfqEventDto[];

  static from(rfq: Rfq, events: RfqEvent[], lines: RfqLine[]): RfqDto {
    return Object.assign(new RfqDto(), {
      id: rfq.id,
      designId: rfq.designId,
      supplier: { id: rfq.supplier.id, name: rfq.supplier.name },
      status: rfq.status,
      messageId: rfq.messageId,
      failureReason: rfq.failureReason,
      machineCount: rfq.machineCount,
      lines: lines.map((line) => RfqLineDto.from(line)),
      quotedPrice: rfq.quotedPrice,
      quoteCurrency: rfq.quoteCurrency,
      quoteReference: rfq.quoteReference,
      quoteValidUntil: rfq.quoteValidUntil,
      quotedAt: rfq.quotedAt ? rfq.quotedAt.toISOString() : null,
      orderedAt: rfq.orderedAt ? rfq.orderedAt.toISOString() : null,
      dueBy: dueBy(rfq, lines),
      createdBy: { id: rfq.createdBy.id, name: rfq.createdBy.name },
      createdAt: rfq.createdAt.toISOString(),
      updatedAt: rfq.updatedAt.toISOString(),
      history: events.map((event) => ({
        at: event.at.toISOString(),
        status: event.status,
        user: { id: event.user.id, name: event.user.name },
        note: event.note,
      })),
    });
  }
}

/** Ordered: the order date plus the longest quoted lead time (null when not ordered or no lead time was quoted). */
export function dueBy(rfq: Pick<Rfq, 'orderedAt'>, lines: Pick<RfqLine, 'leadTimeDays'>[]): string | null {
  const days = lines.map((line) => line.leadTimeDays).filter((d): d is number => d !== null);
  if (!rfq.orderedAt || days.length === 0) return null;
  return new Date(rfq.orderedAt.getTime() + Math.max(...days) * 86_400_000).toISOString().slice(0, 10);
}

/** A request still open, as the purchasing queue lists it: waiting for a quote, quoted, or ordered and due. */
export class OpenRfqDto {
  @ApiProperty() rfqId: number;
  @ApiProperty({ type: SupplierRefDto }) supplier: SupplierRefDto;
  @ApiProperty({ enum: RFQ_STATUSES, enumName: 'RfqStatus' }) status: RfqStatus;
  @ApiProperty({ type: String, format: 'date-time' }) requestedAt: string;
  @ApiProperty({ type: Number, nullable: true }) quotedPrice: number | null;
  @ApiProperty({ type: String, nullable: true }) quoteCurrency: string | null;
  @ApiProperty({ type: String, nullable: true }) quoteReference: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'YYYY-MM-DD' }) quoteValidUntil: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'Ordered: delivery due by, YYYY-MM-DD' }) dueBy: string | null;
}

export class RfqCountsDto {
  @ApiProperty() requested: number;
  @ApiProperty() quoted: number;
  @ApiProperty() ordered: number;
  @ApiProperty() received: number;
  @ApiProperty() failed: number;
}

export class PurchasingDesignDto {
  @ApiProperty() designId: number;
  @ApiProperty() projectId: number;
  @ApiProperty() projectName: string;
  @ApiProperty() name: string;
  @ApiProperty() revision: number;
  @ApiProperty({ enum: DESIGN_STATUSES, enumName: 'DesignStatus' }) status: DesignStatus;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) releasedAt: string | null;
  @ApiProperty() lineCount: number;
  @ApiProperty({ type: Number, nullable: true, description: 'Sum of extended prices (null when the lines mix currencies)' })
  total: number | null;
  @ApiProperty({ type: String, nullable: true }) currency: string | null;
  @ApiProperty({ type: RfqCountsDto }) rfqs: RfqCountsDto;
  @ApiProperty({ type: [OpenRfqDto], description: 'Requests waiting for a quote, quoted, or ordered and not yet received' })
  openRequests: OpenRfqDto[];
}
