import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** One field problem of a rejected request; `field` is the dotted property path. */
export class ApiFieldErrorDto {
  @ApiProperty({ example: 'criteria.minIsolationPct' })
  field: string;

  @ApiProperty({ example: 'must be a number between 0 and 100' })
  message: string;
}

/**
 * The body of every error response, as `AllExceptionsFilter` writes it. Documented once in the
 * OpenAPI components (not per route) so that clients are typed from it.
 */
export class ApiErrorDto {
  @ApiProperty({ example: 400 })
  statusCode: number;

  @ApiProperty({ example: 'Validation failed' })
  message: string;

  @ApiPropertyOptional({ type: [ApiFieldErrorDto], description: 'The field problems of a request that failed validation (400)' })
  errors?: ApiFieldErrorDto[];
}
