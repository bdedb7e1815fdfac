import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AppConfig } from '../config/app-config.js';
import { databaseOptions } from '../config/database.config.js';

/** The one TypeORM connection (migrations run when it opens). */
@Module({
  imports: [
    TypeOrmModule.forRootAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => databaseOptions(config),
    }),
  ],
})
export class DatabaseModule {}
