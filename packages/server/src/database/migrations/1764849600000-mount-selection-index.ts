import { Table, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';

const SELECTION_COLUMNS = [
  'active',
  'ratedLoadN',
  'supplierId',
  'series',
  'verticalStiffnessNPerM',
  'dynamicStiffnessRatio',
  'dampingRatio',
  'lossFactor',
  'maxDeflectionMm',
  'unitPrice',
  'currency',
  'leadTimeDays',
  'tempMinC',
  'tempMaxC',
  'mountType',
];

// Table objects (not names) so the schema API needs no look-up of the live table: the same
// migration then also compiles to PostgreSQL SQL without a connection (migrations.spec.ts).
const ACTIVE_LOAD = new TableIndex({ name: 'IDX_mount_active_load', columnNames: ['active', 'ratedLoadN'] });
const SELECTION = new TableIndex({ name: 'IDX_mount_selection', columnNames: SELECTION_COLUMNS });

/**
 * Replaces the (active, ratedLoadN) index by one that also carries every column the selection's
 * prefilter reads, so a selection over a large catalog reads the index alone (no table look-ups).
 * The column list is spelled out here (not imported from the entity) so this migration stays as
 * it was written when the entity changes later.
 */
export class MountSelectionIndex1764849600000 implements MigrationInterface {
  name = 'MountSelectionIndex1764849600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const mount = new Table({ name: 'mount', indices: [ACTIVE_LOAD] });
    await queryRunner.dropIndex(mount, ACTIVE_LOAD);
    await queryRunner.createIndex(mount, SELECTION);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    const mount = new Table({ name: 'mount', indices: [SELECTION] });
    await queryRunner.dropIndex(mount, SELECTION);
    await queryRunner.createIndex(mount, ACTIVE_LOAD);
  }
}
