import { BadRequestException, Injectable, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import { ID_RANGE_MESSAGE, MAX_ID } from '../ids.js';

const DIGITS = /^\d{1,10}$/;

/** True for the text of a record id (see MAX_ID). */
export const isIdText = (value: unknown): boolean =>
  typeof value === 'string' && DIGITS.test(value) && Number(value) >= 1 && Number(value) <= MAX_ID;

/**
 * A global pipe: every `:id` path parameter must be a record id, or the answer is 400 with the
 * field named. It runs before the route's own `ParseIntPipe`, which then converts it.
 */
@Injectable()
export class IdParamPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type !== 'param' || metadata.data !== 'id' || isIdText(value)) return value;
    throw new BadRequestException({ message: 'Validation failed', errors: [{ field: 'id', message: `id ${ID_RANGE_MESSAGE}` }] });
  }
}
