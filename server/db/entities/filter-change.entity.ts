import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Filters of one bank changed: who, when, and the gauge before and after. Append-only. */
@Entity({ name: 'filter_changes' })
@Index(['filterBankId', 'changedAt'])
export class FilterChangeEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  filterBankId: number;

  @Index()
  @Column({ type: 'integer' })
  boothId: number;

  @Column({ type: 'varchar', length: 30 })
  changedAt: string;

  @Column({ type: 'double precision', nullable: true })
  beforePa: number | null;

  @Column({ type: 'double precision', nullable: true })
  afterPa: number | null;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'integer', nullable: true })
  changedById: number | null;

  @Column({ type: 'varchar', length: 120 })
  changedByName: string;
}
