import { Catch, HttpException, HttpStatus, Logger, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { UnitSystem } from '@tacet/vibration';
import type { Request, Response } from 'express';
import { readerUnitSystem } from '../units/reader-units.interceptor.js';
import { wordsInReaderUnits } from '../units/reader-words.js';
import { storageFailureOf } from './storage-failure.js';

export interface FieldError {
  field: string;
  message: string;
}

/** The body of every error response. */
export interface ErrorBody {
  statusCode: number;
  message: string;
  errors?: FieldError[];
}

/** `type` set by body-parser on the errors it raises. */
function bodyParserErrorType(exception: HttpException): string | undefined {
  const cause = exception.cause as { type?: unknown } | undefined;
  return typeof cause?.type === 'string' ? cause.type : undefined;
}

function messageOf(response: string | object, fallback: string): string {
  if (typeof response === 'string') return response;
  const message = (response as { message?: unknown }).message;
  if (Array.isArray(message)) return message.join('; ');
  return typeof message === 'string' ? message : fallback;
}

/**
 * Maps anything thrown to `{statusCode, message, errors?}`: a failure of the storage underneath
 * (read-only, full, I/O error, busy, unreachable; see storage-failure.ts) gives 503 with words
 * for the user, other unexpected errors a bare 500.
 */
export function toErrorBody(exception: unknown): ErrorBody {
  if (!(exception instanceof HttpException)) {
    const storage = storageFailureOf(exception);
    if (storage) return { statusCode: HttpStatus.SERVICE_UNAVAILABLE, message: storage.message };
    return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, message: 'Internal server error' };
  }
  const statusCode = exception.getStatus();
  const parserError = bodyParserErrorType(exception);
  if (parserError === 'entity.parse.failed') {
    return { statusCode, message: 'Request body is not valid JSON' };
  }
  if (statusCode === HttpStatus.PAYLOAD_TOO_LARGE) {
    return { statusCode, message: 'Request body is too large' };
  }
  if (statusCode === HttpStatus.TOO_MANY_REQUESTS) {
    return { statusCode, message: 'Too many requests; try again in a minute' };
  }
  const response = exception.getResponse();
  const body: ErrorBody = { statusCode, message: messageOf(response, exception.message) };
  const errors = typeof response === 'object' ? (response as { errors?: unknown }).errors : undefined;
  if (Array.isArray(errors)) body.errors = errors as FieldError[];
  return body;
}

/** The one exception filter of the app (registered in `configureApp`). */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Exceptions');

  catch(exception: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const request = http.getRequest<Request>();
    const response = http.getResponse<Response>();
    // Figures in the words (a bound "at most ⟦mass:…⟧", a refusal's reason) in the reader's units,
    // as the ReaderUnitsInterceptor writes them in answers; errors never pass through interceptors.
    const body = wordsInReaderUnits(toErrorBody(exception), readerUnitSystem(request as { user?: { unitSystem?: UnitSystem } }));
    const storage = exception instanceof HttpException ? null : storageFailureOf(exception);
    if (storage) {
      // Expected in operation (full disk, read-only volume, database restart): one line, no stack.
      const detail = exception instanceof Error ? exception.message : String(exception);
      this.logger.warn(`${request.method} ${request.originalUrl}: the data store refused it (${storage.code}: ${detail})`);
      if (!response.headersSent) response.setHeader('Retry-After', String(storage.retryAfterSeconds));
    } else if (body.statusCode >= 500 && !(exception instanceof HttpException)) {
      const detail = exception instanceof Error ? exception.stack : String(exception);
      this.logger.error(`${request.method} ${request.originalUrl} failed`, detail);
    }
    if (response.headersSent) {
      response.end();
      return;
    }
    response.status(body.statusCode).json(body);
  }
}
