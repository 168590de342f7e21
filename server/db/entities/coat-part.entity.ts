import { Entity, Index, PrimaryColumn } from 'typeorm';

/** Which parts one coat version covered. Append-only like the coats themselves. */
@Entity({ name: 'coat_parts' })
export class CoatPartEntity {
  @PrimaryColumn({ type: 'integer' })
  coatId: number;

  @Index()
  @PrimaryColumn({ type: 'integer' })
  partId: number;
}
