import type { MigrationInterface, QueryRunner } from 'typeorm';
import { postgresRecordGuards, sqliteRecordGuards } from './record-guards';

/**
 * Coats, the parts they covered, mixes, denibs and their parts, sensor readings and the audit
 * trail are evidence: the database refuses to replace, change, delete or truncate them, whatever
 * SQL is run against it.
 */
export class RecordGuards1764750000000 implements MigrationInterface {
  name = 'RecordGuards1764750000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const guards = queryRunner.connection.options.type === 'postgres' ? postgresRecordGuards : sqliteRecordGuards;
    for (const statement of guards.up) await queryRunner.query(statement);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    const guards = queryRunner.connection.options.type === 'postgres' ? postgresRecordGuards : sqliteRecordGuards;
    for (const statement of guards.down) await queryRunner.query(statement);
  }
}
