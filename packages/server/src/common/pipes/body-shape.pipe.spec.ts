import { BadRequestException } from '@nestjs/common';
import { BODY_LIMITS, BodyShapePipe, bodyShapeProblem } from './body-shape.pipe.js';

/** `depth` arrays nested in each other, built as text and parsed (as the body parser does). */
const nestedArrays = (depth: number): unknown => JSON.parse(`${'['.repeat(depth)}${']'.repeat(depth)}`);

describe('bodyShapeProblem', () => {
  it('passes an ordinary body, however its strings look', () => {
    const body = {
      name: 'Pump skid \u202e 🚀 \u200b é',
      input: { components: [{ name: 'Pump', massKg: 300, cg: { x: 0, y: 0, z: 0.3 } }], orders: [1, 2] },
      note: null,
    };
    expect(bodyShapeProblem(body)).toBeNull();
    expect(bodyShapeProblem(nestedArrays(BODY_LIMITS.depth))).toBeNull();
  });

  it('refuses nesting deeper than the limit without overflowing the stack (10,000 levels)', () => {
    expect(bodyShapeProblem(nestedArrays(BODY_LIMITS.depth + 1))).toEqual({
      field: Array(BODY_LIMITS.depth).fill(0).join('.'),
      message: expect.stringContaining(`nested more than ${BODY_LIMITS.depth} levels`),
    });
    const deep = JSON.parse(`{"name":${'{"a":'.repeat(10_000)}1${'}'.repeat(10_000)}}`);
    expect(bodyShapeProblem(deep)?.field).toMatch(/^name(\.a)+$/);
  });

  it('refuses over-long arrays, over-wide objects and too many values in all', () => {
    expect(bodyShapeProblem({ components: Array(BODY_LIMITS.arrayLength + 1).fill({}) })).toEqual({
      field: 'components',
      message: `A list must have at most ${BODY_LIMITS.arrayLength} items`,
    });
    const wide = Object.fromEntries(Array.from({ length: BODY_LIMITS.objectKeys + 1 }, (_, i) => [`k${i}`, 1]));
    expect(bodyShapeProblem(wide)?.message).toContain(`more than ${BODY_LIMITS.objectKeys} fields`);
    const many = { a: Array.from({ length: 30 }, () => Array(BODY_LIMITS.arrayLength).fill(1)) };
    expect(bodyShapeProblem(many)?.message).toContain(`more than ${BODY_LIMITS.values} values`);
  });

  it('refuses the prototype-pollution keys wherever they are', () => {
    for (const key of ['__proto__', 'constructor', 'prototype']) {
      const body = JSON.parse(`{"input":{"criteria":{"${key}":{"isAdmin":true}}}}`);
      expect(bodyShapeProblem(body)).toEqual({ field: `input.criteria.${key}`, message: 'This field name is not allowed' });
    }
  });

  it('refuses lone surrogates in values and keys (paired ones are fine)', () => {
    expect(bodyShapeProblem(JSON.parse('{"name":"a\\ud800b"}'))).toEqual({ field: 'name', message: 'Text must be valid Unicode' });
    expect(bodyShapeProblem(JSON.parse('{"tags":["ok","\\udfff"]}'))?.field).toBe('tags.1');
    expect(bodyShapeProblem(JSON.parse('{"\\ud800":1}'))?.message).toBe('Field names must be valid Unicode text');
    expect(bodyShapeProblem(JSON.parse('{"name":"\\ud83d\\ude80"}'))).toBeNull();
  });
});

describe('BodyShapePipe', () => {
  const pipe = new BodyShapePipe();

  it('answers 400 "Validation failed" with the field for a body, and leaves other parameters alone', () => {
    const deep = nestedArrays(100);
    expect(() => pipe.transform(deep, { type: 'body' })).toThrow(BadRequestException);
    let refused: unknown;
    try {
      pipe.transform(JSON.parse('{"name":"x","constructor":1}'), { type: 'body' });
    } catch (error) {
      refused = error;
    }
    expect(refused).toBeInstanceOf(BadRequestException);
    expect((refused as BadRequestException).getResponse()).toEqual({
      message: 'Validation failed',
      errors: [{ field: 'constructor', message: 'This field name is not allowed' }],
    });
    expect(pipe.transform(deep, { type: 'query' })).toBe(deep);
    expect(pipe.transform('42', { type: 'param' })).toBe('42');
  });
});
