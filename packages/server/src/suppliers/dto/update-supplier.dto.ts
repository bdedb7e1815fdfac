import { ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { IsBoolean } from 'class-validator';
import { PresentOptional } from '../../common/decorators/present-optional.decorator.js';
import { CreateSupplierDto } from './create-supplier.dto.js';

/**
 * A partial change: every field of a new supplier, optional; `null` (or an empty string) clears
 * contactEmail, phone and notes, and is refused for name and active (`skipNullProperties: false`).
 */
export class UpdateSupplierDto extends PartialType(CreateSupplierDto, { skipNullProperties: false }) {
  @ApiPropertyOptional({ description: 'false retires the supplier: its mounts leave searches and the export' })
  @PresentOptional()
  @IsBoolean()
  active?: boolean;
}
