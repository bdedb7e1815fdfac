import { HttpStatus, UnprocessableEntityException } from '@nestjs/common';
import type { ImportResult } from './import-result.js';

/**
 * 422 for an import that writes nothing: a file that is not a catalog CSV, or invalid rows
 * without "import the valid rows only". The response carries the whole ImportResult
 * (see CatalogImportExceptionFilter), so a client reads it like a successful preview.
 */
export class CatalogImportRejected extends UnprocessableEntityException {
  constructor(
    message: string,
    readonly result: ImportResult,
  ) {
    super({ message, errors: result.errors });
  }

  body(): { statusCode: number; message: string } & ImportResult {
    return { statusCode: HttpStatus.UNPROCESSABLE_ENTITY, message: this.message, ...this.result };
  }
}
