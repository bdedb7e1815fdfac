import { BadRequestException, Injectable, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import type { FieldError } from '../filters/all-exceptions.filter.js';

/**
 * Limits on the shape of a JSON body, far above what any DTO accepts (the largest arrays hold
 * 200 items, the deepest body nests 5 levels). They are checked before class-transformer and
 * class-validator see the body: both walk it recursively and element by element, so a 1 MB body
 * nested 10,000 levels deep overflows the stack (a 500) and one holding 300,000 empty objects
 * keeps the server busy for minutes.
 */
export const BODY_LIMITS = {
  depth: 32,
  arrayLength: 1000,
  objectKeys: 200,
  /** Every value in the body (objects, arrays, scalars). */
  values: 20_000,
} as const;

/** Keys that reach an object's prototype when a library merges them (prototype pollution). */
const FORBIDDEN_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

/** A UTF-16 surrogate not paired with its other half (JSON allows `"\ud800"`; it is no Unicode text). */
const LONE_SURROGATE = /\p{Surrogate}/u;

const pathOf = (parent: string, key: string | number): string => (parent ? `${parent}.${key}` : String(key));

/**
 * The first shape problem of a parsed JSON body, or null. Walks the value iteratively (no
 * recursion, so depth cannot overflow the stack) and stops at the first problem.
 */
export function bodyShapeProblem(body: unknown): FieldError | null {
  const stack: Array<{ value: unknown; path: string; depth: number }> = [{ value: body, path: '', depth: 0 }];
  let values = 0;
  while (stack.length > 0) {
    const { value, path, depth } = stack.pop()!;
    if (++values > BODY_LIMITS.values)
      return { field: path || 'body', message: `The request holds more than ${BODY_LIMITS.values} values` };
    if (typeof value === 'string') {
      if (LONE_SURROGATE.test(value)) return { field: path || 'body', message: 'Text must be valid Unicode' };
      continue;
    }
    if (value === null || typeof value !== 'object') continue;
    const field = path || 'body';
    if (depth >= BODY_LIMITS.depth) return { field, message: `The request is nested more than ${BODY_LIMITS.depth} levels deep` };
    if (Array.isArray(value)) {
      if (value.length > BODY_LIMITS.arrayLength) {
        return { field, message: `A list must have at most ${BODY_LIMITS.arrayLength} items` };
      }
      for (let index = value.length - 1; index >= 0; index--) {
        stack.push({ value: value[index], path: pathOf(path, index), depth: depth + 1 });
      }
      continue;
    }
    const keys = Object.keys(value);
    if (keys.length > BODY_LIMITS.objectKeys)
      return { field, message: `A part of the request has more than ${BODY_LIMITS.objectKeys} fields` };
    for (const key of keys) {
      const keyPath = pathOf(path, key);
      if (FORBIDDEN_KEYS.has(key)) return { field: keyPath, message: 'This field name is not allowed' };
      if (LONE_SURROGATE.test(key)) return { field: keyPath, message: 'Field names must be valid Unicode text' };
      stack.push({ value: (value as Record<string, unknown>)[key], path: keyPath, depth: depth + 1 });
    }
  }
  return null;
}

/**
 * The first global pipe: refuses a body whose shape no DTO could accept (see BODY_LIMITS), with
 * the same 400 `Validation failed` answer as the validation pipe that follows it.
 */
@Injectable()
export class BodyShapePipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type !== 'body') return value;
    const problem = bodyShapeProblem(value);
    if (problem) throw new BadRequestException({ message: 'Validation failed', errors: [problem] });
    return value;
  }
}
