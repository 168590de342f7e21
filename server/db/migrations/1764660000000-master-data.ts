import { Table, type MigrationInterface, type QueryRunner, type TableForeignKeyOptions } from 'typeorm';
import { idColumn, instantColumn, intColumn, realColumn, textColumn } from './table-columns';

const fk = (column: string, table: string): TableForeignKeyOptions => ({ columnNames: [column], referencedTableName: table, referencedColumnNames: ['id'], onDelete: 'RESTRICT' });

export class MasterData1764660000000 implements MigrationInterface {
  name = 'MasterData1764660000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'stored_files',
        columns: [idColumn, textColumn('original_name', 255), { ...textColumn('stored_name', 80), isUnique: true }, textColumn('mime_type', 80), intColumn('size_bytes'), intColumn('uploaded_by', true), instantColumn('uploaded_at')],
      }),
    );
    await this.createProducts(queryRunner);
    await queryRunner.createTable(
      new Table({
        name: 'product_lots',
        columns: [idColumn, intColumn('product_id'), textColumn('lot_number', 60), textColumn('expires_on', 10, true), instantColumn('created_at')],
        foreignKeys: [fk('product_id', 'products')],
        uniques: [{ name: 'UQ_product_lots_number', columnNames: ['product_id', 'lot_number'] }],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'finish_systems',
        columns: [idColumn, textColumn('name', 120), { name: 'description', type: 'text', default: "''" }, instantColumn('created_at'), instantColumn('updated_at')],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'finish_steps',
        columns: [idColumn, intColumn('finish_system_id'), intColumn('position'), textColumn('kind', 10), intColumn('product_id', true), realColumn('dry_film_um', true), textColumn('grit', 10, true)],
        foreignKeys: [fk('finish_system_id', 'finish_systems'), fk('product_id', 'products')],
        uniques: [{ name: 'UQ_finish_steps_position', columnNames: ['finish_system_id', 'position'] }],
      }),
    );
    await this.createJobsAndParts(queryRunner);
  }

  private async createProducts(queryRunner: QueryRunner): Promise<void> {
    const optionalReals = ['density_kg_per_l', 'pot_life_min', 'dry_film_per_coat_um', 'reference_rh_pct', 'min_application_temp_c', 'max_relative_humidity_pct', 'voc_g_per_l', 'flash_point_c', 'price_per_l'];
    await queryRunner.createTable(
      new Table({
        name: 'products',
        columns: [
          idColumn,
          textColumn('name', 120),
          { ...textColumn('maker_ref', 80), default: "''" },
          textColumn('kind', 20),
          textColumn('chemistry', 40),
          realColumn('volume_solids_pct'),
          { ...realColumn('mix_base_parts'), default: 1 },
          { ...realColumn('mix_hardener_parts'), default: 0 },
          { ...realColumn('thinner_min_pct'), default: 0 },
          { ...realColumn('thinner_max_pct'), default: 0 },
          { ...realColumn('induction_min'), default: 0 },
          ...optionalReals.map((name) => realColumn(name, true)),
          { name: 'hazards', type: 'text' },
          { name: 'drying_times', type: 'text' },
          intColumn('tds_file_id', true),
          intColumn('sds_file_id', true),
          instantColumn('created_at'),
          instantColumn('updated_at'),
        ],
        foreignKeys: [fk('tds_file_id', 'stored_files'), fk('sds_file_id', 'stored_files')],
        indices: [{ name: 'IDX_products_name', columnNames: ['name'] }],
      }),
    );
  }

  private async createJobsAndParts(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'jobs',
        columns: [
          idColumn,
          textColumn('customer', 120),
          { ...textColumn('reference', 60), isUnique: true },
          textColumn('due_date', 10),
          intColumn('finish_system_id', true),
          { ...textColumn('colour', 80), default: "''" },
          { ...textColumn('sheen', 40), default: "''" },
          { name: 'notes', type: 'text', default: "''" },
          { ...textColumn('state', 20), default: "'open'" },
          instantColumn('created_at'),
          instantColumn('updated_at'),
        ],
        foreignKeys: [fk('finish_system_id', 'finish_systems')],
        indices: [{ name: 'IDX_jobs_due_date', columnNames: ['due_date'] }],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'parts',
        columns: [
          idColumn,
          intColumn('job_id'),
          textColumn('label', 80),
          { ...textColumn('kind', 40), default: "''" },
          realColumn('length_mm'),
          realColumn('width_mm'),
          realColumn('thickness_mm'),
          { ...intColumn('quantity'), default: 1 },
          { ...textColumn('faces', 4), default: "'both'" },
          { name: 'edges', type: 'boolean', default: true },
          realColumn('coated_area_m2'),
          intColumn('rack_id', true),
          intColumn('shelf', true),
          { ...textColumn('tag', 16), isUnique: true },
          { ...textColumn('state', 20), default: "'waiting'" },
          instantColumn('created_at'),
          instantColumn('updated_at'),
        ],
        foreignKeys: [fk('job_id', 'jobs'), fk('rack_id', 'racks')],
        indices: [
          { name: 'IDX_parts_job_id', columnNames: ['job_id'] },
          { name: 'IDX_parts_rack_id', columnNames: ['rack_id'] },
          { name: 'IDX_parts_state', columnNames: ['state'] },
        ],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['parts', 'jobs', 'finish_steps', 'finish_systems', 'product_lots', 'products', 'stored_files']) {
      await queryRunner.dropTable(table);
    }
  }
}
