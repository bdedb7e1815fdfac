import { unitsFor } from '@/lib/units';

import { EMPTY_MOUNT_FORM } from '../utils/mount-form-values';
import { mountFormSchema, type MountFormValues } from './mount-schema';

const VALID: MountFormValues = {
  ...EMPTY_MOUNT_FORM,
  supplierId: '1',
  partNumber: 'QM-S1-02400',
  mountType: 'open_spring',
  ratedLoad: '2400',
  verticalStiffness: '72.5',
  damping: '0.008',
};

/** Formik hands yup the values with empty boxes as undefined; this does the same. */
function problems(values: Partial<MountFormValues>, system: 'SI' | 'US' = 'SI'): Record<string, string> {
  const prepared = Object.fromEntries(
    Object.entries({ ...VALID, ...values }).map(([key, value]) => [key, value === '' ? undefined : value]),
  );
  try {
    mountFormSchema(unitsFor(system)).validateSync(prepared, { abortEarly: false });
    return {};
  } catch (error) {
    const inner = (error as { inner: Array<{ path: string; message: string }> }).inner;
    return Object.fromEntries(inner.map((item) => [item.path, item.message]));
  }
}

describe('mount form checks', () => {
  it('accepts a complete mount', () => {
    expect(problems({})).toEqual({});
  });

  it('holds the damping to its model’s range', () => {
    expect(problems({ damping: '1' })).toEqual({ damping: 'A damping ratio is below 1' });
    expect(problems({ dampingModel: 'hysteretic', damping: '1.5' })).toEqual({});
    expect(problems({ dampingModel: 'hysteretic', damping: '2.5' })).toEqual({ damping: 'A loss factor is at most 2' });
  });

  it('states the temperature limits in the user’s unit', () => {
    // −80 … 250 °C is −112 … 482 °F.
    expect(problems({ tempMin: '-120' }, 'US')).toEqual({ tempMin: 'Between -112 and 482 °F' });
    expect(problems({ tempMin: '-112', tempMax: '482' }, 'US')).toEqual({});
    expect(problems({ tempMin: '60', tempMax: '20' })).toEqual({ tempMax: 'Must be above the minimum temperature' });
  });

  it('wants whole days, a three-letter currency and a ratio between 1 and 5', () => {
    expect(problems({ leadTimeDays: '2.5', currency: 'US$', dynamicStiffnessRatio: '0.8' })).toEqual({
      leadTimeDays: 'Enter whole days',
      currency: 'Three letters, like USD or EUR',
      dynamicStiffnessRatio: 'Between 1 and 5',
    });
  });
});
