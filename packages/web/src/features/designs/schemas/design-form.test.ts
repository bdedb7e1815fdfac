import { lbToKg } from '@tacet/vibration';

import { unitsFor } from '@/lib/units';
import { demoInput, designFormErrors } from '@/testing/design-fakes';

import {
  describeErrors,
  numberText,
  parseList,
  serverErrorsToForm,
  toDesignInput,
  toFormValues,
  type DesignFormValues,
} from './design-form';

const SI = unitsFor('SI');
const US = unitsFor('US');

const errorsOf = (values: DesignFormValues, units = SI) => designFormErrors(values, units);

describe('design form values', () => {
  it('round-trips the saved SI input exactly in SI units', () => {
    const input = demoInput();
    expect(toDesignInput(toFormValues(input, SI), SI)).toEqual(input);
  });

  it('shows US units and converts typed values back to SI', () => {
    const values = toFormValues(demoInput(), US);
    // 300 kg = 661.387 lb; 0.65 m = 25.5906 in (1 lb = 0.45359237 kg, 1 in = 25.4 mm: exact definitions).
    expect(values.components[0]).toMatchObject({ mass: '661.387', x: '25.5906' });
    expect(values.criteria.ambientTemp).toBe('77');

    values.components[0]!.mass = '700';
    values.mountPoints[0]!.x = '30';
    values.criteria.ambientTemp = '104';
    const input = toDesignInput(values, US)!;
    expect(input.components[0]!.massKg).toBeCloseTo(lbToKg(700), 9);
    expect(input.components[0]!.massKg).toBeCloseTo(317.515, 3);
    expect(input.mountPoints[0]!.x).toBeCloseTo(0.762, 9);
    expect(input.criteria.ambientTempC).toBeCloseTo(40, 9);
    // Unchanged figures come back within the six significant figures shown.
    expect(input.components[1]!.massKg).toBeCloseTo(450, 3);
  });

  it('keeps optional parts optional', () => {
    const values = toFormValues(demoInput(), SI);
    values.operating.vaneCount = '';
    values.operating.lineFrequencyHz = ' ';
    values.criteria.ambientTemp = '';
    values.components[2] = { ...values.components[2]!, lx: '', ly: '', lz: '' };
    const input = toDesignInput(values, SI)!;
    expect(input.operating).toEqual({ speedRpm: 1480, orders: [1, 2] });
    expect(input.criteria).not.toHaveProperty('ambientTempC');
    expect(input.components[2]).not.toHaveProperty('box');
  });

  it('sends a speed range instead of a fixed speed', () => {
    const values = toFormValues(demoInput(), SI);
    values.operating = { ...values.operating, speedMode: 'range', speedMinRpm: '900', speedMaxRpm: '1480' };
    expect(toDesignInput(values, SI)!.operating).toEqual({
      speedRangeRpm: { min: 900, max: 1480 },
      orders: [1, 2],
      vaneCount: 6,
      lineFrequencyHz: 50,
    });
  });

  it('carries seismic restraint: off by default, on with the gap in the user’s length unit (1 in = 25.4 mm)', () => {
    const values = toFormValues(demoInput(), US);
    expect(values.restraint.enabled).toBe(false);
    expect(toDesignInput(values, US)).not.toHaveProperty('restraint');
    values.restraint = { ...values.restraint, enabled: true, sdsG: '1.2', importanceFactor: '1.5', zOverH: '0.5', snubberGap: '0.25' };
    const input = toDesignInput(values, US)!;
    expect(input.restraint).toEqual({ sdsG: 1.2, importanceFactor: 1.5, zOverH: 0.5, snubberGapMm: 6.35 });
    expect(toFormValues(input, SI).restraint).toMatchObject({ enabled: true, snubberGap: '6.35', ap: '', rp: '' });
    expect(toDesignInput(toFormValues(input, SI), SI)!.restraint).toEqual(input.restraint);
    values.restraint.enabled = false;
    expect(toDesignInput(values, US)).not.toHaveProperty('restraint');
  });

  it('checks the restraint figures only when the check is on, in words', () => {
    const values = toFormValues(demoInput(), SI);
    values.restraint = { ...values.restraint, sdsG: 'lots', zOverH: '3' };
    expect(errorsOf(values)).toEqual({});
    values.restraint.enabled = true;
    expect(errorsOf(values)).toMatchObject({
      'restraint.sdsG': 'S_DS must be a number',
      'restraint.zOverH': 'z/h is from 0 (grade) to 1 (roof)',
    });
    values.restraint = { ...values.restraint, sdsG: '150', zOverH: '0', rp: '20', snubberGap: '-1' };
    expect(errorsOf(values)).toEqual({
      'restraint.sdsG': 'S_DS must be at most 4 g: give it in g, not in %',
      'restraint.rp': 'R_p is from 1 to 12',
      'restraint.snubberGap': 'The gap cannot be negative',
    });
    values.restraint.sdsG = '';
    expect(errorsOf(values)['restraint.sdsG']).toBe('Enter S_DS, in g');
  });

  it('formats numbers for the input boxes without float noise', () => {
    expect(numberText(0.1 + 0.2)).toBe('0.3');
    expect(numberText(undefined)).toBe('');
    expect(parseList('1, 2;3 4')).toEqual([1, 2, 3, 4]);
    expect(parseList('1, two')).toBeUndefined();
  });
});

