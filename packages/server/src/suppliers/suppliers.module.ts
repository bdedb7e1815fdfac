import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Mount } from '../catalog/mount.entity.js';
import { CatalogRevisionModule } from '../catalog-revision/catalog-revision.module.js';
import { DemoSuppliersSeed } from './demo-suppliers.seed.js';
import { Supplier } from './supplier.entity.js';
import { SuppliersController } from './suppliers.controller.js';
import { SuppliersService } from './suppliers.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Supplier, Mount]), CatalogRevisionModule],
  controllers: [SuppliersController],
  providers: [SuppliersService, DemoSuppliersSeed],
  exports: [SuppliersService, TypeOrmModule],
})
export class SuppliersModule {}
