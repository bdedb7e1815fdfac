import { Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';
import { CATALOG_REVISION_ROW, CatalogRevision } from './catalog-revision.entity.js';

/**
 * The catalog's revision number (see CatalogRevision). Every write to `mount` or `supplier`
 * calls `bump` with the manager of its own transaction, so the new revision becomes visible
 * together with the change, or not at all.
 */
@Injectable()
export class CatalogRevisionService {
  constructor(private readonly dataSource: DataSource) {}

  async current(): Promise<number> {
    const row = await this.dataSource
      .createQueryBuilder(CatalogRevision, 'r')
      .select('r.revision', 'revision')
      .where('r.id = :id', { id: CATALOG_REVISION_ROW })
      .getRawOne<{ revision: number | string }>();
    return Number(row?.revision ?? 0);
  }

  async bump(manager: EntityManager): Promise<void> {
    await manager
      .createQueryBuilder()
      .update(CatalogRevision)
      .set({ revision: () => `${manager.connection.driver.escape('revision')} + 1` })
      .where('id = :id', { id: CATALOG_REVISION_ROW })
      .execute();
  }
}
