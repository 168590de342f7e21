import { Table, type MigrationInterface, type QueryRunner } from 'typeorm';
import { idColumn, instantColumn, textColumn } from './table-columns';

/**
 * Sites: booths, racks and users belong to one. Everything that exists goes to the first site,
 * so a single-site shop sees no change. Plain ALTER TABLE keeps SQLite from rebuilding tables
 * (and dropping their triggers); the service checks that a site exists.
 */
export class Sites1764710000000 implements MigrationInterface {
  name = 'Sites1764710000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'sites',
        columns: [idColumn, { ...textColumn('name', 80), isUnique: true }, instantColumn('created_at'), instantColumn('updated_at')],
      }),
    );
    const now = new Date().toISOString();
    await queryRunner.query(`INSERT INTO sites (name, created_at, updated_at) VALUES ('Main site', '${now}', '${now}')`);
    for (const table of ['booths', 'racks', 'users']) {
      await queryRunner.query(`ALTER TABLE ${table} ADD COLUMN site_id integer NOT NULL DEFAULT 1`);
      await queryRunner.query(`CREATE INDEX "IDX_${table}_site" ON ${table} (site_id)`);
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['booths', 'racks', 'users']) {
      await queryRunner.query(`DROP INDEX "IDX_${table}_site"`);
      await queryRunner.query(`ALTER TABLE ${table} DROP COLUMN site_id`);
    }
    await queryRunner.dropTable('sites');
  }
}
