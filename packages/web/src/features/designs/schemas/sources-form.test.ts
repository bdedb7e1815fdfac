import { inToM, lbfToN, lbToKg } from '@tacet/vibration';

import { unitsFor } from '@/lib/units';
import { demoInput, designFormErrors } from '@/testing/design-fakes';
import type { DesignInput } from '@/types/design-api';

import { toDesignInput, toFormValues, type DesignFormValues } from './design-form';
import { proposeSources, ROTATING_SHARE } from './sources-form';

const SI = unitsFor('SI');
const US = unitsFor('US');

const errorsOf = (values: DesignFormValues) => designFormErrors(values, SI);

/** The demo skid on a drive, with an unbalance, a force at twice the supply, a skip band, poles and a stiffness tolerance. */
function wholeMachineInput(): DesignInput {
  const input = demoInput();
  input.operating = {
    orders: [1],
    speedRangeRpm: { min: 900, max: 1480 },
    skipBandsRpm: [{ min: 1100, max: 1160 }],
    motorPoles: 4,
    sources: [
      {
        label: 'Impeller',
        kind: 'unbalance',
        at: { x: 0.65, y: 0.05, z: 0.5 },
        axis: 'x',
        order: 1,
        rotorMassKg: 30,
        balanceGradeMmPerS: 2.5,
      },
      { label: 'Motor, magnetic', kind: 'force', at: { x: -0.3, y: 0, z: 0.45 }, axis: 'z', amplitudeN: 200, frequencyHz: 100 },
    ],
  };
  input.criteria = { ...input.criteria, stiffnessTolerancePct: 15 };
  return input;
}

describe('whole-machine input in the design form', () => {
  it('round-trips sources, skip bands, motor poles and the stiffness tolerance exactly in SI', () => {
    const input = wholeMachineInput();
    const values = toFormValues(input, SI);
    expect(errorsOf(values)).toEqual({});
    expect(toDesignInput(values, SI)).toEqual(input);
  });

  it('shows positions in inches, masses in lb and forces in lbf, and converts back (exact definitions of the units)', () => {
    const values = toFormValues(wholeMachineInput(), US);
    const [impeller, motor] = values.operating.sources;
    // 0.5 m = 19.685 in; 30 kg = 66.1387 lb; 200 N = 44.9618 lbf
    expect(impeller).toMatchObject({ z: '19.685', rotorMass: '66.1387', balanceGrade: '2.5' });
    expect(motor).toMatchObject({ amplitude: '44.9618', frequencyHz: '100' });
    impeller!.z = '20';
    impeller!.rotorMass = '70';
    motor!.amplitude = '50';
    const input = toDesignInput(values, US)!;
    const sources = input.operating.sources!;
    expect(sources[0]!.at.z).toBeCloseTo(inToM(20), 12);
    expect(sources[0]!.rotorMassKg).toBeCloseTo(lbToKg(70), 9);
    expect(sources[1]!.amplitudeN).toBeCloseTo(lbfToN(50), 9);
    // a fixed frequency replaces the order; a force has no rotor
    expect(sources[1]).not.toHaveProperty('order');
    expect(sources[1]).not.toHaveProperty('rotorMassKg');
  });

  it('leaves the whole-machine parts out when none are given', () => {
    const input = toDesignInput(toFormValues(demoInput(), SI), SI)!;
    expect(input.operating).not.toHaveProperty('sources');
    expect(input.operating).not.toHaveProperty('skipBandsRpm');
    expect(input.operating).not.toHaveProperty('motorPoles');
    expect(input.criteria).not.toHaveProperty('stiffnessTolerancePct');
  });

  it('checks each figure in words', () => {
    const values = toFormValues(wholeMachineInput(), SI);
    values.operating.sources[0]!.balanceGrade = '0.1';
    values.operating.sources[0]!.order = '0';
    values.operating.sources[1]!.frequencyHz = '-5';
    values.operating.motorPoles = '5';
    values.criteria.stiffnessTolerancePct = '60';
    const errors = errorsOf(values);
    expect(errors['operating.sources[0].balanceGrade']).toBe('The balance grade is from G 0.4 to G 4000');
    expect(errors['operating.sources[0].order']).toBe('The order must be more than 0');
    expect(errors['operating.sources[1].frequencyHz']).toBe('The frequency must be more than 0');
    expect(errors['operating.motorPoles']).toBe('A motor has an even number of poles');
    expect(errors['criteria.stiffnessTolerancePct']).toBe('The stiffness tolerance is at most 50 %');
  });

  it('proposes from pumps, fans and motors only, with the stated share of their mass', () => {
    const proposed = proposeSources(
      [
        { name: 'Supply fan', massKg: 200, cg: { x: 1, y: 0, z: 1 } },
        { name: 'Base', massKg: 400, cg: { x: 0, y: 0, z: 0.1 } },
        { name: 'Drive motor', massKg: 150, cg: { x: -1, y: 0, z: 1 } },
      ],
      US,
    );
    expect(proposed.map((s) => s.label)).toEqual(['Supply fan impeller', 'Drive motor rotor']);
    // 200 kg × 0.1 = 20 kg = 20 / 0.45359237 lb = 44.0925 lb; 150 kg × 0.3 = 45 kg = 99.2080 lb; 1 m = 39.3701 in
    expect(ROTATING_SHARE).toEqual({ impeller: 0.1, rotor: 0.3 });
    expect(proposed[0]!.rotorMass).toBe('44.0925');
    expect(proposed[1]!.rotorMass).toBe('99.208');
    expect(proposed[1]!.z).toBe('39.3701');
  });
});
