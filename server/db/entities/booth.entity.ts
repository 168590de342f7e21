import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { BoothKind, OpeningSpan } from '../../../shared/schemas/booth';

@Entity({ name: 'booths' })
export class BoothEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 80 })
  name: string;

  @Column({ type: 'varchar', length: 20 })
  kind: BoothKind;

  @Column({ type: 'double precision' })
  volumeM3: number;

  @Column({ type: 'double precision' })
  extractionM3PerH: number;

  @Column({ type: 'double precision', default: 3 })
  mixingFactorK: number;

  @Column({ type: 'double precision', nullable: true })
  measuredClearanceMin: number | null;

  @Column({ type: 'double precision', default: 0.5 })
  minFaceVelocityMps: number;

  @Column({ type: 'double precision', nullable: true })
  openFaceAreaM2: number | null;

  @Column({ type: 'simple-json' })
  openingHours: OpeningSpan[];

  @Column({ type: 'double precision', default: 20 })
  sprayRateM2PerH: number;

  /** SHA-256 of the booth sensor's bearer token; the token itself is shown once and never stored. */
  @Column({ type: 'varchar', length: 64, nullable: true })
  sensorTokenHash: string | null;

  @Index()
  @Column({ type: 'integer', default: 1 })
  siteId: number;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
