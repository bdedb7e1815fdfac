import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Rfq } from './rfq.entity.js';

/**
 * One line of a request for quotation, as asked (part, quantity for every machine, where it
 * goes) and, once the supplier answers, as quoted (unit price, lead time).
 */
@Entity('rfq_line')
export class RfqLine {
  @PrimaryGeneratedColumn()
  id: number;

  @Index('IDX_rfq_line_rfq')
  @Column({ type: 'integer' })
  rfqId: number;

  @ManyToOne(() => Rfq, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'rfqId', foreignKeyConstraintName: 'FK_rfq_line_rfq' })
  rfq: Rfq;

  /** Order of the line in the request (the BOM's order). */
  @Column({ type: 'integer' })
  position: number;

  @Column({ type: 'varchar', length: 100 })
  partNumber: string;

  /** Pieces for one machine. */
  @Column({ type: 'integer' })
  quantityPerMachine: number;

  /** Pieces asked for: per machine × the request's machine count. */
  @Column({ type: 'integer' })
  quantity: number;

  /** The mount points of one machine this part goes to. */
  @Column({ type: 'simple-json' })
  mountPoints: string[];

  @Column({ type: 'double precision', nullable: true })
  unitPrice: number | null;

  @Column({ type: 'integer', nullable: true })
  leadTimeDays: number | null;
}
