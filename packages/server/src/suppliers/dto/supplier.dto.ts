import { ApiProperty } from '@nestjs/swagger';
import type { Supplier } from '../supplier.entity.js';

export class SupplierDto {
  @ApiProperty({ example: 3 })
  id: number;

  @ApiProperty({ example: 'Quillmere Isolation' })
  name: string;

  @ApiProperty({ type: String, nullable: true, example: 'quotes@quillmere.example' })
  contactEmail: string | null;

  @ApiProperty({ type: String, nullable: true, example: '+1 555 0101' })
  phone: string | null;

  @ApiProperty({ type: String, nullable: true })
  notes: string | null;

  @ApiProperty({ description: 'false: retired (its mounts leave searches and the export)' })
  active: boolean;

  @ApiProperty({ description: 'Active mounts of this supplier', example: 112 })
  mountCount: number;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: String, format: 'date-time' })
  updatedAt: string;

  static from(supplier: Supplier, mountCount: number): SupplierDto {
    return Object.assign(new SupplierDto(), {
      id: supplier.id,
      name: supplier.name,
      contactEmail: supplier.contactEmail,
      phone: supplier.phone,
      notes: supplier.notes,
      active: supplier.active,
      mountCount,
      createdAt: supplier.createdAt.toISOString(),
      updatedAt: supplier.updatedAt.toISOString(),
    });
  }
}
