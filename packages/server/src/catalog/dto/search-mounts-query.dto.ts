import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { ArrayMaxSize, IsBoolean, IsIn, IsInt, IsNumber, IsOptional, IsString, Matches, Max, MaxLength, Min } from 'class-validator';
import { IsId } from '../../common/decorators/is-id.decorator.js';
import { MOUNT_TYPES, type MountType } from '../mount-rules.js';

/** Fields `sort` accepts (a leading `-` sorts descending). */
export const MOUNT_SORT_FIELDS = [
  'partNumber',
  'supplier',
  'series',
  'mountType',
  'ratedLoadN',
  'verticalStiffnessNPerM',
  'unitPrice',
  'leadTimeDays',
  'updatedAt',
] as const;

export type MountSortField = (typeof MOUNT_SORT_FIELDS)[number];

export const DEFAULT_MOUNT_SORT = 'supplier,partNumber';

export const MAX_PAGE_SIZE = 500;

/** Highest page number (a million pages of one mount; keeps the row offset an exact integer). */
export const MAX_PAGE = 1_000_000;

const SORT_KEY = `-?(?:${MOUNT_SORT_FIELDS.join('|')})`;
const SORT_PATTERN = new RegExp(`^${SORT_KEY}(?:,${SORT_KEY}){0,3}$`);

/** `a,b` or repeated `x=a&x=b` → `['a', 'b']`; anything else is left for validation to refuse. */
const toList = ({ value }: { value: unknown }): unknown => {
  const items = Array.isArray(value) ? value : [value];
  if (!items.every((item) => typeof item === 'string')) return value;
  return (items as string[])
    .flatMap((item) => item.split(','))
    .map((item) => item.trim())
    .filter(Boolean);
};

/** A query-string number; an empty value counts as absent, a non-number stays to be refused. */
const toNumber = ({ value }: { value: unknown }): unknown => {
  if (value === '') return undefined;
  if (typeof value === 'string' && value.trim() !== '') return Number(value);
  return value;
};

const toNumberList = (params: { value: unknown }): unknown => {
  const list = toList(params);
  return Array.isArray(list) ? list.map((item) => (typeof item === 'string' ? Number(item) : item)) : list;
};

const toBoolean = ({ value }: { value: unknown }): unknown => (value === 'true' ? true : value === 'false' ? false : value);

export class SearchMountsQueryDto {
  @ApiPropertyOptional({ description: 'Case-insensitive text in the part number, series or supplier name', maxLength: 100 })
  @IsOptional()
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() || undefined : value))
  @IsString()
  @MaxLength(100)
  q?: string;

  @ApiPropertyOptional({
    enum: MOUNT_TYPES,
    enumName: 'MountType',
    isArray: true,
    description: 'Mount types; repeat the parameter or separate with commas',
  })
  @IsOptional()
  @Transform(toList)
  @ArrayMaxSize(MOUNT_TYPES.length)
  @IsIn(MOUNT_TYPES, { each: true })
  type?: MountType[];

  @ApiPropertyOptional({ type: [Number], description: 'Supplier ids; repeat the parameter or separate with commas' })
  @IsOptional()
  @Transform(toNumberList)
  @ArrayMaxSize(100)
  @IsId({ each: true })
  supplierId?: number[];

  @ApiPropertyOptional({ description: 'Smallest rated load, N', minimum: 0 })
  @IsOptional()
  @Transform(toNumber)
  @Min(0)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  minLoadN?: number;

  @ApiPropertyOptional({ description: 'Largest rated load, N', minimum: 0 })
  @IsOptional()
  @Transform(toNumber)
  @Min(0)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  maxLoadN?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: MAX_PAGE, default: 1 })
  @IsOptional()
  @Transform(toNumber)
  @Min(1)
  @Max(MAX_PAGE)
  @IsInt()
  page: number = 1;

  @ApiPropertyOptional({ minimum: 1, maximum: MAX_PAGE_SIZE, default: 50 })
  @IsOptional()
  @Transform(toNumber)
  @Min(1)
  @Max(MAX_PAGE_SIZE)
  @IsInt()
  pageSize: number = 50;

  @ApiPropertyOptional({
    description: `Up to four of ${MOUNT_SORT_FIELDS.join(', ')}, comma-separated; a leading "-" sorts descending`,
    default: DEFAULT_MOUNT_SORT,
    example: '-ratedLoadN',
  })
  @IsOptional()
  @IsString()
  @Matches(SORT_PATTERN, {
    message: `sort must list up to four of ${MOUNT_SORT_FIELDS.join(', ')} (comma-separated, "-" for descending)`,
  })
  sort: string = DEFAULT_MOUNT_SORT;

  @ApiPropertyOptional({ description: 'Include retired mounts and mounts of retired suppliers', default: false })
  @IsOptional()
  @Transform(toBoolean)
  @IsBoolean()
  includeRetired: boolean = false;
}
