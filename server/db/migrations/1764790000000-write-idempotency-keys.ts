import { Table, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { idColumn, instantColumn, intColumn, textColumn } from './table-columns';

/**
 * Idempotency keys for every write a booth tablet may queue while offline, as coats have had from
 * the start: a mix or denib sent again returns the first record, and a spray session change (checks,
 * start, stop) sent again returns the first answer, kept in `spray_session_replies`. Plain ALTER
 * TABLE keeps SQLite from rebuilding mixes and denibs (and dropping their append-only triggers).
 */
export class WriteIdempotencyKeys1764790000000 implements MigrationInterface {
  name = 'WriteIdempotencyKeys1764790000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['mixes', 'denibs']) {
      await queryRunner.query(`ALTER TABLE ${table} ADD COLUMN idempotency_key varchar(80)`);
      await queryRunner.createIndex(
        table,
        new TableIndex({ name: `IDX_${table}_idempotency_key`, columnNames: ['idempotency_key'], isUnique: true }),
      );
    }
    await queryRunner.createTable(
      new Table({
        name: 'spray_session_replies',
        columns: [
          idColumn,
          { ...textColumn('idempotency_key', 80), isUnique: true },
          intColumn('spray_session_id'),
          { name: 'reply', type: 'text' },
          instantColumn('created_at'),
        ],
        foreignKeys: [
          { columnNames: ['spray_session_id'], referencedTableName: 'spray_sessions', referencedColumnNames: ['id'] },
        ],
        indices: [{ name: 'IDX_spray_session_replies_session', columnNames: ['spray_session_id'] }],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('spray_session_replies');
    for (const table of ['denibs', 'mixes']) {
      await queryRunner.dropIndex(table, `IDX_${table}_idempotency_key`);
      await queryRunner.query(`ALTER TABLE ${table} DROP COLUMN idempotency_key`);
    }
  }
}
