import { describe, expect, it } from '@jest/globals';
import { identifiersIn } from '@tacet/vibration';
import { messageInWords } from './words.js';

describe('messageInWords', () => {
  it.each([
    ['massKg must be a positive number', 'components.0.massKg', 'Mass must be a positive number'],
    ['property surpriseField should not exist', 'surpriseField', 'Surprise field is not expected here'],
    ['x must be a number conforming to the specified constraints', 'mountPoints.2.x', 'X must be a number'],
    [
      'each value in mountTypes must be one of the following values: open_spring, wire_rope',
      'criteria.mountTypes',
      'Each value in mount types must be one of: open spring, wire rope',
    ],
    ['to must be one of the following values: in_review, draft', 'to', 'The new state must be one of: in check, draft'],
    ['each value in nested property components must be either object or array', 'components', 'Each item of components must be an object'],
    ['components must contain at least 1 elements', 'components', 'Components must have at least one item'],
    [
      'maxUtilization must be greater than minUtilization',
      'criteria.maxUtilization',
      'Highest utilisation must be greater than lowest utilisation',
    ],
    ['lineFrequencyHz must not be greater than 1000', 'operating.lineFrequencyHz', 'Supply frequency must be at most 1000'],
  ])('%s → %s', (message, path, expected) => {
    expect(messageInWords(message, path)).toBe(expected);
    expect(identifiersIn(messageInWords(message, path))).toEqual([]);
  });

  it('leaves unit symbols and plain sentences alone', () => {
    expect(messageInWords('The load must be below 12 kN at 40 dB')).toBe('The load must be below 12 kN at 40 dB');
  });
});
