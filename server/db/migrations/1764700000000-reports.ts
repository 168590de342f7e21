import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What the reports need: why a step was re-sprayed, when spraying actually started, and indexes
 * for grouping mixes and coats by time. Plain ALTER TABLE so SQLite keeps the append-only and
 * no-overlap triggers (TypeORM's addColumn would rebuild the tables without them).
 */
export class Reports1764700000000 implements MigrationInterface {
  name = 'Reports1764700000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE coats ADD COLUMN rework_reason varchar(20)');
    await queryRunner.query('ALTER TABLE spray_sessions ADD COLUMN spraying_started_at varchar(30)');
    await queryRunner.query('CREATE INDEX "IDX_mixes_mixed_at" ON mixes (mixed_at)');
    await queryRunner.query('CREATE INDEX "IDX_spray_sessions_start_at" ON spray_sessions (start_at)');
    await queryRunner.query('CREATE INDEX "IDX_coats_step_position" ON coats (step_position)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_coats_step_position"');
    await queryRunner.query('DROP INDEX "IDX_spray_sessions_start_at"');
    await queryRunner.query('DROP INDEX "IDX_mixes_mixed_at"');
    await queryRunner.query('ALTER TABLE spray_sessions DROP COLUMN spraying_started_at');
    await queryRunner.query('ALTER TABLE coats DROP COLUMN rework_reason');
  }
}
