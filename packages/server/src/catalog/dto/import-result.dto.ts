import { ApiProperty } from '@nestjs/swagger';
import type { ImportPreviewRow, ImportResult } from '../import/import-result.js';
import { DAMPING_MODELS, MOUNT_TYPES, type DampingModel, type MountType } from '../mount-rules.js';

export class ImportProblemDto {
  @ApiProperty({ description: "The file's row: the header is row 1", example: 4 })
  row: number;

  @ApiProperty({ description: 'The column as the file names it; empty for a problem of the whole row', example: 'rated_load_n' })
  column: string;

  @ApiProperty({ example: 'must be a positive number (got "-3")' })
  message: string;
}

const nullableNumber = () => ApiProperty({ type: Number, nullable: true });

/** An accepted row as parsed, in stored units and the Mount JSON names. */
export class ImportPreviewRowDto implements ImportPreviewRow {
  @ApiProperty({ description: "The file's row", example: 2 })
  row: number;

  @ApiProperty({ enum: ['create', 'update'], enumName: 'ImportRowAction' })
  action: 'create' | 'update';

  @ApiProperty({ example: 'Quillmere Isolation' })
  supplierName: string;

  @ApiProperty({ example: 'QM-S1-02400' })
  partNumber: string;

  @ApiProperty({ type: String, nullable: true })
  series: string | null;

  @ApiProperty({ enum: MOUNT_TYPES, enumName: 'MountType' })
  mountType: MountType;

  @ApiProperty({ description: 'N' })
  ratedLoadN: number;

  @ApiProperty({ description: 'N/m' })
  verticalStiffnessNPerM: number;

  @nullableNumber()
  horizontalStiffnessNPerM: number | null;

  @nullableNumber()
  dynamicStiffnessRatio: number | null;

  @ApiProperty({ enum: DAMPING_MODELS, enumName: 'DampingModel' })
  dampingModel: DampingModel;

  @nullableNumber()
  dampingRatio: number | null;

  @nullableNumber()
  lossFactor: number | null;

  @nullableNumber()
  maxDeflectionMm: number | null;

  @nullableNumber()
  tempMinC: number | null;

  @nullableNumber()
  tempMaxC: number | null;

  @nullableNumber()
  heightMm: number | null;

  @nullableNumber()
  restraintCapacityN: number | null;

  @nullableNumber()
  upliftCapacityN: number | null;

  @nullableNumber()
  unitPrice: number | null;

  @ApiProperty()
  currency: string;

  @nullableNumber()
  leadTimeDays: number | null;
}

export class NewSupplierDto {
  @ApiProperty({ example: 'Quillmere Isolaton' }) name: string;
  @ApiProperty({ description: "The file's first row naming it" }) firstRow: number;
  @ApiProperty({ description: 'Valid rows naming it' }) rows: number;
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'An existing supplier with a very similar name (a likely typo)',
    example: 'Quillmere Isolation',
  })
  similarTo: string | null;
}

/** The answer of POST /api/mounts/import (200, and 422 with `statusCode` and `message` added). */
export class ImportResultDto implements ImportResult {
  @ApiProperty({ description: 'Valid rows' })
  accepted: number;

  @ApiProperty({ description: 'Rows with at least one problem' })
  rejected: number;

  @ApiProperty({ description: 'Accepted rows that add a mount (written, or would be)' })
  created: number;

  @ApiProperty({ description: 'Accepted rows that update the mount with the same supplier and part number' })
  updated: number;

  @ApiProperty({ type: [ImportProblemDto], description: 'Every problem, up to 1000' })
  errors: ImportProblemDto[];

  @ApiProperty({ description: 'More problems exist than `errors` holds' })
  errorsTruncated: boolean;

  @ApiProperty({ type: Number, nullable: true, description: 'The recorded import; null when nothing was written' })
  importId: number | null;

  @ApiProperty({ type: [ImportPreviewRowDto], description: 'The first 100 accepted rows' })
  preview: ImportPreviewRowDto[];

  @ApiProperty({
    type: [NewSupplierDto],
    description: 'Suppliers not in the catalog that the file creates (or, in a preview, would create)',
  })
  newSuppliers: NewSupplierDto[];
}

export class ImportRejectedDto extends ImportResultDto {
  @ApiProperty({ example: 422 })
  statusCode: number;

  @ApiProperty({ example: '3 rows have problems; nothing was imported' })
  message: string;
}
