import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional, ValidateIf } from 'class-validator';
import {
  CONTACT_EMAIL_MAX_LENGTH,
  ContactEmail,
  NOTES_MAX_LENGTH,
  Notes,
  PHONE_MAX_LENGTH,
  Phone,
  SUPPLIER_NAME_MAX_LENGTH,
  SupplierName,
} from './supplier-fields.js';

/** A partial change; `null` (or an empty string) clears contactEmail, phone and notes. */
export class UpdateSupplierDto {
  @ApiPropertyOptional({ maxLength: SUPPLIER_NAME_MAX_LENGTH })
  @ValidateIf((dto: UpdateSupplierDto) => dto.name !== undefined)
  @SupplierName()
  name?: string;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: CONTACT_EMAIL_MAX_LENGTH })
  @IsOptional()
  @ContactEmail()
  contactEmail?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: PHONE_MAX_LENGTH })
  @IsOptional()
  @Phone()
  phone?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: NOTES_MAX_LENGTH })
  @IsOptional()
  @Notes()
  notes?: string | null;

  @ApiPropertyOptional({ description: 'false retires the supplier: its mounts leave searches and the export' })
  @ValidateIf((dto: UpdateSupplierDto) => dto.active !== undefined)
  @IsBoolean()
  active?: boolean;
}
