import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CatalogRevisionModule } from '../catalog-revision/catalog-revision.module.js';
import { Project } from '../projects/project.entity.js';
import { ProjectsModule } from '../projects/projects.module.js';
import { SelectionModule } from '../selection/selection.module.js';
import { User } from '../users/user.entity.js';
import { DemoDesignsSeed } from './demo-designs.seed.js';
import { DesignSelection } from './design-selection.entity.js';
import { Design } from './design.entity.js';
import { DesignsController } from './designs.controller.js';
import { DesignsService } from './designs.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Design, DesignSelection, Project, User]), ProjectsModule, SelectionModule, CatalogRevisionModule],
  controllers: [DesignsController],
  providers: [DesignsService, DemoDesignsSeed],
  exports: [DesignsService],
})
export class DesignsModule {}
