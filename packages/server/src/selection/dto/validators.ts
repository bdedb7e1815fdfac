import { IsNumber, registerDecorator, type ValidationArguments, type ValidationOptions } from 'class-validator';

/** A JSON number that is finite (class-validator's IsNumber without NaN / Infinity). */
export const IsFiniteNumber = (options?: ValidationOptions) => IsNumber({ allowNaN: false, allowInfinity: false }, options);

/**
 * The value must be greater than (or, with `orEqual`, at least) another property of the same
 * object; skipped when either is not a number (their own checks report that).
 */
export function IsAbove(property: string, orEqual = false, options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isAbove',
      target: object.constructor,
      propertyName,
      constraints: [property],
      options: {
        message: `${propertyName} must be ${orEqual ? 'at least' : 'greater than'} ${property}`,
        ...options,
      },
      validator: {
        validate(value: unknown, args: ValidationArguments) {
          const other = (args.object as Record<string, unknown>)[property];
          if (typeof value !== 'number' || typeof other !== 'number') return true;
          return orEqual ? value >= other : value > other;
        },
      },
    });
}

/** The value may not be given together with another property of the same object. */
export function NotTogetherWith(property: string, options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'notTogetherWith',
      target: object.constructor,
      propertyName,
      constraints: [property],
      options: { message: `give either ${property} or ${propertyName}, not both`, ...options },
      validator: {
        validate(value: unknown, args: ValidationArguments) {
          const other = (args.object as Record<string, unknown>)[property];
          return value === undefined || value === null || other === undefined || other === null;
        },
      },
    });
}

/** A whole number divisible by 2 (skipped when not a number; its own checks report that). */
export function IsEven(options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isEven',
      target: object.constructor,
      propertyName,
      options: { message: `${propertyName} must be even`, ...options },
      validator: {
        validate: (value: unknown) => typeof value !== 'number' || value % 2 === 0,
      },
    });
}

/** The value may only be given when another property of the same object has one of `values`. */
export function OnlyWhen(property: string, values: readonly unknown[], options: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'onlyWhen',
      target: object.constructor,
      propertyName,
      constraints: [property, values],
      options,
      validator: {
        validate(value: unknown, args: ValidationArguments) {
          return value === undefined || value === null || values.includes((args.object as Record<string, unknown>)[property]);
        },
      },
    });
}
