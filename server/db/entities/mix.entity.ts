import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One pot mixed in a spray session. Like coats, never changed once recorded. */
@Entity({ name: 'mixes' })
export class MixEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  spraySessionId: number;

  @Column({ type: 'integer' })
  productId: number;

  @Column({ type: 'simple-json' })
  lotIds: number[];

  @Column({ type: 'double precision' })
  baseL: number;

  @Column({ type: 'double precision' })
  hardenerL: number;

  @Column({ type: 'double precision' })
  thinnerL: number;

  @Column({ type: 'varchar', length: 30 })
  mixedAt: string;

  @Column({ type: 'double precision' })
  tempC: number;

  @Column({ type: 'varchar', length: 30 })
  inductionEndsAt: string;

  @Column({ type: 'varchar', length: 30, nullable: true })
  potLifeEndsAt: string | null;

  @Column({ type: 'varchar', length: 30, nullable: true })
  potLifeWarningAt: string | null;

  @Column({ type: 'integer', nullable: true })
  recordedById: number | null;

  @Column({ type: 'varchar', length: 120 })
  recordedByName: string;

  /** Sent by the tablet so a resend returns this record instead of making a second. */
  @Index('IDX_mixes_idempotency_key', { unique: true })
  @Column({ type: 'varchar', length: 80, nullable: true })
  idempotencyKey: string | null;
}
