import {
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  ParseIntPipe,
  Post,
  Query,
  StreamableFile,
  UploadedFile,
  UseFilters,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiConsumes,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiPayloadTooLargeResponse,
  ApiProduces,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { User } from '../users/user.entity.js';
import { CatalogImportsService, type UploadedCsv } from './catalog-imports.service.js';
import { CatalogImportDto } from './dto/catalog-import.dto.js';
import { ImportQueryDto } from './dto/import-query.dto.js';
import { ImportRejectedDto, ImportResultDto } from './dto/import-result.dto.js';
import { CatalogImportExceptionFilter, DeleteUploadInterceptor, MAX_UPLOAD_MB, UPLOAD_FIELD, UPLOAD_OPTIONS } from './import/upload.js';

/** Catalog CSV import and its history. Registered before MountsController (static paths before `:id`). */
@ApiTags('catalog')
@ApiBearerAuth()
@Roles('catalog_manager', 'admin')
@Controller('mounts')
export class CatalogImportsController {
  constructor(private readonly imports: CatalogImportsService) {}

  @Post('import')
  @HttpCode(HttpStatus.OK)
  @UseFilters(CatalogImportExceptionFilter)
  @UseInterceptors(FileInterceptor(UPLOAD_FIELD, UPLOAD_OPTIONS), DeleteUploadInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: [UPLOAD_FIELD],
      properties: { [UPLOAD_FIELD]: { type: 'string', format: 'binary', description: 'Catalog CSV (catalog/FORMAT.md)' } },
    },
  })
  @ApiOkResponse({ type: ImportResultDto, description: 'Imported (or, with dryRun, previewed)' })
  @ApiUnprocessableEntityResponse({
    type: ImportRejectedDto,
    description: 'Nothing written: invalid rows without onInvalid=skip (also for a dry run), or a file that is not a catalog CSV',
  })
  @ApiPayloadTooLargeResponse({ description: `The file is larger than ${MAX_UPLOAD_MB} MB` })
  @ApiBadRequestResponse({ description: 'No file, or bad query parameters' })
  importFile(
    @CurrentUser() user: User,
    @UploadedFile() file: UploadedCsv | undefined,
    @Query() query: ImportQueryDto,
  ): Promise<ImportResultDto> {
    return this.imports.importUpload(user, file, query);
  }

  @Get('imports')
  @ApiOkResponse({ type: [CatalogImportDto], description: 'Committed imports, newest first' })
  listImports(): Promise<CatalogImportDto[]> {
    return this.imports.list();
  }

  @Get('imports/:id/errors.csv')
  @ApiProduces('text/csv')
  @ApiOkResponse({
    schema: { type: 'string', format: 'binary' },
    description: 'The rejected rows: row, column, message, then the original fields',
  })
  @ApiNotFoundResponse({ description: 'No such import, or it has no error report' })
  async errorReport(@Param('id', ParseIntPipe) id: number): Promise<StreamableFile> {
    const { fileName, csv } = await this.imports.errorReport(id);
    return new StreamableFile(Buffer.from(`\ufeff${csv}`, 'utf8'), {
      type: 'text/csv; charset=utf-8',
      disposition: `attachment; filename="${fileName}"`,
    });
  }
}
