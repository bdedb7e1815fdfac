import { unitsFor } from '@/lib/units';
import { demoInput, designFormErrors } from '@/testing/design-fakes';
import type { DesignInput } from '@/types/design-api';

import { describeErrors, serverErrorsToForm, toDesignInput, toFormValues, type DesignFormValues } from './design-form';

const SI = unitsFor('SI');
const US = unitsFor('US');

/** The demo input with a drained pump and a steel frame under A and B (invented figures). */
function withExtras(): DesignInput {
  const input = demoInput();
  input.components[0].altMassKg = 240;
  input.mountPoints[0].supportStiffnessNPerMm = 5000;
  input.mountPoints[1].supportStiffnessNPerMm = 12500;
  return input;
}

const errorsOf = (values: DesignFormValues) => designFormErrors(values, SI);

describe('second mass and support stiffness in the design form', () => {
  it('shows the saved values and sends them back unchanged in SI', () => {
    const input = withExtras();
    const values = toFormValues(input, SI);
    expect(values.components[0].altMass).toBe('240');
    expect(values.components[1].altMass).toBe('');
    expect(values.mountPoints[0].supportStiffness).toBe('5000');
    expect(values.mountPoints[2].supportStiffness).toBe('');
    expect(toDesignInput(values, SI)).toEqual(input);
  });

  it('omits the keys when the boxes are empty', () => {
    const values = toFormValues(withExtras(), SI);
    values.components[0].altMass = '  ';
    values.mountPoints[0].supportStiffness = '';
    const input = toDesignInput(values, SI)!;
    expect('altMassKg' in input.components[0]).toBe(false);
    expect('supportStiffnessNPerMm' in input.mountPoints[0]).toBe(false);
    expect(input.mountPoints[1].supportStiffnessNPerMm).toBe(12500);
  });

  it('shows them in US units and converts what is typed back (1 lb = 0.45359237 kg, 1 lbf = 4.4482216152605 N, 1 in = 25.4 mm)', () => {
    const values = toFormValues(withExtras(), US);
    // 240 kg / 0.45359237 = 529.109 lb; 5000 N/mm = 5e6 N/m / (4.4482216152605 / 0.0254) = 28550.7 lbf/in (hand calculation).
    expect(values.components[0].altMass).toBe('529.109');
    expect(values.mountPoints[0].supportStiffness).toBe('28550.7');
    values.components[0].altMass = '500';
    values.mountPoints[0].supportStiffness = '10000';
    const input = toDesignInput(values, US)!;
    expect(input.components[0].altMassKg).toBeCloseTo(500 * 0.45359237, 9);
    expect(input.mountPoints[0].supportStiffnessNPerMm).toBeCloseTo((10000 * 4.4482216152605) / 25.4, 6);
  });

  it('accepts them empty and asks for positive numbers, in plain words', () => {
    const values = toFormValues(demoInput(), SI);
    expect(errorsOf(values)).toEqual({});
    values.components[0].altMass = '0';
    values.components[1].altMass = 'half';
    values.mountPoints[0].supportStiffness = '-5';
    values.mountPoints[1].supportStiffness = 'soft';
    const errors = errorsOf(values);
    expect(errors['components[0].altMass']).toBe('The second mass must be more than 0');
    expect(errors['components[1].altMass']).toBe('The second mass must be a number');
    expect(errors['mountPoints[0].supportStiffness']).toBe('The support stiffness must be more than 0');
    expect(errors['mountPoints[1].supportStiffness']).toBe('The support stiffness must be a number');
    for (const message of Object.values(errors)) expect(message).not.toMatch(/altMass|supportStiffness|NPerMm|Kg/);
  });

  it('places the server’s problems at the new boxes', () => {
    const errors = serverErrorsToForm([
      { field: 'input.components.0.altMassKg', message: 'Second mass must be more than 0' },
      { field: 'input.mountPoints.2.supportStiffnessNPerMm', message: 'Support stiffness must be more than 0' },
    ]);
    expect(errors).toEqual({
      components: [{ altMass: 'Second mass must be more than 0' }],
      mountPoints: [undefined, undefined, { supportStiffness: 'Support stiffness must be more than 0' }],
    });
    expect(describeErrors(errors, toFormValues(demoInput(), SI))).toEqual([
      'Equipment, row 1 (Pump): Second mass must be more than 0',
      'Mount layout, row 3 (C): Support stiffness must be more than 0',
    ]);
  });
});
