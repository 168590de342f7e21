import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'readings' })
@Index(['boothId', 'at'])
@Index(['rackId', 'at'])
export class ReadingEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer', nullable: true })
  boothId: number | null;

  @Column({ type: 'integer', nullable: true })
  rackId: number | null;

  @Column({ type: 'varchar', length: 30 })
  at: string;

  @Column({ type: 'double precision' })
  airTempC: number;

  @Column({ type: 'double precision' })
  relativeHumidityPct: number;

  @Column({ type: 'double precision', nullable: true })
  surfaceTempC: number | null;

  @Column({ type: 'double precision' })
  dewPointC: number;

  @Column({ type: 'varchar', length: 10 })
  source: 'typed' | 'sensor';

  @Column({ type: 'integer', nullable: true })
  recordedById: number | null;
}
