import { ValidateIf } from 'class-validator';

/**
 * Makes a field optional without letting `null` through: the field is validated whenever it is
 * present, so `{"name": null}` fails the field's own rules (400) instead of reaching a NOT NULL
 * column (500). class-validator's `@IsOptional()` skips both `undefined` and `null`; use that
 * only for fields that `null` clears.
 */
export const PresentOptional = (): PropertyDecorator => ValidateIf((_object: object, value: unknown) => value !== undefined);
