import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { User } from '../users/user.entity.js';

/** A job (plant, site, client) that holds designs. Archived projects stay readable. */
@Entity('project')
export class Project {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'varchar', length: 200, nullable: true })
  site: string | null;

  @Column({ type: 'varchar', length: 200, nullable: true })
  client: string | null;

  @Column({ type: 'varchar', length: 4000, nullable: true })
  description: string | null;

  @Column({ type: 'integer' })
  ownerId: number;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ownerId', foreignKeyConstraintName: 'FK_project_owner' })
  owner: User;

  @Column({ type: 'boolean', default: false })
  archived: boolean;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
