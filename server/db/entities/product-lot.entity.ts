import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'product_lots' })
@Index(['productId', 'lotNumber'], { unique: true })
export class ProductLotEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  productId: number;

  @Column({ type: 'varchar', length: 60 })
  lotNumber: string;

  /** A calendar date, YYYY-MM-DD, as printed on the tin. */
  @Column({ type: 'varchar', length: 10, nullable: true })
  expiresOn: string | null;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;
}
