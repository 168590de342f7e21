import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** An extraction test of a booth: face velocity at points across the face, the clearance time measured. Append-only. */
@Entity({ name: 'extraction_tests' })
@Index(['boothId', 'testedOn'])
export class ExtractionTestEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  boothId: number;

  /** The shop's calendar date, YYYY-MM-DD. */
  @Column({ type: 'varchar', length: 10 })
  testedOn: string;

  @Column({ type: 'simple-json' })
  faceVelocityPointsMps: number[];

  @Column({ type: 'double precision' })
  meanFaceVelocityMps: number;

  /** The booth's minimum when the test was made, so the record keeps its verdict. */
  @Column({ type: 'double precision' })
  minFaceVelocityMps: number;

  @Column({ type: 'double precision', nullable: true })
  clearanceMin: number | null;

  @Column({ type: 'varchar', length: 120 })
  testedBy: string;

  @Column({ type: 'varchar', length: 10, nullable: true })
  nextDueOn: string | null;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'integer', nullable: true })
  recordedById: number | null;

  @Column({ type: 'varchar', length: 120 })
  recordedByName: string;

  @Column({ type: 'varchar', length: 30 })
  recordedAt: string;
}
