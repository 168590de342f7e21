import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { NotificationKind } from '../../../shared/schemas/notification';

/**
 * A notification owed to one user. The unique dedupe key makes "decide it is due" idempotent:
 * after a restart the same rule finds the same key and nothing is sent twice; a row without
 * sentAt is still owed and is sent on the next tick.
 */
@Entity({ name: 'notifications' })
export class NotificationEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index({ unique: true })
  @Column({ type: 'varchar', length: 160 })
  dedupeKey: string;

  @Column({ type: 'varchar', length: 20 })
  kind: NotificationKind;

  @Index()
  @Column({ type: 'integer' })
  userId: number;

  @Column({ type: 'varchar', length: 200 })
  subject: string;

  @Column({ type: 'text' })
  body: string;

  @Column({ type: 'varchar', length: 30 })
  dueAt: string;

  @Index()
  @Column({ type: 'varchar', length: 30, nullable: true })
  sentAt: string | null;

  @Column({ type: 'text', nullable: true })
  lastError: string | null;
}
