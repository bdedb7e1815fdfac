import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AppConfig } from '../config/app-config.js';
import { databaseOptions } from '../config/database.config.js';
import { openDataSource } from './open-data-source.js';

/** The one TypeORM connection (migrations run when it opens; see openDataSource). */
@Module({
  imports: [
    TypeOrmModule.forRootAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => databaseOptions(config),
      dataSourceFactory: async (options) => {
        if (!options) throw new Error('no database options');
        return openDataSource(options);
      },
    }),
  ],
})
export class DatabaseModule {}
