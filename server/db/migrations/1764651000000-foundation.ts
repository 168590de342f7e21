import { Table, TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';
import { idColumn as id, instantColumn as instant, realColumn as real, textColumn as text } from './table-columns';

export class Foundation1764651000000 implements MigrationInterface {
  name = 'Foundation1764651000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'users',
        columns: [
          id,
          { ...text('email', 254), isUnique: true },
          text('name', 120),
          text('role', 20),
          { ...text('units', 10), default: "'metric'" },
          text('password_hash', 255),
          { name: 'disabled', type: 'boolean', default: false },
          instant('created_at'),
          instant('updated_at'),
        ],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'sessions',
        columns: [
          { name: 'id', type: 'varchar', length: '255', isPrimary: true },
          { name: 'expired_at', type: 'bigint' },
          { name: 'json', type: 'text' },
          text('destroyed_at', 40, true),
        ],
        indices: [{ name: 'IDX_sessions_expired_at', columnNames: ['expired_at'] }],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'booths',
        columns: [
          id,
          text('name', 80),
          text('kind', 20),
          real('volume_m3'),
          real('extraction_m3_per_h'),
          { ...real('mixing_factor_k'), default: 3 },
          real('measured_clearance_min', true),
          { ...real('min_face_velocity_mps'), default: 0.5 },
          real('open_face_area_m2', true),
          { name: 'opening_hours', type: 'text' },
          { ...real('spray_rate_m2_per_h'), default: 20 },
          instant('created_at'),
          instant('updated_at'),
        ],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'racks',
        columns: [
          id,
          text('name', 80),
          text('location', 20),
          { name: 'shelves', type: 'integer' },
          real('shelf_area_m2'),
          real('drying_temp_c', true),
          instant('created_at'),
          instant('updated_at'),
        ],
      }),
    );
    await this.createAuditAndSettings(queryRunner);
  }

  private async createAuditAndSettings(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'audit_entries',
        columns: [
          id,
          instant('at'),
          { name: 'user_id', type: 'integer', isNullable: true },
          text('user_name', 120),
          text('action', 40),
          text('entity', 40),
          text('entity_id', 40, true),
          { name: 'summary', type: 'text' },
          { name: 'changes', type: 'text', isNullable: true },
        ],
      }),
    );
    await queryRunner.createIndex('audit_entries', new TableIndex({ name: 'IDX_audit_entries_at', columnNames: ['at'] }));
    await queryRunner.createIndex('audit_entries', new TableIndex({ name: 'IDX_audit_entries_entity', columnNames: ['entity'] }));
    await queryRunner.createTable(
      new Table({
        name: 'shop_settings',
        columns: [
          { name: 'id', type: 'integer', isPrimary: true },
          text('shop_name', 120),
          text('timezone', 64),
          text('default_units', 10),
          real('planning_drying_temp_c'),
          { name: 'setup_min', type: 'integer' },
          { name: 'clean_down_min', type: 'integer' },
          real('yearly_solvent_threshold_kg'),
          { name: 'daily_plan_hour', type: 'integer' },
          instant('updated_at'),
        ],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['shop_settings', 'audit_entries', 'racks', 'booths', 'sessions', 'users']) {
      await queryRunner.dropTable(table);
    }
  }
}
