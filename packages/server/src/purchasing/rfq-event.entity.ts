import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { User } from '../users/user.entity.js';
import { Rfq } from './rfq.entity.js';
import type { RfqStatus } from './rfq-status.js';

/** One step in the life of a request for quotation (sent, failed, quoted, ordered, received). */
@Entity('rfq_event')
export class RfqEvent {
  @PrimaryGeneratedColumn()
  id: number;

  @Index('IDX_rfq_event_rfq')
  @Column({ type: 'integer' })
  rfqId: number;

  @ManyToOne(() => Rfq, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'rfqId', foreignKeyConstraintName: 'FK_rfq_event_rfq' })
  rfq: Rfq;

  @Column({ type: 'varchar', length: 16 })
  status: RfqStatus;

  @Column({ type: 'integer' })
  userId: number;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_rfq_event_user' })
  user: User;

  @Column({ type: 'varchar', length: 2000, nullable: true })
  note: string | null;

  @CreateDateColumn()
  at: Date;
}
