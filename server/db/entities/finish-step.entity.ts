import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One step of a finish system, in order: a coat of a product, or an abrade step. */
@Entity({ name: 'finish_steps' })
@Index(['finishSystemId', 'position'], { unique: true })
export class FinishStepEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  finishSystemId: number;

  @Column({ type: 'integer' })
  position: number;

  @Column({ type: 'varchar', length: 10 })
  kind: 'coat' | 'abrade';

  @Column({ type: 'integer', nullable: true })
  productId: number | null;

  @Column({ type: 'double precision', nullable: true })
  dryFilmUm: number | null;

  @Column({ type: 'varchar', length: 10, nullable: true })
  grit: string | null;
}
