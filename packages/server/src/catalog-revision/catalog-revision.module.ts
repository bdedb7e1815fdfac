import { Module } from '@nestjs/common';
import { CatalogRevisionService } from './catalog-revision.service.js';

/** The catalog revision counter, shared by the catalog and suppliers (writers) and the selection (reader). */
@Module({
  providers: [CatalogRevisionService],
  exports: [CatalogRevisionService],
})
export class CatalogRevisionModule {}
