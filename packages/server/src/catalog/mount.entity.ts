import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { Supplier } from '../suppliers/supplier.entity.js';
import type { MountType } from './mount-rules.js';

/** Exactly one damping figure per mount (viscous ζ or hysteretic η). */
export const MOUNT_DAMPING_CHECK =
  '("dampingRatio" IS NULL AND "lossFactor" IS NOT NULL) OR ("dampingRatio" IS NOT NULL AND "lossFactor" IS NULL)';

/**
 * One catalog part. Quantities in SI (N, N/m) except where the name carries the unit.
 * Rows are never deleted: a mount is retired (`active: false`).
 */
/** Columns of the index the selection's prefilter reads (range on ratedLoadN, then the figures it needs). */
export const MOUNT_SELECTION_INDEX_COLUMNS = [
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
] as const;

@Entity('mount')
@Index('IDX_mount_supplier_part', ['supplierId', 'partNumber'], { unique: true })
// Covers the selection prefilter: the active rows in a load window are read from the index alone.
@Index('IDX_mount_selection', [...MOUNT_SELECTION_INDEX_COLUMNS])
// Leading mountType (lookups by type); the other columns cover every filter of the catalog search.
@Index('IDX_mount_type', ['mountType', 'active', 'ratedLoadN', 'supplierId', 'partNumber', 'series'])
@Check('CHK_mount_damping', MOUNT_DAMPING_CHECK)
export class Mount {
  @PrimaryGeneratedColumn()
  id: number;

  /** Also the leading column of IDX_mount_supplier_part, which serves lookups by supplier. */
  @Column({ type: 'integer' })
  supplierId: number;

  @ManyToOne(() => Supplier, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'supplierId', foreignKeyConstraintName: 'FK_mount_supplier' })
  supplier: Supplier;

  @Column({ type: 'varchar', length: 80 })
  partNumber: string;

  @Index('IDX_mount_series')
  @Column({ type: 'varchar', length: 80, nullable: true })
  series: string | null;

  @Column({ type: 'varchar', length: 32 })
  mountType: MountType;

  @Column({ type: 'double precision' })
  ratedLoadN: number;

  @Column({ type: 'double precision' })
  verticalStiffnessNPerM: number;

  @Column({ type: 'double precision', nullable: true })
  horizontalStiffnessNPerM: number | null;

  /** Null: the supplier gives none (the selection assumes one and says so). */
  @Column({ type: 'double precision', nullable: true })
  dynamicStiffnessRatio: number | null;

  @Column({ type: 'double precision', nullable: true })
  dampingRatio: number | null;

  @Column({ type: 'double precision', nullable: true })
  lossFactor: number | null;

  @Column({ type: 'double precision', nullable: true })
  maxDeflectionMm: number | null;

  @Column({ type: 'double precision', nullable: true })
  tempMinC: number | null;

  @Column({ type: 'double precision', nullable: true })
  tempMaxC: number | null;

  @Column({ type: 'double precision', nullable: true })
  heightMm: number | null;

  /** Horizontal restraint rating (strength level), N; null where the supplier gives none. */
  @Column({ type: 'double precision', nullable: true })
  restraintCapacityN: number | null;

  /** Uplift rating (strength level), N; null where the supplier gives none. */
  @Column({ type: 'double precision', nullable: true })
  upliftCapacityN: number | null;

  /** Price of one mount in `currency` (list price; binary floating point is enough here). */
  @Column({ type: 'double precision', nullable: true })
  unitPrice: number | null;

  @Column({ type: 'varchar', length: 3, default: 'USD' })
  currency: string;

  @Column({ type: 'integer', nullable: true })
  leadTimeDays: number | null;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
