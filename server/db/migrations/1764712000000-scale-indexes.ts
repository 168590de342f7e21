import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Indexes for a shop with years of records (found by npm run bench): the booth calendar finds
 * the sessions still running after the start of the week shown, the ready board picks the parts
 * not yet collected, and the once-a-minute notification check looks for coats whose handling
 * time or recoat window falls in the next few hours. Without these each of them reads every
 * session, part or coat ever recorded.
 */
export class ScaleIndexes1764712000000 implements MigrationInterface {
  name = 'ScaleIndexes1764712000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('CREATE INDEX "IDX_spray_sessions_end_at" ON spray_sessions (end_at)');
    await queryRunner.query('CREATE INDEX "IDX_parts_collected_at" ON parts (collected_at)');
    await queryRunner.query('CREATE INDEX "IDX_coats_handle_at" ON coats (handle_at)');
    await queryRunner.query('CREATE INDEX "IDX_coats_recoat_closes_at" ON coats (recoat_closes_at)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_coats_recoat_closes_at"');
    await queryRunner.query('DROP INDEX "IDX_coats_handle_at"');
    await queryRunner.query('DROP INDEX "IDX_parts_collected_at"');
    await queryRunner.query('DROP INDEX "IDX_spray_sessions_end_at"');
  }
}
