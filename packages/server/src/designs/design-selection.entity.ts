import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import type { SelectionResult } from '../selection/selection.types.js';
import { User } from '../users/user.entity.js';
import { Design } from './design.entity.js';

/**
 * The last selection run on a design (`POST /api/designs/:id/selection`), kept so that the
 * design page shows it again after a reload. It belongs to the input it was run on: `GET
 * /api/designs/:id` returns it only while the design's input has the same fingerprint, and a save
 * that changes the input deletes it. One row per design.
 */
@Entity('design_selection')
export class DesignSelection {
  @PrimaryColumn({ type: 'integer' })
  designId: number;

  @ManyToOne(() => Design, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'designId', foreignKeyConstraintName: 'FK_design_selection_design' })
  design: Design;

  /** inputFingerprint() of the input the selection ran on. */
  @Column({ type: 'varchar', length: 64 })
  inputFingerprint: string;

  /** The catalog revision read before the run (a later catalog change is reported). */
  @Column({ type: 'integer' })
  catalogRevision: number;

  /** The most candidates the run asked for. */
  @Column({ type: 'integer' })
  candidateLimit: number;

  /** The answer as `POST /api/designs/:id/selection` returned it. */
  @Column({ type: 'simple-json' })
  result: SelectionResult;

  @Column({ type: 'integer', nullable: true })
  ranById: number | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'ranById', foreignKeyConstraintName: 'FK_design_selection_user' })
  ranBy: User | null;

  @Column({ type: Date })
  ranAt: Date;
}
