import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Design } from '../designs/design.entity.js';
import { User } from '../users/user.entity.js';
import type { TapTestOutcome } from './tap-test-analysis.js';
import type { FrfQuantity, VerificationKind } from './tap-test-file.js';

/**
 * One as-built measurement (tap test) of a released or superseded design and its comparison
 * with the prediction. Rows are only ever added. The headline figures have their own columns;
 * everything else the screens and the report show is in `outcome`.
 */
@Entity('design_verification')
export class Verification {
  @PrimaryGeneratedColumn()
  id: number;

  @Index('IDX_design_verification_design')
  @Column({ type: 'integer' })
  designId: number;

  @ManyToOne(() => Design, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'designId', foreignKeyConstraintName: 'FK_design_verification_design' })
  design: Design;

  /** Who uploaded the measurement. */
  @Column({ type: 'integer' })
  userId: number;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_design_verification_user' })
  user: User;

  @Column({ type: 'varchar', length: 8 })
  kind: VerificationKind;

  @Column({ type: 'varchar', length: 16 })
  quantity: FrfQuantity;

  @Column({ type: 'varchar', length: 255 })
  fileName: string;

  @Column({ type: 'varchar', length: 500, nullable: true })
  note: string | null;

  @Column({ type: 'double precision' })
  tolerancePct: number;

  @Column({ type: 'double precision' })
  naturalFrequencyHz: number;

  @Column({ type: 'double precision' })
  predictedFrequencyHz: number;

  @Column({ type: 'double precision' })
  deviationPct: number;

  @Column({ type: 'varchar', length: 8 })
  verdict: TapTestOutcome['verdict'];

  @Column({ type: 'simple-json' })
  outcome: TapTestOutcome;

  @CreateDateColumn()
  createdAt: Date;
}
