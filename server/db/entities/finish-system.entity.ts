import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'finish_systems' })
export class FinishSystemEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
