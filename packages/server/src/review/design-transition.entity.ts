import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { DesignStatus } from '../designs/design-status.js';
import type { DesignInput } from '../selection/dto/design-input.dto.js';
import { Design } from '../designs/design.entity.js';
import { User } from '../users/user.entity.js';
import type { SubmissionChanges } from './input-changes.js';

/** What a submission for check recorded besides the move: the input as sent, and the chosen mounts. */
export interface SubmittedDesign {
  input: DesignInput;
  /** The chosen mounts' label, e.g. "AS-450 (Aldwick Springs)"; null when none. */
  chosen: string | null;
}

/**
 * One entry of a design's review trail: a status change, or the start of a revision
 * (`from` null, `to` 'draft'). Rows are only ever added. `comment` is the checker's (a return
 * to draft, release notes); `note` the author's when sending for check (a reply when resending).
 */
@Entity('design_transition')
export class DesignTransition {
  @PrimaryGeneratedColumn()
  id: number;

  @Index('IDX_design_transition_design')
  @Column({ type: 'integer' })
  designId: number;

  @ManyToOne(() => Design, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'designId', foreignKeyConstraintName: 'FK_design_transition_design' })
  design: Design;

  @Column({ type: 'integer' })
  userId: number;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_design_transition_user' })
  user: User;

  @Column({ type: 'varchar', length: 16, nullable: true })
  from: DesignStatus | null;

  @Column({ type: 'varchar', length: 16 })
  to: DesignStatus;

  @Column({ type: 'varchar', length: 2000, nullable: true })
  comment: string | null;

  /** The author's note when sending for check, or reply when sending again. */
  @Column({ type: 'varchar', length: 2000, nullable: true })
  note: string | null;

  /** The engineer the author asked to check (sending for check only). */
  @Column({ type: 'integer', nullable: true })
  requestedCheckerId: number | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'requestedCheckerId', foreignKeyConstraintName: 'FK_design_transition_requested_checker' })
  requestedChecker: User | null;

  /** Sending for check: the input and chosen mounts as sent (the base of the next resubmission's changes). */
  @Column({ type: 'simple-json', nullable: true })
  submitted: SubmittedDesign | null;

  /** Sending for check again: what changed since the last submission (SI values; see input-changes.ts). */
  @Column({ type: 'simple-json', nullable: true })
  changes: SubmissionChanges | null;

  @CreateDateColumn()
  at: Date;
}
