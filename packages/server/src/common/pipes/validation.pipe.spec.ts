import { Type } from 'class-transformer';
import { IsNumber, IsString, MaxLength, ValidateNested } from 'class-validator';
import { BadRequestException } from '@nestjs/common';
import { MAX_FIELD_ERRORS, createValidationPipe } from './validation.pipe.js';

class Point {
  @IsNumber()
  x: number;
}

class Shape {
  @IsString()
  @MaxLength(5)
  label: string;

  @ValidateNested({ each: true })
  @Type(() => Point)
  points: Point[];
}

async function errorsFor(body: unknown) {
  try {
    await createValidationPipe().transform(body, { type: 'body', metatype: Shape });
  } catch (error) {
    expect(error).toBeInstanceOf(BadRequestException);
    return (error as BadRequestException).getResponse();
  }
  throw new Error('expected a validation failure');
}

describe('createValidationPipe', () => {
  it('reports each problem with a dotted field path', async () => {
    await expect(errorsFor({ label: 'too long', points: [{ x: 1 }, { x: 'one' }] })).resolves.toEqual({
      message: 'Validation failed',
      errors: [
        { field: 'label', message: 'Label must be at most 5 characters long' },
        { field: 'points.1.x', message: 'X must be a number' },
      ],
    });
  });

  it('refuses unknown fields', async () => {
    await expect(errorsFor({ label: 'ok', points: [], role: 'admin' })).resolves.toEqual({
      message: 'Validation failed',
      errors: [{ field: 'role', message: 'Role is not expected here' }],
    });
  });

  it(`lists at most ${MAX_FIELD_ERRORS} field errors`, async () => {
    const points = Array.from({ length: MAX_FIELD_ERRORS + 20 }, () => ({ x: 'one' }));
    const response = (await errorsFor({ label: 'ok', points })) as { errors: Array<{ field: string }> };
    expect(response.errors).toHaveLength(MAX_FIELD_ERRORS);
    expect(response.errors[0].field).toBe('points.0.x');
  });

  it('returns a DTO instance when the body is valid', async () => {
    const value = await createValidationPipe().transform({ label: 'ok', points: [{ x: 2 }] }, { type: 'body', metatype: Shape });
    expect(value).toBeInstanceOf(Shape);
    expect(value.points[0]).toBeInstanceOf(Point);
  });
});