describe('design form validation', () => {
  it('accepts the demo input', () => {
    expect(errorsOf(toFormValues(demoInput(), SI))).toEqual({});
  });

  it('asks for a positive mass and finite numbers, in words', () => {
    const values = toFormValues(demoInput(), SI);
    values.components[0]!.mass = '0';
    values.components[1]!.x = 'abc';
    values.components[2]!.mass = '';
    const errors = errorsOf(values);
    expect(errors['components[0].mass']).toBe('The mass must be more than 0');
    expect(errors['components[1].x']).toBe('x must be a number');
    expect(errors['components[2].mass']).toBe('Enter the mass');
  });

  it('wants all three box dimensions or none', () => {
    const values = toFormValues(demoInput(), SI);
    values.components[2]!.ly = '';
    expect(errorsOf(values)['components[2].ly']).toBe('Give all three box dimensions, or none');
  });

  it('needs three mount points with their own labels', () => {
    const values = toFormValues(demoInput(), SI);
    values.mountPoints[1]!.label = 'A';
    expect(errorsOf(values)['mountPoints']).toBe('Each mount point needs its own label');
    values.mountPoints = values.mountPoints.slice(0, 2);
    expect(errorsOf(values)['mountPoints']).toBe('Give at least 3 mount points');
  });

  it('checks speeds, orders and the utilisation window', () => {
    const values = toFormValues(demoInput(), SI);
    values.operating = { ...values.operating, speedMode: 'range', speedMinRpm: '1500', speedMaxRpm: '900', orders: '1, x' };
    values.criteria.minUtilization = '0.9';
    values.criteria.maxUtilization = '0.8';
    const errors = errorsOf(values);
    expect(errors['operating.speedMaxRpm']).toBe('The highest speed cannot be below the lowest');
    expect(errors['operating.orders']).toBe('Orders: give numbers separated by commas');
    expect(errors['criteria.maxUtilization']).toBe('The highest utilisation must be above the lowest');
  });

  it('needs something to isolate from', () => {
    const values = toFormValues(demoInput(), SI);
    values.operating = { ...values.operating, speedRpm: '', lineFrequencyHz: '', extraFrequenciesHz: '' };
    expect(errorsOf(values)['operating.speedRpm']).toMatch(/Give a speed or a supply frequency/);
  });

  it('limits the ambient temperature in the user’s unit', () => {
    const values = toFormValues(demoInput(), US);
    values.criteria.ambientTemp = '800';
    expect(errorsOf(values, US)['criteria.ambientTemp']).toBe('The ambient temperature must be at most 752 °F');
  });

  it('describes problems with where they are', () => {
    const values = toFormValues(demoInput(), SI);
    const text = describeErrors(
      { components: [undefined, { mass: 'The mass must be more than 0' }], mountPoints: 'Each mount point needs its own label' },
      values,
    );
    expect(text).toEqual(['Equipment, row 2 (Motor): The mass must be more than 0', 'Mount layout: Each mount point needs its own label']);
  });
});

describe('serverErrorsToForm', () => {
  it('places the server’s problems at the form’s fields, one message per field', () => {
    expect(
      serverErrorsToForm([
        { field: 'input.components.1.massKg', message: 'Mass must be a positive number' },
        { field: 'input.components.1.massKg', message: 'Mass must be a number' },
        { field: 'input.components.0.cg.x', message: 'X must be a number' },
        { field: 'input.mountPoints', message: 'Mounts are collinear (or coincide): the frame would tip' },
        { field: 'input.operating.speedRangeRpm.max', message: 'Highest speed must be above the lowest' },
        { field: 'input.operating.extraFrequenciesHz.2', message: 'Each value in further frequencies must be a positive number' },
        { field: 'input.criteria.ambientTempC', message: 'Ambient temperature must be at most 400' },
        { field: 'input.somethingElse', message: 'ignored' },
      ]),
    ).toEqual({
      components: [{ x: 'X must be a number' }, { mass: 'Mass must be a positive number' }],
      mountPoints: 'Mounts are collinear (or coincide): the frame would tip',
      operating: {
        speedMaxRpm: 'Highest speed must be above the lowest',
        extraFrequenciesHz: 'Each value in further frequencies must be a positive number',
      },
      criteria: { ambientTemp: 'Ambient temperature must be at most 400' },
    });
  });
});
