import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CatalogRevisionModule } from '../catalog-revision/catalog-revision.module.js';
import { SuppliersModule } from '../suppliers/suppliers.module.js';
import { User } from '../users/user.entity.js';
import { CatalogExportService } from './catalog-export.service.js';
import { CatalogImport } from './catalog-import.entity.js';
import { CatalogImportsController } from './catalog-imports.controller.js';
import { CatalogImportsService } from './catalog-imports.service.js';
import { DemoCatalogSeed } from './demo-catalog.seed.js';
import { CatalogImportService } from './import/catalog-import.service.js';
import { MountBatchWriter } from './import/mount-batch-writer.js';
import { Mount } from './mount.entity.js';
import { MountsController } from './mounts.controller.js';
import { MountsService } from './mounts.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Mount, CatalogImport, User]), SuppliersModule, CatalogRevisionModule],
  // CatalogImportsController first: its static paths (/mounts/imports) must precede /mounts/:id.
  controllers: [CatalogImportsController, MountsController],
  providers: [MountsService, CatalogExportService, CatalogImportsService, CatalogImportService, MountBatchWriter, DemoCatalogSeed],
  exports: [MountsService, CatalogImportService],
})
export class CatalogModule {}
