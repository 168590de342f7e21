import { Column, Entity, Index, PrimaryColumn, PrimaryGeneratedColumn } from 'typeorm';

/** A denib or scuff between coats. Rows are never updated or deleted (database triggers refuse it). */
@Entity({ name: 'denibs' })
export class DenibEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index('IDX_denibs_session')
  @Column({ type: 'integer' })
  spraySessionId: number;

  @Column({ type: 'varchar', length: 10 })
  grit: string;

  @Index('IDX_denibs_abraded_at')
  @Column({ type: 'varchar', length: 30 })
  abradedAt: string;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'integer', nullable: true })
  recordedById: number | null;

  @Column({ type: 'varchar', length: 120 })
  recordedByName: string;

  @Column({ type: 'varchar', length: 30 })
  recordedAt: string;

  /** Sent by the tablet so a resend returns this record instead of making a second. */
  @Index('IDX_denibs_idempotency_key', { unique: true })
  @Column({ type: 'varchar', length: 80, nullable: true })
  idempotencyKey: string | null;
}

/** Which parts one denib covered. Append-only like the denib itself. */
@Entity({ name: 'denib_parts' })
export class DenibPartEntity {
  @PrimaryColumn({ type: 'integer' })
  denibId: number;

  @Index('IDX_denib_parts_part')
  @PrimaryColumn({ type: 'integer' })
  partId: number;
}
