import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { DesignStatus } from '../designs/design-status.js';
import { Design } from '../designs/design.entity.js';
import { User } from '../users/user.entity.js';

/**
 * One entry of a design's review trail: a status change, or the start of a revision
 * (`from` null, `to` 'draft'). Rows are only ever added.
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

  @CreateDateColumn()
  at: Date;
}
