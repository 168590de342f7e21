import type { ISession } from 'connect-typeorm';
import { Column, DeleteDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

/** The express-session store (connect-typeorm): sign-ins survive a server restart. */
@Entity({ name: 'sessions' })
export class SessionEntity implements ISession {
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
