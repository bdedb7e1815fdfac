import { ApiProperty } from '@nestjs/swagger';
import { IMPORT_MODES, type ImportMode } from '../catalog-import.entity.js';

export class ImportUserDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ example: 'Cato Catalog' })
  name: string;
}

/** One committed import in the history. */
export class CatalogImportDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ example: 'spring-mounts-2026.csv' })
  fileName: string;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: ImportUserDto })
  user: ImportUserDto;

  @ApiProperty({ enum: IMPORT_MODES, enumName: 'ImportMode' })
  mode: ImportMode;

  @ApiProperty()
  accepted: number;

  @ApiProperty()
  rejected: number;

  @ApiProperty()
  created: number;

  @ApiProperty()
  updated: number;

  @ApiProperty({ description: 'GET /api/mounts/imports/{id}/errors.csv has the rejected rows' })
  hasErrorReport: boolean;
}
