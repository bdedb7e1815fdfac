import { ServiceUnavailableException } from '@nestjs/common';
import type { DataSource } from 'typeorm';
import { HealthService } from './health.service.js';

describe('HealthService', () => {
  it('is ok when the database answers SELECT 1', async () => {
    const queries: string[] = [];
    const dataSource = { query: async (sql: string) => queries.push(sql) } as unknown as DataSource;
    await expect(new HealthService(dataSource).check()).resolves.toEqual({ status: 'ok' });
    expect(queries).toEqual(['SELECT 1']);
  });

  it('answers 503 "Database unavailable" when the database fails', async () => {
    const dataSource = {
      query: async () => {
        throw new Error('SQLITE_CANTOPEN');
      },
    } as unknown as DataSource;
    const service = new HealthService(dataSource);
    (service as unknown as { logger: { error: () => void } }).logger = { error: () => undefined };
    await expect(service.check()).rejects.toThrow(new ServiceUnavailableException('Database unavailable'));
  });
});
