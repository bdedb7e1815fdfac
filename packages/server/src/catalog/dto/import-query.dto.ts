import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional } from 'class-validator';

export const ON_INVALID = ['refuse', 'skip'] as const;

export type OnInvalid = (typeof ON_INVALID)[number];

export class ImportQueryDto {
  @ApiPropertyOptional({ description: 'Validate and preview only; nothing is written', default: false })
  @IsOptional()
  @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean()
  dryRun: boolean = false;

  @ApiPropertyOptional({
    enum: ON_INVALID,
    enumName: 'ImportOnInvalid',
    default: 'refuse',
    description: 'refuse: any invalid row writes nothing (422); skip: write the valid rows, report the others',
  })
  @IsOptional()
  @IsIn(ON_INVALID)
  onInvalid: OnInvalid = 'refuse';
}
