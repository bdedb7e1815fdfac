import { crossFieldProblems, dampingModelOf } from './mount-rules.js';

const base = { dampingRatio: 0.01, lossFactor: null, tempMinC: -40, tempMaxC: 120 };

describe('mount rules', () => {
  it('want exactly one damping figure', () => {
    expect(crossFieldProblems(base)).toEqual([]);
    expect(crossFieldProblems({ ...base, dampingRatio: null, lossFactor: 0.2 })).toEqual([]);
    expect(crossFieldProblems({ ...base, dampingRatio: null })).toEqual([{ field: 'dampingRatio', rule: 'damping_missing' }]);
    expect(crossFieldProblems({ ...base, lossFactor: 0.2 })).toEqual([{ field: 'lossFactor', rule: 'damping_both' }]);
  });

  it('want the minimum temperature below the maximum, when both are given', () => {
    expect(crossFieldProblems({ ...base, tempMinC: 120 })).toEqual([{ field: 'tempMinC', rule: 'temperature_order' }]);
    expect(crossFieldProblems({ ...base, tempMaxC: null })).toEqual([]);
  });

  it('name the damping model from the figure given', () => {
    expect(dampingModelOf({ dampingRatio: 0.02 })).toBe('viscous');
    expect(dampingModelOf({ dampingRatio: null })).toBe('hysteretic');
  });
});
