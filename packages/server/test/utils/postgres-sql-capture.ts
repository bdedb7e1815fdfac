import { DataSource, type QueryRunner } from 'typeorm';

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
  return { queryRunner, statements };
}
