import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * One row (id 1) whose `revision` goes up by one in the same transaction as every change to
 * the mounts or suppliers. Whoever keeps a copy of the catalog (the selection's in-memory
 * snapshot) compares revisions to know it is current, across any number of API processes.
 */
@Entity('catalog_revision')
export class CatalogRevision {
  @PrimaryColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer', default: 0 })
  revision: number;
}

/** The id of the one row. */
export const CATALOG_REVISION_ROW = 1;
