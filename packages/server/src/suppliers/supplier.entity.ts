import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** A company that sells mounts. Rows are never deleted: a supplier is retired (`active: false`). */
@Entity('supplier')
export class Supplier {
  @PrimaryGeneratedColumn()
  id: number;

  /** As shown (see `cleanSupplierName`). */
  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** `supplierNameKey(name)`: names are unique regardless of case and spacing. */
  @Index('IDX_supplier_name_key', { unique: true })
  @Column({ type: 'varchar', length: 200 })
  nameKey: string;

  @Column({ type: 'varchar', length: 200, nullable: true })
  contactEmail: string | null;

  @Column({ type: 'varchar', length: 40, nullable: true })
  phone: string | null;

  @Column({ type: 'varchar', length: 2000, nullable: true })
  notes: string | null;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
