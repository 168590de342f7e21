import { Table, type MigrationInterface, type QueryRunner, type TableColumnOptions } from 'typeorm';
import { idColumn, instantColumn, intColumn, realColumn, textColumn } from './table-columns';

const dateColumn = (name: string, isNullable = false): TableColumnOptions => textColumn(name, 10, isNullable);
const notesColumn: TableColumnOptions = { name: 'notes', type: 'text', default: "''" };
const recordedBy = (prefix: string): TableColumnOptions[] => [intColumn(`${prefix}_id`, true), textColumn(`${prefix}_name`, 120)];
const boothKey = { columnNames: ['booth_id'], referencedTableName: 'booths', referencedColumnNames: ['id'] };
const bankKey = { columnNames: ['filter_bank_id'], referencedTableName: 'filter_banks', referencedColumnNames: ['id'] };

/** Evidence records: once written they never change, whatever code (or hand-written SQL) runs. */
export const appendOnlyUpkeepTables = ['filter_gauge_readings', 'filter_changes', 'extraction_tests', 'fire_inspections', 'crew_records', 'coat_photos'];

const tables = [
  new Table({
    name: 'filter_banks',
    columns: [idColumn, intColumn('booth_id'), textColumn('name', 80), textColumn('kind', 20), intColumn('change_at_pa'), { name: 'active', type: 'boolean', default: true }, instantColumn('created_at'), instantColumn('updated_at')],
    foreignKeys: [boothKey],
    indices: [{ name: 'IDX_filter_banks_booth', columnNames: ['booth_id'] }],
  }),
  new Table({
    name: 'filter_gauge_readings',
    columns: [idColumn, intColumn('filter_bank_id'), intColumn('booth_id'), realColumn('pressure_drop_pa'), instantColumn('at'), textColumn('source', 10), ...recordedBy('recorded_by')],
    foreignKeys: [bankKey, boothKey],
    indices: [
      { name: 'IDX_filter_gauge_readings_bank_at', columnNames: ['filter_bank_id', 'at'] },
      { name: 'IDX_filter_gauge_readings_booth', columnNames: ['booth_id'] },
    ],
  }),
  new Table({
    name: 'filter_changes',
    columns: [idColumn, intColumn('filter_bank_id'), intColumn('booth_id'), instantColumn('changed_at'), realColumn('before_pa', true), realColumn('after_pa', true), notesColumn, ...recordedBy('changed_by')],
    foreignKeys: [bankKey, boothKey],
    indices: [
      { name: 'IDX_filter_changes_bank_at', columnNames: ['filter_bank_id', 'changed_at'] },
      { name: 'IDX_filter_changes_booth', columnNames: ['booth_id'] },
    ],
  }),
  new Table({
    name: 'extraction_tests',
    columns: [
      ...[idColumn, intColumn('booth_id'), dateColumn('tested_on'), { name: 'face_velocity_points_mps', type: 'text' }, realColumn('mean_face_velocity_mps'), realColumn('min_face_velocity_mps')],
      ...[realColumn('clearance_min', true), textColumn('tested_by', 120), dateColumn('next_due_on', true), notesColumn, ...recordedBy('recorded_by'), instantColumn('recorded_at')],
    ],
    foreignKeys: [boothKey],
    indices: [{ name: 'IDX_extraction_tests_booth_on', columnNames: ['booth_id', 'tested_on'] }],
  }),
  new Table({
    name: 'fire_inspections',
    columns: [idColumn, intColumn('booth_id'), dateColumn('inspected_on'), textColumn('inspected_by', 120), { name: 'passed', type: 'boolean' }, dateColumn('next_due_on', true), notesColumn, ...recordedBy('recorded_by'), instantColumn('recorded_at')],
    foreignKeys: [boothKey],
    indices: [{ name: 'IDX_fire_inspections_booth_on', columnNames: ['booth_id', 'inspected_on'] }],
  }),
  new Table({
    name: 'crew_records',
    columns: [
      ...[idColumn, intColumn('user_id'), textColumn('kind', 30), dateColumn('done_on'), dateColumn('next_due_on', true), textColumn('respirator_model', 120, true), textColumn('result', 10, true)],
      ...[textColumn('title', 120, true), notesColumn, ...recordedBy('recorded_by'), instantColumn('recorded_at')],
    ],
    foreignKeys: [{ columnNames: ['user_id'], referencedTableName: 'users', referencedColumnNames: ['id'] }],
    indices: [{ name: 'IDX_crew_records_user_kind_on', columnNames: ['user_id', 'kind', 'done_on'] }],
  }),
  new Table({
    name: 'coat_photos',
    columns: [
      ...[idColumn, intColumn('coat_id'), textColumn('subject', 20), { name: 'caption', type: 'text', default: "''" }, { ...textColumn('stored_name', 80), isUnique: true }],
      ...[textColumn('mime_type', 40), intColumn('size_bytes'), intColumn('taken_by_id', true), textColumn('taken_by_name', 120), instantColumn('taken_at')],
    ],
    foreignKeys: [{ columnNames: ['coat_id'], referencedTableName: 'coats', referencedColumnNames: ['id'] }],
    indices: [{ name: 'IDX_coat_photos_coat', columnNames: ['coat_id'] }],
  }),
];

