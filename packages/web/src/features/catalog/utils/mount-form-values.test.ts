import { lbfPerInToNPerM, lbfToN } from '@tacet/vibration';

import { unitsFor } from '@/lib/units';
import { makeMount } from '@/testing/catalog-fakes';

import { EMPTY_MOUNT_FORM, formValuesToChanges, formValuesToInput, mountToFormValues } from './mount-form-values';

const SI = unitsFor('SI');
const US = unitsFor('US');

describe('mount form values', () => {
  it('shows a mount in the user’s units', () => {
    const mount = makeMount({ ratedLoadN: 2400, verticalStiffnessNPerM: 72_500, maxDeflectionMm: 50.8, tempMinC: -40, tempMaxC: 100 });
    expect(mountToFormValues(mount, SI)).toMatchObject({
      ratedLoad: '2400',
      verticalStiffness: '72.5',
      maxDeflection: '50.8',
      tempMin: '-40',
    });
    // 50.8 mm = 2 in; −40 °C = −40 °F; 100 °C = 212 °F (definitions of the inch and the Fahrenheit scale).
    expect(mountToFormValues(mount, US)).toMatchObject({ maxDeflection: '2', tempMin: '-40', tempMax: '212' });
  });

  it('sends a new mount in SI, leaving out the empty optional boxes', () => {
    const input = formValuesToInput(
      {
        ...EMPTY_MOUNT_FORM,
        supplierId: '2',
        partNumber: ' TE-E1-01500 ',
        mountType: 'elastomer_mount',
        ratedLoad: '337.2',
        verticalStiffness: '1427.5',
        dynamicStiffnessRatio: '1.4',
        dampingModel: 'hysteretic',
        damping: '0.15',
        maxDeflection: '0.354',
        currency: 'usd',
      },
      US,
    );
    expect(input).toEqual({
      supplierId: 2,
      partNumber: 'TE-E1-01500',
      mountType: 'elastomer_mount',
      ratedLoadN: lbfToN(337.2),
      verticalStiffnessNPerM: lbfPerInToNPerM(1427.5),
      dynamicStiffnessRatio: 1.4,
      lossFactor: 0.15,
      maxDeflectionMm: expect.closeTo(0.354 * 25.4, 10),
      currency: 'USD',
    });
  });

  it('sends only the boxes the user changed, and both damping fields when the model changes', () => {
    const mount = makeMount();
    const initial = mountToFormValues(mount, US);
    expect(formValuesToChanges(initial, initial, US)).toEqual({});
    const changes = formValuesToChanges({ ...initial, dampingModel: 'hysteretic', damping: '0.2', series: '' }, initial, US);
    expect(changes).toEqual({ dampingRatio: null, lossFactor: 0.2, series: null });
  });

  it('carries the restraint ratings in the user’s force unit, and clears one emptied box with null', () => {
    const mount = makeMount({ restraintCapacityN: lbfToN(2000), upliftCapacityN: 4500 });
    const us = mountToFormValues(mount, US);
    expect(us).toMatchObject({ restraintCapacity: '2000' });
    expect(mountToFormValues(mount, SI)).toMatchObject({ upliftCapacity: '4500' });
    const input = formValuesToInput(
      { ...us, supplierId: '1', mountType: 'restrained_spring', restraintCapacity: '1500', upliftCapacity: '' },
      US,
    );
    expect(input.restraintCapacityN).toBe(lbfToN(1500));
    expect(input).not.toHaveProperty('upliftCapacityN');
    expect(formValuesToChanges({ ...us, upliftCapacity: '' }, us, US)).toEqual({ upliftCapacityN: null });
    expect(formValuesToChanges({ ...us, restraintCapacity: '1800' }, us, US)).toEqual({ restraintCapacityN: lbfToN(1800) });
  });
});
