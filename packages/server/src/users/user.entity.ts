import type { UnitSystem } from '@tacet/vibration';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Role } from '../common/roles.js';

export const UNIT_SYSTEMS: readonly UnitSystem[] = ['SI', 'US'];

/** A person who signs in. Rows are never deleted: a leaver is deactivated. */
@Entity('user')
export class User {
  @PrimaryGeneratedColumn()
  id: number;

  /** Stored trimmed and lower-cased. */
  @Index('IDX_user_email', { unique: true })
  @Column({ type: 'varchar', length: 200 })
  email: string;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'varchar', length: 100 })
  passwordHash: string;

  @Column({ type: 'varchar', length: 32 })
  role: Role;

  @Column({ type: 'varchar', length: 2, default: 'SI' })
  unitSystem: UnitSystem;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  /** Signed in with a temporary password an admin set: nothing but choosing a new one until then. */
  @Column({ type: 'boolean', default: false })
  mustChangePassword: boolean;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
