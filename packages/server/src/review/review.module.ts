import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DesignsModule } from '../designs/designs.module.js';
import { User } from '../users/user.entity.js';
import { DesignTransition } from './design-transition.entity.js';
import { ReviewController } from './review.controller.js';
import { ReviewService } from './review.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([DesignTransition, User]), DesignsModule],
  controllers: [ReviewController],
  providers: [ReviewService],
  exports: [ReviewService],
})
export class ReviewModule {}
