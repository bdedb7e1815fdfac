import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  VersionColumn,
} from 'typeorm';
import { Project } from '../projects/project.entity.js';
import type { DesignInput } from '../selection/dto/design-input.dto.js';
import type { BomLine, Candidate, DesignSnapshot } from '../selection/selection.types.js';
import { User } from '../users/user.entity.js';
import type { DesignStatus } from './design-status.js';

/**
 * One revision of a mount selection for one machine. `version` is the optimistic lock: every
 * write does `UPDATE … SET …, version = version + 1 WHERE id = ? AND version = ?`.
 */
@Entity('design')
@Index('IDX_design_project_name_revision', ['projectId', 'name', 'revision'], { unique: true })
export class Design {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'integer' })
  projectId: number;

  @ManyToOne(() => Project, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId', foreignKeyConstraintName: 'FK_design_project' })
  project: Project;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'integer' })
  revision: number;

  @Column({ type: 'varchar', length: 16 })
  status: DesignStatus;

  /** The equipment, mount points, operating conditions and criteria (SI). */
  @Column({ type: 'simple-json' })
  input: DesignInput;

  /** The chosen candidate as computed when it was chosen (null until one is chosen). */
  @Column({ type: 'simple-json', nullable: true })
  chosen: Candidate | null;

  /** Bill of materials of the chosen candidate (null until one is chosen). */
  @Column({ type: 'simple-json', nullable: true })
  bom: BomLine[] | null;

  /** The chosen mounts' catalog data and every computed figure, frozen when chosen. */
  @Column({ type: 'simple-json', nullable: true })
  snapshot: DesignSnapshot | null;

  @Column({ type: 'integer' })
  authorId: number;

  @ManyToOne(() => User, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'authorId', foreignKeyConstraintName: 'FK_design_author' })
  author: User;

  @Column({ type: 'integer', nullable: true })
  checkerId: number | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'checkerId', foreignKeyConstraintName: 'FK_design_checker' })
  checker: User | null;

  @VersionColumn()
  version: number;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
