import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Design } from '../designs/design.entity.js';
import { Rfq } from '../purchasing/rfq.entity.js';
import { DesignTransition } from '../review/design-transition.entity.js';
import { MyWorkController } from './my-work.controller.js';
import { MyWorkService } from './my-work.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Design, DesignTransition, Rfq])],
  controllers: [MyWorkController],
  providers: [MyWorkService],
})
export class MyWorkModule {}
