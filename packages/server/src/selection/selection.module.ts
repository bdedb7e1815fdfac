import { Module } from '@nestjs/common';
import { SelectionCatalogReader } from './selection-catalog.reader.js';
import { SelectionController } from './selection.controller.js';
import { SelectionService } from './selection.service.js';

/** Mount selection: the stateless endpoint, and the service the designs use. */
@Module({
  controllers: [SelectionController],
  providers: [SelectionService, SelectionCatalogReader],
  exports: [SelectionService, SelectionCatalogReader],
})
export class SelectionModule {}
