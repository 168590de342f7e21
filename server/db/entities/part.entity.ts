import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'parts' })
export class PartEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  jobId: number;

  @Column({ type: 'varchar', length: 80 })
  label: string;

  @Column({ type: 'varchar', length: 40, default: '' })
  kind: string;

  @Column({ type: 'double precision' })
  lengthMm: number;

  @Column({ type: 'double precision' })
  widthMm: number;

  @Column({ type: 'double precision' })
  thicknessMm: number;

  @Column({ type: 'integer', default: 1 })
  quantity: number;

  @Column({ type: 'varchar', length: 4, default: 'both' })
  faces: 'one' | 'both';

  @Column({ type: 'boolean', default: true })
  edges: boolean;

  /** Stored as well as computable, so reports can sum it in SQL. */
  @Column({ type: 'double precision' })
  coatedAreaM2: number;

  @Index()
  @Column({ type: 'integer', nullable: true })
  rackId: number | null;

  @Column({ type: 'integer', nullable: true })
  shelf: number | null;

  /** The code printed in the rack tag's QR code. */
  @Column({ type: 'varchar', length: 16, unique: true })
  tag: string;

  @Index()
  @Column({ type: 'varchar', length: 20, default: 'waiting' })
  state: string;

  @Column({ type: 'varchar', length: 30, nullable: true })
  collectedAt: string | null;

  /** The rack and shelf it was taken from when collected, so the board can still place it. */
  @Column({ type: 'integer', nullable: true })
  collectedFromRackId: number | null;

  @Column({ type: 'integer', nullable: true })
  collectedFromShelf: number | null;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
