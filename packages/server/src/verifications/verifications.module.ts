import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DesignsModule } from '../designs/designs.module.js';
import { Design } from '../designs/design.entity.js';
import { Project } from '../projects/project.entity.js';
import { User } from '../users/user.entity.js';
import { DemoVerificationSeed } from './demo-verification.seed.js';
import { Verification } from './verification.entity.js';
import { VerificationsController } from './verifications.controller.js';
import { VerificationsService } from './verifications.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Verification, Design, Project, User]), DesignsModule],
  controllers: [VerificationsController],
  providers: [VerificationsService, DemoVerificationSeed],
  exports: [VerificationsService],
})
export class VerificationsModule {}
