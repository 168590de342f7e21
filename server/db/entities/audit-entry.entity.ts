import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Who changed what, when. Written in the same transaction as the change it describes. */
@Entity({ name: 'audit_entries' })
export class AuditEntryEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'varchar', length: 30 })
  at: string;

  @Column({ type: 'integer', nullable: true })
  userId: number | null;

  @Column({ type: 'varchar', length: 120 })
  userName: string;

  @Column({ type: 'varchar', length: 40 })
  action: string;

  @Index()
  @Column({ type: 'varchar', length: 40 })
  entity: string;

  @Column({ type: 'varchar', length: 40, nullable: true })
  entityId: string | null;

  @Column({ type: 'text' })
  summary: string;

  @Column({ type: 'simple-json', nullable: true })
  changes: Record<string, unknown> | null;

  /** The site the entry is about; null for group-wide things (jobs, data sheets, settings). */
  @Column({ type: 'integer', nullable: true })
  siteId: number | null;
}
