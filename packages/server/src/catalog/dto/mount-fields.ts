import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional, type ApiPropertyOptions } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsOptional,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateBy,
  type ValidationOptions,
} from 'class-validator';
import { IsId } from '../../common/decorators/is-id.decorator.js';
import { PresentOptional } from '../../common/decorators/present-optional.decorator.js';
import { CURRENCY_PATTERN, MOUNT_LIMITS, MOUNT_TYPES } from '../mount-rules.js';

/**
 * The validation and documentation of every writable mount field, in one place. The create
 * DTO requires the required fields; the update DTO (`PartialType` of it) makes every field
 * optional, lets the nullable ones be cleared with `null`, and refuses `null` for the others.
 */

const finite = () => IsNumber({ allowNaN: false, allowInfinity: false });

/** value > bound */
const GreaterThan = (bound: number, options?: ValidationOptions) =>
  ValidateBy(
    {
      name: 'greaterThan',
      constraints: [bound],
      validator: {
        validate: (value: unknown) => typeof value === 'number' && value > bound,
        defaultMessage: (args) => `${args?.property} must be greater than ${bound}`,
      },
    },
    options,
  );

/** value < bound */
const LessThan = (bound: number, options?: ValidationOptions) =>
  ValidateBy(
    {
      name: 'lessThan',
      constraints: [bound],
      validator: {
        validate: (value: unknown) => typeof value === 'number' && value < bound,
        defaultMessage: (args) => `${args?.property} must be less than ${bound}`,
      },
    },
    options,
  );

const trim = () => Transform(({ value }) => (typeof value === 'string' ? value.trim() : value));

/** One line of text: no control characters. */
// eslint-disable-next-line no-control-regex -- the pattern is there to refuse control characters
const singleLine = () => Matches(/^[^\u0000-\u0008\u000A-\u001F\u007F]*$/, { message: '$property must be one line of text' });

interface FieldSpec {
  api: ApiPropertyOptions;
  rules: () => PropertyDecorator[];
  /** Required when creating a mount. */
  required: boolean;
  /** May be null (absent) in a stored mount. */
  nullable: boolean;
}

const positive = (description: string, example: number): Omit<FieldSpec, 'required' | 'nullable'> => ({
  api: { type: Number, description, example, minimum: 0, exclusiveMinimum: true },
  rules: () => [finite(), GreaterThan(0)],
});

