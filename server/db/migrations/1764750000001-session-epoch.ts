import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A number per user that each sign-in remembers; a password reset raises it, which ends every
 * sign-in made before. Plain ALTER TABLE keeps SQLite from rebuilding the users table.
 */
export class SessionEpoch1764750000001 implements MigrationInterface {
  name = 'SessionEpoch1764750000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE users ADD COLUMN session_epoch integer NOT NULL DEFAULT 0');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE users DROP COLUMN session_epoch');
  }
}
