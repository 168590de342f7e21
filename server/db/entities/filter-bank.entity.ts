import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One bank of filters in a booth, with the pressure drop at which its maker says to change it. */
@Entity({ name: 'filter_banks' })
export class FilterBankEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  boothId: number;

  @Column({ type: 'varchar', length: 80 })
  name: string;

  @Column({ type: 'varchar', length: 20 })
  kind: string;

  @Column({ type: 'integer' })
  changeAtPa: number;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