export const MOUNT_FIELDS = {
  supplierId: {
    api: { type: Number, description: 'Id of the supplier', example: 3 },
    rules: () => [IsId()],
    required: true,
    nullable: false,
  },
  partNumber: {
    api: {
      type: String,
      description: "The supplier's part number (unique per supplier)",
      example: 'QM-S1-02400',
      maxLength: MOUNT_LIMITS.partNumberMaxLength,
    },
    rules: () => [trim(), IsString(), IsNotEmpty(), MaxLength(MOUNT_LIMITS.partNumberMaxLength), singleLine()],
    required: true,
    nullable: false,
  },
  series: {
    api: { type: String, description: 'The family the part belongs to', example: 'S1', maxLength: MOUNT_LIMITS.seriesMaxLength },
    rules: () => [
      Transform(({ value }) => (typeof value === 'string' ? value.trim() || null : value)),
      IsString(),
      MaxLength(MOUNT_LIMITS.seriesMaxLength),
      singleLine(),
    ],
    required: false,
    nullable: true,
  },
  mountType: {
    api: { enum: MOUNT_TYPES, enumName: 'MountType', description: 'Kind of mount', example: 'open_spring' },
    rules: () => [IsIn(MOUNT_TYPES)],
    required: true,
    nullable: false,
  },
  ratedLoadN: { ...positive('Rated (maximum working) static load, N', 2400), required: true, nullable: false },
  verticalStiffnessNPerM: { ...positive('Vertical static stiffness, N/m', 72500), required: true, nullable: false },
  horizontalStiffnessNPerM: { ...positive('Horizontal static stiffness, N/m', 68900), required: false, nullable: true },
  dynamicStiffnessRatio: {
    api: {
      type: Number,
      description:
        'Dynamic-to-static stiffness ratio; leave it out when the supplier gives none (the selection then assumes the unfavourable value of the type and says so)',
      example: 1,
      minimum: MOUNT_LIMITS.dynamicStiffnessRatio.min,
      maximum: MOUNT_LIMITS.dynamicStiffnessRatio.max,
    },
    rules: () => [finite(), Min(MOUNT_LIMITS.dynamicStiffnessRatio.min), Max(MOUNT_LIMITS.dynamicStiffnessRatio.max)],
    required: false,
    nullable: true,
  },
  dampingRatio: {
    api: { type: Number, description: 'Viscous damping ratio ζ, 0 < ζ < 1 (give this or lossFactor)', example: 0.008 },
    rules: () => [finite(), GreaterThan(MOUNT_LIMITS.dampingRatio.min), LessThan(MOUNT_LIMITS.dampingRatio.max)],
    required: false,
    nullable: true,
  },
  lossFactor: {
    api: {
      type: Number,
      description: 'Loss factor η, 0 < η ≤ 2 (give this or dampingRatio)',
      example: 0.15,
      maximum: MOUNT_LIMITS.lossFactor.max,
    },
    rules: () => [finite(), GreaterThan(MOUNT_LIMITS.lossFactor.min), Max(MOUNT_LIMITS.lossFactor.max)],
    required: false,
    nullable: true,
  },
  maxDeflectionMm: { ...positive('Maximum static deflection (travel), mm', 49.7), required: false, nullable: true },
  tempMinC: {
    api: {
      type: Number,
      description: 'Lowest operating temperature, °C',
      example: -40,
      minimum: MOUNT_LIMITS.temperatureC.min,
      maximum: MOUNT_LIMITS.temperatureC.max,
    },
    rules: () => [finite(), Min(MOUNT_LIMITS.temperatureC.min), Max(MOUNT_LIMITS.temperatureC.max)],
    required: false,
    nullable: true,
  },
  tempMaxC: {
    api: {
      type: Number,
      description: 'Highest operating temperature, °C',
      example: 120,
      minimum: MOUNT_LIMITS.temperatureC.min,
      maximum: MOUNT_LIMITS.temperatureC.max,
    },
    rules: () => [finite(), Min(MOUNT_LIMITS.temperatureC.min), Max(MOUNT_LIMITS.temperatureC.max)],
    required: false,
    nullable: true,
  },
  heightMm: { ...positive('Free height, mm', 120), required: false, nullable: true },
  restraintCapacityN: {
    ...positive('Horizontal restraint rating (strength level), N: the horizontal force the restraint carries in any direction', 9000),
    required: false,
    nullable: true,
  },
  upliftCapacityN: {
    ...positive('Uplift rating (strength level), N: the upward pull the restraint carries', 4500),
    required: false,
    nullable: true,
  },
  unitPrice: {
    api: { type: Number, description: 'Price of one mount in `currency`', example: 48.2, minimum: 0 },
    rules: () => [finite(), Min(0)],
    required: false,
    nullable: true,
  },
  currency: {
    api: {
      type: String,
      description: 'Three-letter ISO 4217 code (default USD)',
      example: 'USD',
      pattern: '^[A-Z]{3}$',
      default: MOUNT_LIMITS.defaultCurrency,
    },
    rules: () => [
      Transform(({ value }) => (typeof value === 'string' ? value.trim().toUpperCase() : value)),
      IsString(),
      Matches(CURRENCY_PATTERN, { message: 'currency must be a three-letter code such as USD' }),
    ],
    required: false,
    nullable: false,
  },
  leadTimeDays: {
    api: {
      type: Number,
      description: 'Lead time in whole days',
      example: 21,
      minimum: MOUNT_LIMITS.leadTimeDays.min,
      maximum: MOUNT_LIMITS.leadTimeDays.max,
    },
    rules: () => [IsInt(), Min(MOUNT_LIMITS.leadTimeDays.min), Max(MOUNT_LIMITS.leadTimeDays.max)],
    required: false,
    nullable: true,
  },
  active: {
    api: { type: Boolean, description: 'false retires the mount, true restores it' },
    rules: () => [IsBoolean()],
    required: false,
    nullable: false,
  },
} satisfies Record<string, FieldSpec>;

export type MountFieldName = keyof typeof MOUNT_FIELDS;

/**
 * The decorators of a mount field in a new mount: required fields required, the others optional
 * (nullable ones may be `null`, the rest are validated whenever sent). The update DTO derives
 * from the create DTO (`PartialType`).
 */
export function MountField(name: MountFieldName): PropertyDecorator {
  const spec: FieldSpec = MOUNT_FIELDS[name];
  const rules = spec.rules();
  if (spec.required) return applyDecorators(ApiProperty(spec.api), ...rules);
  if (spec.nullable) {
    return applyDecorators(ApiPropertyOptional({ ...spec.api, nullable: true } as ApiPropertyOptions), IsOptional(), ...rules);
  }
  return applyDecorators(ApiPropertyOptional(spec.api), PresentOptional(), ...rules);
}
