import { Catch, HttpStatus, PayloadTooLargeException, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import { UPLOAD_OPTIONS } from '../catalog/import/upload.js';

/** Largest tap-test file accepted: 10 MB holds a raw record of about 300,000 samples. */
export const MAX_TAP_TEST_MB = 10;

/** The multipart field that carries the file. */
export const TAP_TEST_UPLOAD_FIELD = 'file';

/** The catalog import's disk storage (temp folder, random name), with the tap-test limits. */
export const TAP_TEST_UPLOAD_OPTIONS: typeof UPLOAD_OPTIONS = {
  ...UPLOAD_OPTIONS,
  limits: { fileSize: MAX_TAP_TEST_MB * 1024 * 1024, files: 1, fields: 10, fieldSize: 10_000 },
};

/** An oversized upload gets a message that names the limit (413). */
@Catch(PayloadTooLargeException)
export class TapTestTooLargeFilter implements ExceptionFilter {
  catch(_exception: PayloadTooLargeException, host: ArgumentsHost): void {
    host
      .switchToHttp()
      .getResponse<Response>()
      .status(HttpStatus.PAYLOAD_TOO_LARGE)
      .json({
        statusCode: HttpStatus.PAYLOAD_TOO_LARGE,
        message: `The file is larger than ${MAX_TAP_TEST_MB} MB; a tap-test record needs far less (shorten the record or lower the sample rate)`,
      });
  }
}
