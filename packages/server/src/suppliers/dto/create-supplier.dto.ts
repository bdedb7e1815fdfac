import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional } from 'class-validator';
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

export class CreateSupplierDto {
  @ApiProperty({
    example: 'Quillmere Isolation',
    maxLength: SUPPLIER_NAME_MAX_LENGTH,
    description: 'Unique regardless of case and spacing',
  })
  @SupplierName()
  name: string;

  @ApiPropertyOptional({
    type: String,
    nullable: true,
    example: 'quotes@quillmere.example',
    maxLength: CONTACT_EMAIL_MAX_LENGTH,
    description: 'Where requests for quotation go',
  })
  @IsOptional()
  @ContactEmail()
  contactEmail?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, example: '+1 555 0101', maxLength: PHONE_MAX_LENGTH })
  @IsOptional()
  @Phone()
  phone?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: NOTES_MAX_LENGTH })
  @IsOptional()
  @Notes()
  notes?: string | null;
}
