import * as yup from 'yup';

import { formatNumber, type Units } from '@/lib/units';

import { MOUNT_TYPES, type DampingModel, type MountType } from '../types';

/** Limits the server enforces too (catalog/FORMAT.md); the form says so before sending. */
export const MOUNT_FORM_LIMITS = {
  partNumberMaxLength: 80,
  seriesMaxLength: 80,
  dynamicStiffnessRatio: { min: 1, max: 5 },
  lossFactorMax: 2,
  temperatureC: { min: -80, max: 250 },
  leadTimeDays: { min: 0, max: 730 },
} as const;

/**
 * The mount form as typed: every number is text in the user's units until it is sent, so that
 * an empty box stays empty and a half-typed "1." is not rewritten.
 */
export interface MountFormValues {
  supplierId: string;
  partNumber: string;
  series: string;
  mountType: MountType | '';
  ratedLoad: string;
  verticalStiffness: string;
  horizontalStiffness: string;
  dynamicStiffnessRatio: string;
  dampingModel: DampingModel;
  damping: string;
  maxDeflection: string;
  tempMin: string;
  tempMax: string;
  height: string;
  restraintCapacity: string;
  upliftCapacity: string;
  unitPrice: string;
  currency: string;
  leadTimeDays: string;
}

const NUMBER = 'Enter a number, like 12.5';

const positive = (required?: string) => {
  const base = yup.number().typeError(NUMBER).moreThan(0, 'Must be more than zero');
  return required ? base.required(required) : base.optional();
};

/** The mount form's checks; temperature limits are stated in the user's unit. */
export function mountFormSchema(units: Units) {
  const t = MOUNT_FORM_LIMITS.temperatureC;
  const tUnit = units.label('temperature');
  const tMin = units.toDisplay('temperature', t.min);
  const tMax = units.toDisplay('temperature', t.max);
  const temperatureMessage = `Between ${formatNumber(tMin, 0)} and ${formatNumber(tMax, 0)} ${tUnit}`;
  const temperature = yup
    .number()
    .typeError(NUMBER)
    .optional()
    .test('temperature-range', temperatureMessage, (value) => {
      if (value === undefined) return true;
      const celsius = units.toSi('temperature', value);
      // A hair of tolerance: −112 °F is exactly −80 °C.
      return celsius >= t.min - 1e-9 && celsius <= t.max + 1e-9;
    });

  return yup.object({
    supplierId: yup.string().required('Choose a supplier'),
    partNumber: yup
      .string()
      .trim()
      .required('Enter the part number')
      .max(MOUNT_FORM_LIMITS.partNumberMaxLength, `Keep it to ${MOUNT_FORM_LIMITS.partNumberMaxLength} characters or fewer`),
    series: yup
      .string()
      .trim()
      .max(MOUNT_FORM_LIMITS.seriesMaxLength, `Keep it to ${MOUNT_FORM_LIMITS.seriesMaxLength} characters or fewer`),
    mountType: yup
      .mixed<MountType | ''>()
      .oneOf([...MOUNT_TYPES], 'Choose a mount type')
      .required('Choose a mount type'),
    ratedLoad: positive('Enter the rated load'),
    verticalStiffness: positive('Enter the vertical stiffness'),
    horizontalStiffness: positive(),
    dynamicStiffnessRatio: yup
      .number()
      .typeError(NUMBER)
      .optional()
      .min(MOUNT_FORM_LIMITS.dynamicStiffnessRatio.min, 'Between 1 and 5')
      .max(MOUNT_FORM_LIMITS.dynamicStiffnessRatio.max, 'Between 1 and 5'),
    dampingModel: yup.mixed<DampingModel>().oneOf(['viscous', 'hysteretic']).required(),
    damping: yup
      .number()
      .typeError(NUMBER)
      .required('Enter the damping')
      .moreThan(0, 'Must be more than zero')
      .when('dampingModel', {
        is: 'viscous',
        then: (schema) => schema.lessThan(1, 'A damping ratio is below 1'),
        otherwise: (schema) => schema.max(MOUNT_FORM_LIMITS.lossFactorMax, 'A loss factor is at most 2'),
      }),
    maxDeflection: positive(),
    tempMin: temperature,
    tempMax: temperature.test('temperature-order', 'Must be above the minimum temperature', function (value) {
      const min = this.parent.tempMin as unknown;
      if (value === undefined || min === undefined || min === null || min === '') return true;
      return Number(min) < value;
    }),
    height: positive(),
    restraintCapacity: positive(),
    upliftCapacity: positive(),
    unitPrice: yup.number().typeError(NUMBER).optional().min(0, 'Zero or more'),
    currency: yup
      .string()
      .trim()
      .required('Enter a currency code, like USD')
      .matches(/^[A-Za-z]{3}$/, 'Three letters, like USD or EUR'),
    leadTimeDays: yup
      .number()
      .typeError('Enter whole days')
      .optional()
      .integer('Enter whole days')
      .min(MOUNT_FORM_LIMITS.leadTimeDays.min, 'Zero or more days')
      .max(MOUNT_FORM_LIMITS.leadTimeDays.max, `At most ${MOUNT_FORM_LIMITS.leadTimeDays.max} days`),
  });
}
