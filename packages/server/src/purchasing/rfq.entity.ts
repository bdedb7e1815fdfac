import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { Design } from '../designs/design.entity.js';
import { Supplier } from '../suppliers/supplier.entity.js';
import { User } from '../users/user.entity.js';
import type { RfqStatus } from './rfq-status.js';

/** A request for quotation e-mailed to one supplier for its lines of a released design's BOM. */
@Entity('rfq')
export class Rfq {
  @PrimaryGeneratedColumn()
  id: number;

  @Index('IDX_rfq_design')
  @Column({ type: 'integer' })
  designId: number;

  @ManyToOne(() => Design, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'designId', foreignKeyConstraintName: 'FK_rfq_design' })
  design: Design;

  @Column({ type: 'integer' })
  supplierId: number;

  @ManyToOne(() => Supplier, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'supplierId', foreignKeyConstraintName: 'FK_rfq_supplier' })
  supplier: Supplier;

  @Column({ type: 'varchar', length: 16 })
  status: RfqStatus;

  /** `Message-ID` of the last e-mail the mail server accepted. */
  @Column({ type: 'varchar', length: 300, nullable: true })
  messageId: string | null;

  /** Why the last send failed (null once a send succeeded). */
  @Column({ type: 'varchar', length: 2000, nullable: true })
  failureReason: string | null;

  /** Identical machines the request is for: every line's quantity is per machine × this. */
  @Column({ type: 'integer', default: 1 })
  machineCount: number;

  /** The total of the quote (Σ unit price × quantity of its lines), in `quoteCurrency`. */
  @Column({ type: 'double precision', nullable: true })
  quotedPrice: number | null;

  /** The supplier's reference of the quote. */
  @Column({ type: 'varchar', length: 200, nullable: true })
  quoteReference: string | null;

  /** Last day the quote holds (YYYY-MM-DD). */
  @Column({ type: 'varchar', length: 10, nullable: true })
  quoteValidUntil: string | null;

  @Column({ type: 'varchar', length: 3, nullable: true })
  quoteCurrency: string | null;

  /** When the order was recorded (the start of the quoted lead times). */
  @Column({ type: Date, nullable: true })
  orderedAt: Date | null;

  @Column({ type: Date, nullable: true })
  quotedAt: Date | null;

  @Column({ type: 'integer' })
  createdById: number;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'createdById', foreignKeyConstraintName: 'FK_rfq_created_by' })
  createdBy: User;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
