import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { JobState } from '../../../shared/schemas/job';

@Entity({ name: 'jobs' })
export class JobEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  customer: string;

  @Column({ type: 'varchar', length: 60, unique: true })
  reference: string;

  @Index()
  @Column({ type: 'varchar', length: 10 })
  dueDate: string;

  @Column({ type: 'integer', nullable: true })
  finishSystemId: number | null;

  @Column({ type: 'varchar', length: 80, default: '' })
  colour: string;

  @Column({ type: 'varchar', length: 40, default: '' })
  sheen: string;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'varchar', length: 20, default: 'open' })
  state: JobState;

  /** Whether the server set the state from what was recorded, or a lead set it by hand. */
  @Column({ type: 'varchar', length: 10, default: 'auto' })
  stateSetBy: 'auto' | 'lead';

  /** Once every coat is on: when the last part can be handled. An in-finish job is ready from then. */
  @Column({ type: 'varchar', length: 30, nullable: true })
  readyAt: string | null;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
