import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A reading of a filter bank's pressure-drop gauge, typed or posted by the booth's sensor. Append-only. */
@Entity({ name: 'filter_gauge_readings' })
@Index(['filterBankId', 'at'])
export class FilterGaugeReadingEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  filterBankId: number;

  /** The bank's booth, kept on the row so the site rule needs no join. */
  @Index()
  @Column({ type: 'integer' })
  boothId: number;

  @Column({ type: 'double precision' })
  pressureDropPa: number;

  @Column({ type: 'varchar', length: 30 })
  at: string;

  @Column({ type: 'varchar', length: 10 })
  source: 'typed' | 'sensor';

  @Column({ type: 'integer', nullable: true })
  recordedById: number | null;

  @Column({ type: 'varchar', length: 120 })
  recordedByName: string;
}
