import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { RackLocation } from '../../../shared/schemas/rack';

@Entity({ name: 'racks' })
export class RackEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 80 })
  name: string;

  @Column({ type: 'varchar', length: 20 })
  location: RackLocation;

  @Column({ type: 'integer' })
  shelves: number;

  @Column({ type: 'double precision' })
  shelfAreaM2: number;

  @Column({ type: 'double precision', nullable: true })
  dryingTempC: number | null;

  @Index()
  @Column({ type: 'integer', default: 1 })
  siteId: number;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
