import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { User } from '../users/user.entity.js';

export const IMPORT_MODES = ['all_or_nothing', 'skip_invalid'] as const;

export type ImportMode = (typeof IMPORT_MODES)[number];

/** One committed catalog import (dry runs and refused files are not recorded). */
@Entity('catalog_import')
export class CatalogImport {
  @PrimaryGeneratedColumn()
  id: number;

  @Index('IDX_catalog_import_user')
  @Column({ type: 'integer' })
  userId: number;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_catalog_import_user' })
  user: User;

  /** The uploaded file's name, as the client gave it. */
  @Column({ type: 'varchar', length: 255 })
  fileName: string;

  @CreateDateColumn()
  createdAt: Date;

  @Column({ type: 'varchar', length: 16 })
  mode: ImportMode;

  @Column({ type: 'integer' })
  accepted: number;

  @Column({ type: 'integer' })
  rejected: number;

  @Column({ type: 'integer' })
  created: number;

  @Column({ type: 'integer' })
  updated: number;

  /** The rejected rows as CSV (skip mode with rejected rows only). */
  @Column({ type: 'text', nullable: true })
  errorReport: string | null;
}
