import { AxiosError, AxiosHeaders } from 'axios';

import { errorMessage, errorStatus, fieldLabel, formFailure } from './api-errors';

function apiError(status: number, data: unknown, code = 'ERR_BAD_REQUEST'): AxiosError {
  const config = { headers: new AxiosHeaders() };
  return new AxiosError('Request failed', code, config, {}, { status, statusText: '', data, headers: {}, config });
}

describe('errorMessage', () => {
  it('lists every field problem once, in the server’s words, with the list item it is about', () => {
    const error = apiError(400, {
      statusCode: 400,
      message: 'Validation failed',
      errors: [
        { field: 'email', message: 'Email must be an email' },
        { field: 'input.components.1.massKg', message: 'Mass must be a positive number' },
        { field: 'input.mountPoints.2.x', message: 'X must be a number' },
        { field: 'input.mountPoints.2.x', message: 'X must be a number' },
        { field: 'criteria.minIsolationPct', message: 'Minimum isolation must be at most 100' },
      ],
    });
    expect(errorMessage(error)).toBe(
      'Some fields need attention — Email must be an email; Component 2: Mass must be a positive number; ' +
        'Mount point 3: X must be a number; Minimum isolation must be at most 100.',
    );
    expect(errorMessage(error)).not.toMatch(/massKg|mountPoints|›/);
  });

  it('passes the server’s own sentence through', () => {
    expect(errorMessage(apiError(401, { statusCode: 401, message: 'Email or password is incorrect' }))).toBe(
      'Email or password is incorrect.',
    );
    expect(errorMessage(apiError(409, { statusCode: 409, message: 'A user with this email already exists' }))).toBe(
      'A user with this email already exists.',
    );
  });

  it('joins a list of messages', () => {
    expect(errorMessage(apiError(400, { statusCode: 400, message: ['name should not be empty', 'role is invalid'] }))).toBe(
      'Name should not be empty. Role is invalid.',
    );
  });

  it('speaks plainly about server failures, throttling and lost connections', () => {
    expect(errorMessage(apiError(500, { statusCode: 500, message: 'Internal server error' }, 'ERR_BAD_RESPONSE'))).toMatch(
      /^Something went wrong on the server/,
    );
    expect(errorMessage(apiError(429, { statusCode: 429, message: 'ThrottlerException: Too Many Requests' }))).toBe(
      'Too many attempts in a short time. Wait a minute, then try again.',
    );
    expect(errorMessage(new AxiosError('Network Error', 'ERR_NETWORK'))).toBe(
      'Cannot reach the Tacet server. Check your connection and try again.',
    );
  });

  it('falls back on the status when the body says nothing', () => {
    expect(errorMessage(apiError(403, ''))).toBe('Your role does not allow this.');
    expect(errorMessage(apiError(404, undefined))).toBe('That item no longer exists.');
  });

  it('handles errors that did not come from the API', () => {
    expect(errorMessage(new Error('boom'))).toBe('Boom.');
    expect(errorMessage('???')).toBe('Something went wrong. Try again.');
  });
});

describe('formFailure', () => {
  const refused = apiError(400, {
    statusCode: 400,
    message: 'Validation failed',
    errors: [
      { field: 'name', message: 'Name must be at most 120 characters long' },
      { field: 'name', message: 'Name must be text' },
      { field: 'owner', message: 'Owner is not expected here' },
    ],
  });

  it('puts each problem at its field once and leaves the general message for the rest', () => {
    const { fields, general } = formFailure(refused, ['name', 'site']);
    expect(fields).toEqual({ name: 'Name must be at most 120 characters long' });
    expect(general).toBe('Some fields need attention — Owner is not expected here.');
  });

  it('has no general message when every problem is at a field', () => {
    expect(formFailure(refused, (field) => (field === 'owner' ? 'ownerBox' : field)).general).toBeNull();
  });

  it('gives the whole error as the general message when it names no field', () => {
    const conflict = apiError(409, { statusCode: 409, message: 'That name is taken' });
    expect(formFailure(conflict, ['name'])).toEqual({ fields: {}, general: 'That name is taken.' });
    expect(formFailure(new Error('x'), ['name']).fields).toEqual({});
  });

  it('keeps the first problem of each field', () => {
    const error = apiError(400, {
      statusCode: 400,
      message: 'Validation failed',
      errors: [
        { field: 'email', message: 'email must be an email' },
        { field: 'email', message: 'email should not be empty' },
        { field: 'name', message: 'name must be shorter' },
      ],
    });
    expect(formFailure(error, ['email', 'name'])).toEqual({
      fields: { email: 'email must be an email', name: 'name must be shorter' },
      general: null,
    });
    expect(errorStatus(error)).toBe(400);
  });
});

describe('fieldLabel', () => {
  it('turns property paths into words', () => {
    expect(fieldLabel('unitSystem')).toBe('Unit system');
    expect(fieldLabel('mountPoints[2].x')).toBe('Mount points 2 › x');
    expect(fieldLabel('part_number')).toBe('Part number');
  });
});
