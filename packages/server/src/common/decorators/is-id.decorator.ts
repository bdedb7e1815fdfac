import { applyDecorators } from '@nestjs/common';
import { IsInt, Max, Min, type ValidationOptions } from 'class-validator';
import { ID_RANGE_MESSAGE, MAX_ID } from '../ids.js';

/** The field holds a record id: a whole number from 1 to MAX_ID (`{ each: true }` for a list of ids). */
export const IsId = (options?: ValidationOptions): PropertyDecorator =>
  applyDecorators(
    IsInt(options),
    Min(1, { message: `$property ${ID_RANGE_MESSAGE}`, ...options }),
    Max(MAX_ID, { message: `$property ${ID_RANGE_MESSAGE}`, ...options }),
  );
