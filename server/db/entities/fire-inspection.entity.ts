import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A fire-protection inspection of a booth (extinguishers, suppression, interlocks). Append-only. */
@Entity({ name: 'fire_inspections' })
@Index(['boothId', 'inspectedOn'])
export class FireInspectionEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  boothId: number;

  @Column({ type: 'varchar', length: 10 })
  inspectedOn: string;

  @Column({ type: 'varchar', length: 120 })
  inspectedBy: string;

  @Column({ type: 'boolean' })
  passed: boolean;

  @Column({ type: 'varchar', length: 10, nullable: true })
  nextDueOn: string | null;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'integer', nullable: true })
  recordedById: number | null;

  @Column({ type: 'varchar', length: 120 })
  recordedByName: string;

  @Column({ type: 'varchar', length: 30 })
  recordedAt: string;
}
