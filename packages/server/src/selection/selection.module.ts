import { Module } from '@nestjs/common';
import { CatalogRevisionModule } from '../catalog-revision/catalog-revision.module.js';
import { SelectionCatalogReader } from './selection-catalog.reader.js';
import { SelectionController } from './selection.controller.js';
import { SelectionService } from './selection.service.js';

/** Mount selection: the stateless endpoint, and the service the designs use. */
@Module({
  imports: [CatalogRevisionModule],
  controllers: [SelectionController],
  providers: [SelectionService, SelectionCatalogReader],
  exports: [SelectionService, SelectionCatalogReader],
})
export class SelectionModule {}
