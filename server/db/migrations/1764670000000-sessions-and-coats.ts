import { Table, TableColumn, type MigrationInterface, type QueryRunner, type TableForeignKeyOptions } from 'typeorm';
import { idColumn, instantColumn, intColumn, realColumn, textColumn } from './table-columns';
import { postgresGuards, sqliteGuards } from './sessions-and-coats-guards';

const fk = (column: string, table: string): TableForeignKeyOptions => ({ columnNames: [column], referencedTableName: table, referencedColumnNames: ['id'], onDelete: 'RESTRICT' });

export class SessionsAndCoats1764670000000 implements MigrationInterface {
  name = 'SessionsAndCoats1764670000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.addColumn('booths', new TableColumn(textColumn('sensor_token_hash', 64, true)));
    await queryRunner.addColumn('parts', new TableColumn(instantColumn('collected_at', true)));
    await queryRunner.createTable(
      new Table({
        name: 'spray_sessions',
        columns: [
          idColumn,
          intColumn('booth_id'),
          instantColumn('start_at'),
          instantColumn('end_at'),
          intColumn('sprayer_id', true),
          { ...textColumn('state', 20), default: "'planned'" },
          { name: 'notes', type: 'text', default: "''" },
          { name: 'checklist', type: 'text', isNullable: true },
          { name: 'override_reason', type: 'text', isNullable: true },
          instantColumn('created_at'),
          instantColumn('updated_at'),
        ],
        foreignKeys: [fk('booth_id', 'booths'), fk('sprayer_id', 'users')],
        indices: [
          { name: 'IDX_spray_sessions_booth_start', columnNames: ['booth_id', 'start_at'] },
          { name: 'IDX_spray_sessions_sprayer', columnNames: ['sprayer_id'] },
          { name: 'IDX_spray_sessions_start', columnNames: ['start_at'] },
        ],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'spray_session_items',
        columns: [idColumn, intColumn('spray_session_id'), intColumn('part_id'), intColumn('step_position', true)],
        foreignKeys: [fk('spray_session_id', 'spray_sessions'), fk('part_id', 'parts')],
        indices: [
          { name: 'IDX_spray_session_items_session', columnNames: ['spray_session_id'] },
          { name: 'IDX_spray_session_items_part', columnNames: ['part_id'] },
        ],
      }),
    );
    await this.createCoats(queryRunner);
    await this.createReadings(queryRunner);
    const guards = queryRunner.connection.options.type === 'postgres' ? postgresGuards : sqliteGuards;
    for (const statement of guards.up) await queryRunner.query(statement);
  }

  private async createCoats(queryRunner: QueryRunner): Promise<void> {
    const instants = ['flash_off_ends_at', 'recoat_opens_at', 'touch_dry_at', 'handle_at', 'pack_at', 'full_cure_at', 'recorded_at'];
    await queryRunner.createTable(
      new Table({
        name: 'coats',
        columns: [
          idColumn,
          intColumn('spray_session_id'),
          intColumn('product_id'),
          intColumn('lot_id', true),
          intColumn('step_position', true),
          instantColumn('sprayed_at'),
          ...['air_temp_c', 'relative_humidity_pct', 'surface_temp_c', 'dew_point_c', 'thinning_pct'].map((name) => realColumn(name)),
          realColumn('wet_film_um', true),
          realColumn('dry_film_um', true),
          realColumn('drying_temp_c'),
          textColumn('drying_method', 30),
          ...instants.map((name) => instantColumn(name)),
          instantColumn('recoat_closes_at', true),
          { name: 'warnings', type: 'text' },
          { name: 'notes', type: 'text', default: "''" },
          { ...intColumn('version'), default: 1 },
          { ...intColumn('replaces_id', true), isUnique: true },
          { name: 'correction_reason', type: 'text', isNullable: true },
          intColumn('recorded_by_id', true),
          textColumn('recorded_by_name', 120),
          { ...textColumn('idempotency_key', 80, true), isUnique: true },
        ],
        foreignKeys: [fk('spray_session_id', 'spray_sessions'), fk('product_id', 'products'), fk('lot_id', 'product_lots'), fk('replaces_id', 'coats'), fk('recorded_by_id', 'users')],
        indices: [
          { name: 'IDX_coats_session', columnNames: ['spray_session_id'] },
          { name: 'IDX_coats_product', columnNames: ['product_id'] },
          { name: 'IDX_coats_sprayed_at', columnNames: ['sprayed_at'] },
        ],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'coat_parts',
        columns: [
          { ...intColumn('coat_id'), isPrimary: true },
          { ...intColumn('part_id'), isPrimary: true },
        ],
        foreignKeys: [fk('coat_id', 'coats'), fk('part_id', 'parts')],
        indices: [{ name: 'IDX_coat_parts_part', columnNames: ['part_id'] }],
      }),
    );
  }

  private async createReadings(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'readings',
        columns: [
          idColumn,
          intColumn('booth_id', true),
          intColumn('rack_id', true),
          instantColumn('at'),
          realColumn('air_temp_c'),
          realColumn('relative_humidity_pct'),
          realColumn('surface_temp_c', true),
          realColumn('dew_point_c'),
          textColumn('source', 10),
          intColumn('recorded_by_id', true),
        ],
        foreignKeys: [fk('booth_id', 'booths'), fk('rack_id', 'racks')],
        indices: [
          { name: 'IDX_readings_booth_at', columnNames: ['booth_id', 'at'] },
          { name: 'IDX_readings_rack_at', columnNames: ['rack_id', 'at'] },
        ],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    const guards = queryRunner.connection.options.type === 'postgres' ? postgresGuards : sqliteGuards;
    for (const statement of guards.down) await queryRunner.query(statement);
    for (const table of ['readings', 'coat_parts', 'coats', 'spray_session_items', 'spray_sessions']) await queryRunner.dropTable(table);
    await queryRunner.dropColumn('parts', 'collected_at');
    await queryRunner.dropColumn('booths', 'sensor_token_hash');
  }
}
