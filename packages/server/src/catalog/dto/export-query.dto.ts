import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';
import { EXPORT_UNITS, type ExportUnits } from '../import/catalog-columns.js';

/** `GET /api/mounts/export.csv?units=`: which unit columns the file carries. */
export class ExportQueryDto {
  @ApiPropertyOptional({
    enum: EXPORT_UNITS,
    enumName: 'CatalogExportUnits',
    description:
      "SI: the metric columns (N, N/mm, mm, °C); US: the US customary ones (lbf, lbf/in, in, °F) where a quantity has them; both: each quantity in both. Default: the signed-in user's unit system",
  })
  @IsOptional()
  @IsIn(EXPORT_UNITS, { message: 'units must be SI, US or both' })
  units?: ExportUnits;
}
