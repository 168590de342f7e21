import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * The first answer to a spray session change sent with an idempotency key (checks, start, stop from
 * a tablet that may send them again after a lost answer): a repeat is answered with it, changing nothing.
 */
@Entity({ name: 'spray_session_replies' })
export class SpraySessionReplyEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index({ unique: true })
  @Column({ type: 'varchar', length: 80 })
  idempotencyKey: string;

  @Index('IDX_spray_session_replies_session')
  @Column({ type: 'integer' })
  spraySessionId: number;

  /** The spray session as the first answer gave it, JSON. */
  @Column({ type: 'text' })
  reply: string;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;
}
