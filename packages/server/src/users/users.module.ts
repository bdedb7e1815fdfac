import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DemoUsersSeed } from './demo-users.seed.js';
import { InitialAdminService } from './initial-admin.service.js';
import { PasswordService } from './password.service.js';
import { User } from './user.entity.js';
import { UsersController } from './users.controller.js';
import { UsersService } from './users.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([User])],
  controllers: [UsersController],
  providers: [UsersService, PasswordService, InitialAdminService, DemoUsersSeed],
  exports: [UsersService, PasswordService],
})
export class UsersModule {}
