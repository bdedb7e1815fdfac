import { extname } from 'node:path';
import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import type { User } from '../users/user.entity.js';
import { CatalogImport } from './catalog-import.entity.js';
import type { CatalogImportDto } from './dto/catalog-import.dto.js';
import type { ImportQueryDto } from './dto/import-query.dto.js';
import { CatalogImportRejected } from './import/catalog-import-rejected.exception.js';
import { CatalogImportService } from './import/catalog-import.service.js';
import { emptyResult, type ImportResult } from './import/import-result.js';
import { UPLOAD_FIELD } from './import/upload.js';

/** File names the import accepts (the content must be UTF-8 CSV text as well). */
const CSV_EXTENSIONS = new Set(['.csv', '.txt']);

/** The part of an uploaded file the import needs (multer's `Express.Multer.File`). */
export interface UploadedCsv {
  path: string;
  originalname: string;
}

/** Uploads (checked, then handed to the import engine) and the history of imports. */
@Injectable()
export class CatalogImportsService {
  constructor(
    private readonly engine: CatalogImportService,
    @InjectRepository(CatalogImport) private readonly imports: Repository<CatalogImport>,
  ) {}

  async importUpload(user: User, file: UploadedCsv | undefined, query: ImportQueryDto): Promise<ImportResult> {
    if (!file) throw new BadRequestException(`Attach the CSV file as the multipart field "${UPLOAD_FIELD}"`);
    const fileName = file.originalname || 'catalog.csv';
    if (!CSV_EXTENSIONS.has(extname(fileName).toLowerCase())) {
      throw new CatalogImportRejected(`The file must be a CSV file (.csv or .txt); ${fileName} is not`, emptyResult());
    }
    return this.engine.importFile({
      filePath: file.path,
      fileName,
      userId: user.id,
      dryRun: query.dryRun ?? false,
      mode: query.onInvalid === 'skip' ? 'skip_invalid' : 'all_or_nothing',
    });
  }

  /** Every committed import, newest first (without the error reports themselves). */
  async list(): Promise<CatalogImportDto[]> {
    const rows: Array<Record<string, unknown>> = await this.imports
      .createQueryBuilder('i')
      .innerJoin('i.user', 'u')
      .select(['i.id AS id', 'i.fileName AS "fileName"', 'i.createdAt AS "createdAt"', 'i.mode AS mode'])
      .addSelect(['i.accepted AS accepted', 'i.rejected AS rejected', 'i.created AS created', 'i.updated AS updated'])
      .addSelect(['u.id AS "userId"', 'u.name AS "userName"'])
      .addSelect('CASE WHEN i.errorReport IS NULL THEN 0 ELSE 1 END', 'hasErrorReport')
      .orderBy('i.createdAt', 'DESC')
      .addOrderBy('i.id', 'DESC')
      .getRawMany();
    return rows.map((row) => ({
      id: Number(row.id),
      fileName: String(row.fileName),
      createdAt: this.toDate(row.createdAt).toISOString(),
      user: { id: Number(row.userId), name: String(row.userName) },
      mode: row.mode as CatalogImportDto['mode'],
      accepted: Number(row.accepted),
      rejected: Number(row.rejected),
      created: Number(row.created),
      updated: Number(row.updated),
      hasErrorReport: Number(row.hasErrorReport) === 1,
    }));
  }

  /** The rejected rows of a skip-mode import as CSV. */
  async errorReport(id: number): Promise<{ fileName: string; csv: string }> {
    const found = await this.imports.findOne({ where: { id }, select: { id: true, fileName: true, errorReport: true } });
    if (!found) throw new NotFoundException('Import not found');
    if (found.errorReport === null) throw new NotFoundException('This import has no error report');
    return { fileName: `import-${found.id}-errors.csv`, csv: found.errorReport };
  }

  /** A raw timestamp: a Date (PostgreSQL) or SQLite's UTC `YYYY-MM-DD HH:MM:SS[.SSS]` text. */
  private toDate(value: unknown): Date {
    if (value instanceof Date) return value;
    return new Date(`${String(value).replace(' ', 'T')}Z`);
  }
}
