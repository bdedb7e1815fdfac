import { VibrationInputError } from '@tacet/vibration';
import { BadRequestException } from '@nestjs/common';
import { designFrequencies, prefilterBounds, prepareProblem, withInputErrors } from './selection-problem.js';

const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
const criteria = { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0 };

// Model: docs/engineering/selection.md §1–§4 and docs/engineering/forcing.md §1–§4;
// check values: docs/engineering/check-values.md.
describe('designFrequencies', () => {
  it('CV-13 [CF]: 1480 rpm, 6 vanes, 50 Hz → 24.67, 49.33, 100, 148 Hz, lowest first, labelled', () => {
    const list = designFrequencies({ speedRpm: 1480, orders: [1, 2], vaneCount: 6, lineFrequencyHz: 50 });
    expect(list.map((f) => f.frequencyHz.toFixed(2))).toEqual(['24.67', '49.33', '100.00', '148.00']);
    expect(list.map((f) => f.label)).toEqual([
      '1× shaft at 1480 rpm',
      '2× shaft at 1480 rpm',
      '2× line (50 Hz supply)',
      'vane pass (6 vanes) at 1480 rpm',
    ]);
  });

  it('evaluates a speed range at both ends and adds the extra frequencies', () => {
    const list = designFrequencies({ speedRangeRpm: { min: 900, max: 1500 }, orders: [1], extraFrequenciesHz: [7.5] });
    expect(list.map((f) => f.frequencyHz)).toEqual([7.5, 15, 25]);
    expect(list[0].label).toBe('further 7.5 Hz');
    expect(list[1].label).toBe('1× shaft at 900 rpm (minimum speed)');
  });

  it('refuses operating conditions that give no frequency, naming operating', () => {
    expect(() => designFrequencies({ orders: [] })).toThrow(expect.objectContaining({ field: 'operating' }));
    expect(() => designFrequencies({ speedRpm: 1480, orders: [] })).toThrow(expect.objectContaining({ field: 'operating' }));
  });
});

describe('prepareProblem', () => {
  it('computes mass, CG, equal-stiffness loads and the isolation target once (CV-14/CV-15)', () => {
    const problem = prepareProblem({
      components: [
        { name: 'Pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 } },
        { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
        { name: 'Frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 } },
      ],
      mountPoints: CORNERS,
      frequencies: [{ frequencyHz: 24.67 }],
      criteria: { ...criteria, weightMarginPct: 10 },
    });
    expect(problem.massKg).toBe(1000);
    expect(problem.cg.x).toBeCloseTo(0.06, 15);
    // CV-14 inertia I_xx = 26.64375 kg·m² (point masses)
    expect(problem.inertia.xx).toBeCloseTo(26.64375, 10);
    expect(Array.from(problem.equalLoadsN, (f) => f.toFixed(1))).toEqual(['2717.3', '2553.8', '2349.5', '2186.1']);
    expect(problem.transmissibilityTarget).toBeCloseTo(0.1, 15);
    expect(problem.isolationDbTarget).toBeCloseTo(20, 12);
    expect(problem.marginFactor).toBeCloseTo(1.1, 15);
    expect(problem.cgInside).toBe(true);
    const bounds = prefilterBounds(problem);
    // the smallest load with the 10 % margin at full utilisation … the largest load at half utilisation
    expect(bounds.minRatedLoadN).toBeCloseTo((2186.1 * 1.1) / 1.0, 0);
    expect(bounds.maxRatedLoadN).toBeCloseTo(2717.3 / 0.5, 0);
  });

  it("maps the calculation library's refusals to the API field names", () => {
    const collinear = [0, 1, 2].map((i) => ({ label: `P${i}`, x: i, y: 0, z: 0 }));
    const error = (() => {
      try {
        withInputErrors(
          () =>
            prepareProblem({
              components: [{ name: 'M', massKg: 1, cg: { x: 0, y: 0, z: 0 } }],
              mountPoints: collinear,
              frequencies: [{ frequencyHz: 10 }],
              criteria,
            }),
          'input',
        );
      } catch (e) {
        return e as BadRequestException;
      }
      throw new Error('expected a 400');
    })();
    expect(error).toBeInstanceOf(BadRequestException);
    expect(error.getResponse()).toEqual({
      message: 'Validation failed',
      errors: [{ field: 'input.mountPoints', message: expect.stringMatching(/^Mounts are collinear/) }],
    });
    expect(() =>
      withInputErrors(() => {
        throw new VibrationInputError('components[2].massKg', 'must be greater than zero', 'not-positive');
      }),
    ).toThrow(BadRequestException);
  });
});
