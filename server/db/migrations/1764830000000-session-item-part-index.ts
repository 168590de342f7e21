import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The calendar asks, for each coat of its week's sessions, whether the part was planned into that
 * session (`part_id` and `spray_session_id` together). With only `part_id` indexed, each check
 * read every session a part was ever planned into; the pair answers from the index alone. It also
 * serves every lookup by part, so the part-only index goes.
 */
export class SessionItemPartIndex1764830000000 implements MigrationInterface {
  name = 'SessionItemPartIndex1764830000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('CREATE INDEX "IDX_spray_session_items_part_session" ON spray_session_items (part_id, spray_session_id)');
    await queryRunner.query('DROP INDEX "IDX_spray_session_items_part"');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('CREATE INDEX "IDX_spray_session_items_part" ON spray_session_items (part_id)');
    await queryRunner.query('DROP INDEX "IDX_spray_session_items_part_session"');
  }
}
