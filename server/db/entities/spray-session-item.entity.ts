import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A part planned into a spray session, and which step of its finish system. */
@Entity({ name: 'spray_session_items' })
export class SpraySessionItemEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  spraySessionId: number;

  @Index()
  @Column({ type: 'integer' })
  partId: number;

  @Column({ type: 'integer', nullable: true })
  stepPosition: number | null;
}