const settingsColumns: [string, number][] = [
  ['extraction_test_months', 14],
  ['fire_inspection_months', 12],
  ['fit_test_months', 12],
  ['health_surveillance_months', 12],
  ['upkeep_due_soon_days', 30],
];

function guards(postgres: boolean): { up: string[]; down: string[] } {
  if (postgres) {
    return {
      up: [
        `CREATE FUNCTION boothwright_upkeep_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
         BEGIN RAISE EXCEPTION 'append_only: upkeep, crew and photo records are never changed or deleted; record a new one'; END $$`,
        ...appendOnlyUpkeepTables.map((t) => `CREATE TRIGGER ${t}_append_only BEFORE UPDATE OR DELETE ON ${t} FOR EACH ROW EXECUTE FUNCTION boothwright_upkeep_append_only()`),
      ],
      down: [...appendOnlyUpkeepTables.map((t) => `DROP TRIGGER ${t}_append_only ON ${t}`), 'DROP FUNCTION boothwright_upkeep_append_only()'],
    };
  }
  return {
    up: appendOnlyUpkeepTables.flatMap((t) => [
      `CREATE TRIGGER ${t}_no_update BEFORE UPDATE ON ${t} BEGIN SELECT RAISE(ABORT, 'append_only: upkeep, crew and photo records are never changed; record a new one'); END`,
      `CREATE TRIGGER ${t}_no_delete BEFORE DELETE ON ${t} BEGIN SELECT RAISE(ABORT, 'append_only: upkeep, crew and photo records are never deleted'); END`,
    ]),
    down: appendOnlyUpkeepTables.flatMap((t) => [`DROP TRIGGER ${t}_no_update`, `DROP TRIGGER ${t}_no_delete`]),
  };
}

/**
 * Booth upkeep (filter banks, gauge readings, filter changes, extraction tests, fire inspections),
 * crew protection records and coat photos, and the shop's upkeep intervals. The records are
 * evidence beside the coat log, so the database refuses to change or delete them.
 */
export class UpkeepAndCrew1764760000000 implements MigrationInterface {
  name = 'UpkeepAndCrew1764760000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    for (const table of tables) await queryRunner.createTable(table);
    // Plain ALTER TABLE keeps SQLite from rebuilding the settings table.
    for (const [column, value] of settingsColumns) await queryRunner.query(`ALTER TABLE shop_settings ADD COLUMN ${column} integer NOT NULL DEFAULT ${value}`);
    for (const sql of guards(queryRunner.connection.options.type === 'postgres').up) await queryRunner.query(sql);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const sql of guards(queryRunner.connection.options.type === 'postgres').down) await queryRunner.query(sql);
    for (const [column] of settingsColumns) await queryRunner.query(`ALTER TABLE shop_settings DROP COLUMN ${column}`);
    for (const table of [...tables].reverse()) await queryRunner.dropTable(table.name);
  }
}
