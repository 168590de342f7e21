import type { ISession } from 'connect-typeorm';
import { Column, DeleteDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

/** The sign-in session store for express-session (connect-typeorm): sign-ins survive a server restart. */
@Entity({ name: 'sessions' })
export class SignInSessionEntity implements ISession {
  @Index()
  @Column({ type: 'bigint', transformer: { to: (v: number) => v, from: (v: string | number) => Number(v) } })
  expiredAt = Date.now();

  @PrimaryColumn({ type: 'varchar', length: 255 })
  id = '';

  @Column({ type: 'text' })
  json = '';

  @DeleteDateColumn({ type: 'varchar', length: 40, nullable: true })
  destroyedAt?: Date;
}
