import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { DryingRow } from '../../../shared/finishing/drying-row-schema';
import type { Chemistry, Hazard, ProductKind } from '../../../shared/schemas/product';

/** A coating and its technical data sheet. */
@Entity({ name: 'products' })
export class ProductEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 80, default: '' })
  makerRef: string;

  @Column({ type: 'varchar', length: 20 })
  kind: ProductKind;

  @Column({ type: 'varchar', length: 40 })
  chemistry: Chemistry;

  @Column({ type: 'double precision' })
  volumeSolidsPct: number;

  @Column({ type: 'double precision', nullable: true })
  densityKgPerL: number | null;

  @Column({ type: 'double precision', default: 1 })
  mixBaseParts: number;

  @Column({ type: 'double precision', default: 0 })
  mixHardenerParts: number;

  @Column({ type: 'double precision', default: 0 })
  thinnerMinPct: number;

  @Column({ type: 'double precision', default: 0 })
  thinnerMaxPct: number;

  /** False when the data sheet gives no thinning range (min and max are then 0 and not checked). */
  @Column({ type: 'boolean', default: true })
  thinningRangeGiven: boolean;

  @Column({ type: 'double precision', default: 0 })
  inductionMin: number;

  @Column({ type: 'double precision', nullable: true })
  potLifeMin: number | null;

  @Column({ type: 'double precision', nullable: true })
  dryFilmPerCoatUm: number | null;

  @Column({ type: 'double precision', nullable: true })
  referenceRhPct: number | null;

  @Column({ type: 'double precision', nullable: true })
  minApplicationTempC: number | null;

  @Column({ type: 'double precision', nullable: true })
  maxRelativeHumidityPct: number | null;

  @Column({ type: 'double precision', nullable: true })
  vocGPerL: number | null;

  @Column({ type: 'double precision', nullable: true })
  flashPointC: number | null;

  @Column({ type: 'simple-json' })
  hazards: Hazard[];

  @Column({ type: 'double precision', nullable: true })
  pricePerL: number | null;

  /** The data sheet's table: a value of the product, always read and written whole. */
  @Column({ type: 'simple-json' })
  dryingTimes: DryingRow[];

  @Column({ type: 'integer', nullable: true })
  tdsFileId: number | null;

  @Column({ type: 'integer', nullable: true })
  sdsFileId: number | null;

  @Column({ type: 'varchar', length: 30 })
  createdAt: string;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
