import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';
import type { FieldError } from '../filters/all-exceptions.filter.js';
import { boundWithUnit } from '../units/field-quantity.js';
import { messageInWords } from '../words.js';

/**
 * Flattens class-validator errors to `[{field, message}]`: the dotted property path in `field`,
 * the message in words (`Mass must be a positive number`, never `massKg`); a bound on a quantity
 * is a figure mark the error filter writes in the reader's units ("at most 22046226.2 lb").
 */
export function toFieldErrors(errors: ValidationError[], parent = ''): FieldError[] {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({
      field,
      message: messageInWords(boundWithUnit(message, error.property), field),
    }));
    return [...own, ...toFieldErrors(error.children ?? [], field)];
  });
}

/** Field errors listed in one answer (a body of 1,000 wrong items would otherwise list ten thousand). */
export const MAX_FIELD_ERRORS = 100;

/** The global pipe: unknown fields are refused, payloads become DTO instances. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) =>
      new BadRequestException({ message: 'Validation failed', errors: toFieldErrors(errors).slice(0, MAX_FIELD_ERRORS) }),
  });
}
