import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { Role } from '../../../shared/permissions';
import type { UnitSystem } from '../../../shared/schemas/common';
import type { NotifyPrefs } from '../../../shared/schemas/notification';

@Entity({ name: 'users' })
export class UserEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 254, unique: true })
  email: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 20 })
  role: Role;

  @Column({ type: 'varchar', length: 10, default: 'metric' })
  units: UnitSystem;

  @Column({ type: 'varchar', length: 255 })
  passwordHash: string;

  @Column({ type: 'boolean', default: false })
  disabled: boolean;

  /** Raised when the password is reset: every sign-in made before carries an older number and ends. */
  @Column({ type: 'integer', default: 0 })
  sessionEpoch: number;

  /** What the user is e-mailed about; null means their role's defaults. */
  @Column({ type: 'simple-json', nullable: true })
  notify: NotifyPrefs | null;

  /** ISO 8601 UTC instants, stored as text so SQLite and PostgreSQL sort and compare them alike. */
  @Index()
  @Column({ type: 'integer', default: 1 })
  siteId: number;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
