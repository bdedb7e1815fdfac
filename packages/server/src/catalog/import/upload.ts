import { randomUUID } from 'node:crypto';
import { rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import {
  Catch,
  HttpStatus,
  Injectable,
  PayloadTooLargeException,
  type ArgumentsHost,
  type CallHandler,
  type ExceptionFilter,
  type ExecutionContext,
  type NestInterceptor,
} from '@nestjs/common';
import type { FileInterceptor } from '@nestjs/platform-express';
import type { Request, Response } from 'express';
import { diskStorage } from 'multer';
import { finalize, type Observable } from 'rxjs';
import { CatalogImportRejected } from './catalog-import-rejected.exception.js';

/** Largest catalog file accepted. */
export const MAX_UPLOAD_MB = 20;
export const MAX_UPLOAD_BYTES = MAX_UPLOAD_MB * 1024 * 1024;

/** The multipart field that carries the file. */
export const UPLOAD_FIELD = 'file';

/** Uploads go to the OS temp folder under a random name (never the client's). */
export const UPLOAD_OPTIONS: NonNullable<Parameters<typeof FileInterceptor>[1]> = {
  storage: diskStorage({
    destination: tmpdir(),
    filename: (_request, _file, callback) => callback(null, `tacet-upload-${randomUUID()}.csv`),
  }),
  limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 10 },
  // Browsers send the file name as raw UTF-8 (busboy's default would read it as Latin-1).
  defParamCharset: 'utf8',
};

/** Deletes the uploaded file once the request is handled, whatever the outcome. */
@Injectable()
export class DeleteUploadInterceptor implements NestInterceptor {
  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const request = context.switchToHttp().getRequest<Request>();
    return next.handle().pipe(
      finalize(() => {
        if (request.file?.path) rmSync(request.file.path, { force: true });
      }),
    );
  }
}

/**
 * Answers a refused import with its whole result (422) and an oversized upload with a
 * message that names the limit (413).
 */
@Catch(CatalogImportRejected, PayloadTooLargeException)
export class CatalogImportExceptionFilter implements ExceptionFilter {
  catch(exception: CatalogImportRejected | PayloadTooLargeException, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    if (exception instanceof CatalogImportRejected) {
      response.status(HttpStatus.UNPROCESSABLE_ENTITY).json(exception.body());
      return;
    }
    response
      .status(HttpStatus.PAYLOAD_TOO_LARGE)
      .json({ statusCode: HttpStatus.PAYLOAD_TOO_LARGE, message: `The file is larger than ${MAX_UPLOAD_MB} MB` });
  }
}
