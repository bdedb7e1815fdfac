import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { resolveDataDir } from '../config/app-config.js';
import { databaseOptions } from '../config/database.config.js';

/**
 * The data source for the TypeORM CLI (migration:run / migration:revert / migration:show).
 * It reads only TACET_DATA_DIR and DATABASE_URL, like the server does.
 */
export default new DataSource(
  databaseOptions({
    dataDir: resolveDataDir(process.env.TACET_DATA_DIR),
    databaseUrl: process.env.DATABASE_URL || undefined,
  }),
);
