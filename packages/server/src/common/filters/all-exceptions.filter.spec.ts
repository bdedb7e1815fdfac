import { BadRequestException, HttpException, NotFoundException, ServiceUnavailableException } from '@nestjs/common';
import { toErrorBody } from './all-exceptions.filter.js';

describe('toErrorBody', () => {
  it('keeps the status and message of an HttpException, without Nest\'s "error" field', () => {
    expect(toErrorBody(new NotFoundException('User not found'))).toEqual({ statusCode: 404, message: 'User not found' });
    expect(toErrorBody(new ServiceUnavailableException('Database unavailable'))).toEqual({
      statusCode: 503,
      message: 'Database unavailable',
    });
  });

  it('passes field errors through', () => {
    const errors = [{ field: 'email', message: 'email must be an email' }];
    expect(toErrorBody(new BadRequestException({ message: 'Validation failed', errors }))).toEqual({
      statusCode: 400,
      message: 'Validation failed',
      errors,
    });
  });

  it('joins a list of messages', () => {
    expect(toErrorBody(new BadRequestException(['a is wrong', 'b is wrong'])).message).toBe('a is wrong; b is wrong');
  });

  it('names body-parser failures plainly', () => {
    const syntax = Object.assign(new SyntaxError('Unexpected token } in JSON at position 9'), {
      type: 'entity.parse.failed',
    });
    expect(toErrorBody(new BadRequestException(syntax.message, { cause: syntax }))).toEqual({
      statusCode: 400,
      message: 'Request body is not valid JSON',
    });
    expect(toErrorBody(new HttpException('request entity too large', 413))).toEqual({
      statusCode: 413,
      message: 'Request body is too large',
    });
  });

  it('hides the details of anything unexpected behind a bare 500', () => {
    expect(toErrorBody(new Error('password=hunter2 at /srv/tacet'))).toEqual({
      statusCode: 500,
      message: 'Internal server error',
    });
    expect(toErrorBody('a thrown string')).toEqual({ statusCode: 500, message: 'Internal server error' });
  });
});
