import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { ReworkReason } from '../../../shared/schemas/coat';

export interface StoredWarning {
  code: string;
  message: string;
  acknowledgedReason?: string | null;
}

/**
 * One version of a coat record. Rows are never updated or deleted (database triggers refuse
 * it); a correction is a new row whose replacesId points at the version it replaces.
 */
@Entity({ name: 'coats' })
export class CoatEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  spraySessionId: number;

  @Index()
  @Column({ type: 'integer' })
  productId: number;

  @Column({ type: 'integer', nullable: true })
  lotId: number | null;

  @Column({ type: 'integer', nullable: true })
  stepPosition: number | null;

  @Column({ type: 'integer', nullable: true })
  mixId: number | null;

  @Index()
  @Column({ type: 'varchar', length: 30 })
  sprayedAt: string;

  @Column({ type: 'double precision' })
  airTempC: number;

  @Column({ type: 'double precision' })
  relativeHumidityPct: number;

  @Column({ type: 'double precision' })
  surfaceTempC: number;

  @Column({ type: 'double precision' })
  dewPointC: number;

  @Column({ type: 'double precision' })
  thinningPct: number;

  @Column({ type: 'double precision', nullable: true })
  wetFilmUm: number | null;

  @Column({ type: 'double precision', nullable: true })
  dryFilmUm: number | null;

  @Column({ type: 'double precision' })
  dryingTempC: number;

  @Column({ type: 'varchar', length: 30 })
  dryingMethod: string;

  @Column({ type: 'varchar', length: 30 })
  flashOffEndsAt: string;

  @Column({ type: 'varchar', length: 30 })
  recoatOpensAt: string;

  @Column({ type: 'varchar', length: 30, nullable: true })
  recoatClosesAt: string | null;

  @Column({ type: 'varchar', length: 30 })
  touchDryAt: string;

  @Column({ type: 'varchar', length: 30 })
  handleAt: string;

  @Column({ type: 'varchar', length: 30 })
  packAt: string;

  @Column({ type: 'varchar', length: 30 })
  fullCureAt: string;

  @Column({ type: 'simple-json' })
  warnings: StoredWarning[];

  @Column({ type: 'text', default: '' })
  notes: string;

  /** Why a step was sprayed again (a re-spray); null for a first coat. */
  @Column({ type: 'varchar', length: 20, nullable: true })
  reworkReason: ReworkReason | null;

  @Column({ type: 'integer', default: 1 })
  version: number;

  @Index({ unique: true })
  @Column({ type: 'integer', nullable: true })
  replacesId: number | null;

  @Column({ type: 'text', nullable: true })
  correctionReason: string | null;

  @Column({ type: 'integer', nullable: true })
  recordedById: number | null;

  @Column({ type: 'varchar', length: 120 })
  recordedByName: string;

  @Column({ type: 'varchar', length: 30 })
  recordedAt: string;

  @Index({ unique: true })
  @Column({ type: 'varchar', length: 80, nullable: true })
  idempotencyKey: string | null;
}
