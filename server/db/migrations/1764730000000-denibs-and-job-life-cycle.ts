import { Table, type MigrationInterface, type QueryRunner, type TableForeignKeyOptions } from 'typeorm';
import { idColumn, instantColumn, intColumn, textColumn } from './table-columns';

const fk = (column: string, table: string): TableForeignKeyOptions => ({ columnNames: [column], referencedTableName: table, referencedColumnNames: ['id'], onDelete: 'RESTRICT' });

// Denib records are quality records like coats: the database refuses any change or deletion.
const sqliteGuards = ['denibs', 'denib_parts'].flatMap((table) => [
  `CREATE TRIGGER ${table}_no_update BEFORE UPDATE ON ${table} BEGIN SELECT RAISE(ABORT, 'append_only: denib records are never changed; record another'); END`,
  `CREATE TRIGGER ${table}_no_delete BEFORE DELETE ON ${table} BEGIN SELECT RAISE(ABORT, 'append_only: denib records are never deleted'); END`,
]);
const postgresGuards = [
  `CREATE FUNCTION boothwright_denib_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
   BEGIN RAISE EXCEPTION 'append_only: denib records are never changed or deleted; record another'; END $$`,
  'CREATE TRIGGER denibs_append_only BEFORE UPDATE OR DELETE ON denibs FOR EACH ROW EXECUTE FUNCTION boothwright_denib_append_only()',
  'CREATE TRIGGER denib_parts_append_only BEFORE UPDATE OR DELETE ON denib_parts FOR EACH ROW EXECUTE FUNCTION boothwright_denib_append_only()',
];

/**
 * Denibs between coats as append-only records; the job life cycle (open → in finish → ready →
 * delivered), set by the server with who set it; where a collected part was taken from.
 */
export class DenibsAndJobLifeCycle1764730000000 implements MigrationInterface {
  name = 'DenibsAndJobLifeCycle1764730000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'denibs',
        columns: [
          idColumn,
          intColumn('spray_session_id'),
          textColumn('grit', 10),
          instantColumn('abraded_at'),
          { name: 'notes', type: 'text', default: "''" },
          intColumn('recorded_by_id', true),
          textColumn('recorded_by_name', 120),
          instantColumn('recorded_at'),
        ],
        foreignKeys: [fk('spray_session_id', 'spray_sessions'), fk('recorded_by_id', 'users')],
        indices: [
          { name: 'IDX_denibs_session', columnNames: ['spray_session_id'] },
          { name: 'IDX_denibs_abraded_at', columnNames: ['abraded_at'] },
        ],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'denib_parts',
        columns: [
          { ...intColumn('denib_id'), isPrimary: true },
          { ...intColumn('part_id'), isPrimary: true },
        ],
        foreignKeys: [fk('denib_id', 'denibs'), fk('part_id', 'parts')],
        indices: [{ name: 'IDX_denib_parts_part', columnNames: ['part_id'] }],
      }),
    );
    const postgres = queryRunner.connection.options.type === 'postgres';
    for (const statement of postgres ? postgresGuards : sqliteGuards) await queryRunner.query(statement);
    await this.jobLifeCycle(queryRunner);
    // Plain ALTER TABLE: TypeORM's addColumn rebuilds a SQLite table and would drop its triggers.
    await queryRunner.query('ALTER TABLE parts ADD COLUMN collected_from_rack_id integer');
    await queryRunner.query('ALTER TABLE parts ADD COLUMN collected_from_shelf integer');
  }

  /**
   * "finished" becomes "delivered" (a lead had set it by hand). Jobs whose parts are all collected
   * are delivered; open jobs with a coat on record are in finish. "Ready" needs the drying maths
   * and is set by the server at the job's next coat, denib or collection.
   */
  private async jobLifeCycle(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE jobs ADD COLUMN ready_at varchar(30)');
    await queryRunner.query("ALTER TABLE jobs ADD COLUMN state_set_by varchar(10) NOT NULL DEFAULT 'auto'");
    await queryRunner.query("UPDATE jobs SET state = 'delivered', state_set_by = 'lead' WHERE state = 'finished'");
    await queryRunner.query("UPDATE jobs SET state_set_by = 'lead' WHERE state = 'cancelled'");
    await queryRunner.query(
      `UPDATE jobs SET state = 'delivered' WHERE state IN ('open', 'in-finish')
       AND EXISTS (SELECT 1 FROM parts p WHERE p.job_id = jobs.id)
       AND NOT EXISTS (SELECT 1 FROM parts p WHERE p.job_id = jobs.id AND p.collected_at IS NULL)`,
    );
    await queryRunner.query(
      `UPDATE jobs SET state = 'in-finish' WHERE state = 'open'
       AND EXISTS (SELECT 1 FROM coat_parts cp JOIN parts p ON p.id = cp.part_id WHERE p.job_id = jobs.id)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query("UPDATE jobs SET state = 'finished' WHERE state = 'delivered'");
    await queryRunner.query("UPDATE jobs SET state = 'in-finish' WHERE state = 'ready'");
    // Neither table carries triggers, so rebuilding them on SQLite loses nothing.
    for (const column of ['collected_from_rack_id', 'collected_from_shelf']) await queryRunner.dropColumn('parts', column);
    for (const column of ['ready_at', 'state_set_by']) await queryRunner.dropColumn('jobs', column);
    await queryRunner.dropTable('denib_parts');
    await queryRunner.dropTable('denibs');
    if (queryRunner.connection.options.type === 'postgres') await queryRunner.query('DROP FUNCTION boothwright_denib_append_only()');
  }
}
