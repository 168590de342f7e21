import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The once-a-minute notification check looks for spray sessions booked, moved or cancelled in the
 * last day (`updated_at`); without an index it reads every session the shop ever had.
 */
export class ChangeIndexes1764770000000 implements MigrationInterface {
  name = 'ChangeIndexes1764770000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('CREATE INDEX "IDX_spray_sessions_updated_at" ON spray_sessions (updated_at)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_spray_sessions_updated_at"');
  }
}
