import { Table, type MigrationInterface, type QueryRunner } from 'typeorm';
import { idColumn, instantColumn, intColumn, textColumn } from './table-columns';

export class Notifications1764690000000 implements MigrationInterface {
  name = 'Notifications1764690000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'notifications',
        columns: [
          idColumn,
          { ...textColumn('dedupe_key', 160), isUnique: true },
          textColumn('kind', 20),
          intColumn('user_id'),
          textColumn('subject', 200),
          { name: 'body', type: 'text' },
          instantColumn('due_at'),
          instantColumn('sent_at', true),
          { name: 'last_error', type: 'text', isNullable: true },
        ],
        foreignKeys: [{ columnNames: ['user_id'], referencedTableName: 'users', referencedColumnNames: ['id'] }],
        indices: [
          { name: 'IDX_notifications_user', columnNames: ['user_id'] },
          { name: 'IDX_notifications_sent', columnNames: ['sent_at'] },
        ],
      }),
    );
    // Plain ALTER TABLE keeps SQLite from rebuilding the users table.
    await queryRunner.query('ALTER TABLE users ADD COLUMN notify text');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('notifications');
    await queryRunner.query('ALTER TABLE users DROP COLUMN notify');
  }
}
