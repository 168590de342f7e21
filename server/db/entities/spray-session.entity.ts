import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { ChecklistResult } from '../../../shared/schemas/checklist';
import type { SpraySessionState } from '../../../shared/schemas/spray-session';

/** A booked slot of one booth. Overlaps are refused by the service and, as a last line, by a trigger. */
@Entity({ name: 'spray_sessions' })
@Index(['boothId', 'startAt'])
export class SpraySessionEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  boothId: number;

  /** UTC instants as ISO strings of one fixed form (toISOString), so text comparison is time order. */
  @Column({ type: 'varchar', length: 30 })
  startAt: string;

  @Column({ type: 'varchar', length: 30 })
  endAt: string;

  @Index()
  @Column({ type: 'integer', nullable: true })
  sprayerId: number | null;

  @Column({ type: 'varchar', length: 20, default: 'planned' })
  state: SpraySessionState;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'simple-json', nullable: true })
  checklist: ChecklistResult | null;

  @Column({ type: 'text', nullable: true })
  overrideReason: string | null;

  /** When the state went to spraying (the checklist passed); the start of sprayed hours. */
  @Column({ type: 'varchar', length: 30, nullable: true })
  sprayingStartedAt: string | null;

  @Column({ type: 'varchar', length: 30, nullable: true })
  clearingStartedAt: string | null;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
