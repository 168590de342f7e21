import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A part planned into a spray session, and which step of its finish system. */
@Entity({ name: 'spray_session_items' })
// By part, and whether a part was planned into a given session.
@Index('IDX_spray_session_items_part_session', ['partId', 'spraySessionId'])
export class SpraySessionItemEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  spraySessionId: number;

  @Column({ type: 'integer' })
  partId: number;

  @Column({ type: 'integer', nullable: true })
  stepPosition: number | null;
}
