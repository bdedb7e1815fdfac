import { DataSource, Table, type QueryRunner } from 'typeorm';

/**
 * A PostgreSQL query runner that is built but never connected: every statement a migration
 * sends is captured instead of run, so a test can read the SQL a migration compiles to.
 */
export function capturingPostgresQueryRunner(): { queryRunner: QueryRunner; statements: string[] } {
  const dataSource = new DataSource({ type: 'postgres', url: 'postgres://tacet@127.0.0.1:9/tacet' });
  const queryRunner = dataSource.createQueryRunner();
  const statements: string[] = [];
  (queryRunner as unknown as { query: (sql: string) => Promise<unknown> }).query = async (sql: string) => {
    statements.push(sql);
    return [];
  };
  // A migration that changes an existing table names it; the query runner would read that
  // table from the database first, and there is none: hand it the bare table instead.
  (queryRunner as unknown as { getCachedTable: (name: string) => Promise<Table> }).getCachedTable = async (name) => new Table({ name });
  return { queryRunner, statements };
}
