import { BadRequestException } from '@nestjs/common';
import { MAX_ID } from '../ids.js';
import { IdParamPipe, isIdText } from './id-param.pipe.js';

describe('IdParamPipe', () => {
  const pipe = new IdParamPipe();
  const id = { type: 'param', data: 'id' } as const;

  it('passes ids from 1 to 2^31 - 1 (PostgreSQL integer, from its documentation) as they are', () => {
    expect(MAX_ID).toBe(2 ** 31 - 1);
    for (const text of ['1', '42', '999999', String(MAX_ID)]) expect(pipe.transform(text, id)).toBe(text);
  });

  it('answers 400 naming the field for anything else', () => {
    for (const text of ['0', '-1', '1.5', '1e3', ' 1', '0x1F', String(MAX_ID + 1), '99999999999999999999', 'abc', '']) {
      expect(isIdText(text)).toBe(false);
      expect(() => pipe.transform(text, id)).toThrow(BadRequestException);
    }
    let refused: unknown;
    try {
      pipe.transform('2147483648', id);
    } catch (error) {
      refused = error;
    }
    expect((refused as BadRequestException).getResponse()).toEqual({
      message: 'Validation failed',
      errors: [{ field: 'id', message: `id must be a whole number from 1 to ${MAX_ID}` }],
    });
  });

  it('leaves other parameters, bodies and queries alone', () => {
    expect(pipe.transform('-1', { type: 'param', data: 'index' })).toBe('-1');
    expect(pipe.transform({ id: -1 }, { type: 'body' })).toEqual({ id: -1 });
    expect(pipe.transform('x', { type: 'query', data: 'id' })).toBe('x');
  });
});
