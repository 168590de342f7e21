import { Table, TableForeignKey, type MigrationInterface, type QueryRunner } from 'typeorm';
import { idColumn, instantColumn, intColumn, realColumn, textColumn } from './table-columns';

export class MixesAndChecklists1764680000000 implements MigrationInterface {
  name = 'MixesAndChecklists1764680000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'mixes',
        columns: [
          idColumn,
          intColumn('spray_session_id'),
          intColumn('product_id'),
          { name: 'lot_ids', type: 'text' },
          realColumn('base_l'),
          realColumn('hardener_l'),
          realColumn('thinner_l'),
          instantColumn('mixed_at'),
          realColumn('temp_c'),
          instantColumn('induction_ends_at'),
          instantColumn('pot_life_ends_at', true),
          instantColumn('pot_life_warning_at', true),
          intColumn('recorded_by_id', true),
          textColumn('recorded_by_name', 120),
        ],
        foreignKeys: [
          { columnNames: ['spray_session_id'], referencedTableName: 'spray_sessions', referencedColumnNames: ['id'] },
          { columnNames: ['product_id'], referencedTableName: 'products', referencedColumnNames: ['id'] },
        ],
        indices: [{ name: 'IDX_mixes_session', columnNames: ['spray_session_id'] }],
      }),
    );
    // Plain ALTER TABLE: TypeORM's addColumn rebuilds a SQLite table, which would drop its guard triggers.
    await queryRunner.query('ALTER TABLE spray_sessions ADD COLUMN clearing_started_at varchar(30)');
    await queryRunner.query('ALTER TABLE coats ADD COLUMN mix_id integer');
    if (queryRunner.connection.options.type === 'postgres') {
      await queryRunner.createForeignKey('coats', new TableForeignKey({ columnNames: ['mix_id'], referencedTableName: 'mixes', referencedColumnNames: ['id'] }));
      await queryRunner.query('CREATE TRIGGER mixes_append_only BEFORE UPDATE OR DELETE ON mixes FOR EACH ROW EXECUTE FUNCTION boothwright_append_only()');
    } else {
      // SQLite cannot add a foreign key to an existing table without rebuilding it (and its guards); the service checks mix_id.
      await queryRunner.query(`CREATE TRIGGER mixes_no_update BEFORE UPDATE ON mixes BEGIN SELECT RAISE(ABORT, 'append_only: mixes are never changed'); END`);
      await queryRunner.query(`CREATE TRIGGER mixes_no_delete BEFORE DELETE ON mixes BEGIN SELECT RAISE(ABORT, 'append_only: mixes are never deleted'); END`);
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropColumn('coats', 'mix_id');
    await queryRunner.dropColumn('spray_sessions', 'clearing_started_at');
    await queryRunner.dropTable('mixes');
  }
}
