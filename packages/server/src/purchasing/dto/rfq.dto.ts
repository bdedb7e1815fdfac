import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsDate, IsIn, IsNumber, IsOptional, IsPositive, IsString, MaxLength } from 'class-validator';
import { IsId } from '../../common/decorators/is-id.decorator.js';
import { DESIGN_STATUSES, type DesignStatus } from '../../designs/design-status.js';
import { UserRefDto } from '../../projects/dto/project.dto.js';
import { SupplierRefDto } from '../../selection/dto/selection-response.dto.js';
import type { RfqEvent } from '../rfq-event.entity.js';
import { RFQ_RECORDABLE, RFQ_STATUSES, type RfqProgressStatus, type RfqStatus } from '../rfq-status.js';
import type { Rfq } from '../rfq.entity.js';

export class CreateRfqDto {
  @ApiProperty() @IsId() supplierId: number;

  @ApiPropertyOptional({ maxLength: 2000, description: 'Added to the e-mail above the list of lines' })
  @IsOptional()
  @IsString()
  @MaxLength(2000)
  message?: string;
}

export class UpdateRfqDto {
  @ApiProperty({ enum: RFQ_RECORDABLE, enumName: 'RfqProgressStatus' }) @IsIn(RFQ_RECORDABLE) status: RfqProgressStatus;

  @ApiPropertyOptional({ description: 'Required with status quoted; in the design BOM currency' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsPositive()
  quotedPrice?: number;

  @ApiPropertyOptional({ type: String, format: 'date-time', description: 'Defaults to now when the status becomes quoted' })
  @IsOptional()
  @Type(() => Date)
  @IsDate()
  quotedAt?: Date;

  @ApiPropertyOptional({ maxLength: 2000 }) @IsOptional() @IsString() @MaxLength(2000) note?: string;
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
  @ApiProperty({ type: Number, nullable: true }) quotedPrice: number | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) quotedAt: string | null;
  @ApiProperty({ type: UserRefDto }) createdBy: UserRefDto;
  @ApiProperty({ type: String, format: 'date-time' }) createdAt: string;
  @ApiProperty({ type: String, format: 'date-time' }) updatedAt: string;
  @ApiProperty({ type: [RfqEventDto], description: 'Oldest first' }) history: RfqEventDto[];

  static from(rfq: Rfq, events: RfqEvent[]): RfqDto {
    return Object.assign(new RfqDto(), {
      id: rfq.id,
      designId: rfq.designId,
      supplier: { id: rfq.supplier.id, name: rfq.supplier.name },
      status: rfq.status,
      messageId: rfq.messageId,
      failureReason: rfq.failureReason,
      quotedPrice: rfq.quotedPrice,
      quotedAt: rfq.quotedAt ? rfq.quotedAt.toISOString() : null,
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
}
