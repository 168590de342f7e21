import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A photo taken of a coat (a defect, a sample board): its own append-only record pointing at the
 * coat version it was taken with. The coat record itself never changes; the bytes live in the file
 * storage under a generated name.
 */
@Entity({ name: 'coat_photos' })
export class CoatPhotoEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  coatId: number;

  @Column({ type: 'varchar', length: 20 })
  subject: string;

  @Column({ type: 'text', default: '' })
  caption: string;

  @Column({ type: 'varchar', length: 80, unique: true })
  storedName: string;

  @Column({ type: 'varchar', length: 40 })
  mimeType: string;

  @Column({ type: 'integer' })
  sizeBytes: number;

  @Column({ type: 'integer', nullable: true })
  takenById: number | null;

  @Column({ type: 'varchar', length: 120 })
  takenByName: string;

  @Column({ type: 'varchar', length: 30 })
  takenAt: string;
}
