import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** An uploaded file: the bytes live under UPLOAD_DIR with a generated name, never the user's. */
@Entity({ name: 'stored_files' })
export class StoredFileEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 255 })
  originalName: string;

  @Column({ type: 'varchar', length: 80, unique: true })
  storedName: string;

  @Column({ type: 'varchar', length: 80 })
  mimeType: string;

  @Column({ type: 'integer' })
  sizeBytes: number;

  @Column({ type: 'integer', nullable: true })
  uploadedBy: number | null;

  @Column({ type: 'varchar', length: 30 })
  uploadedAt: string;
}
