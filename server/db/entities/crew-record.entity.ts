import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { CrewRecordKind } from '../../../shared/schemas/crew';

/** A person's fit test, health surveillance or training. Append-only: a newer record supersedes an older one. */
@Entity({ name: 'crew_records' })
@Index(['userId', 'kind', 'doneOn'])
export class CrewRecordEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  userId: number;

  @Column({ type: 'varchar', length: 30 })
  kind: CrewRecordKind;

  @Column({ type: 'varchar', length: 10 })
  doneOn: string;

  @Column({ type: 'varchar', length: 10, nullable: true })
  nextDueOn: string | null;

  @Column({ type: 'varchar', length: 120, nullable: true })
  respiratorModel: string | null;

  @Column({ type: 'varchar', length: 10, nullable: true })
  result: 'pass' | 'fail' | null;

  @Column({ type: 'varchar', length: 120, nullable: true })
  title: string | null;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'integer', nullable: true })
  recordedById: number | null;

  @Column({ type: 'varchar', length: 120 })
  recordedByName: string;

  @Column({ type: 'varchar', length: 30 })
  recordedAt: string;
}
