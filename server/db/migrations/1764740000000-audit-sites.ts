import type { MigrationInterface, QueryRunner } from 'typeorm';

const idText = (column: string) => `CAST(${column} AS varchar(40))`;

/**
 * Audit entries name the site they are about (a booth, rack, user or spray session of one site),
 * so a lead reads their own site's trail and the group's, never another site's. Entries about
 * group-wide things (jobs, data sheets, settings) keep no site. Plain ALTER TABLE keeps SQLite
 * from rebuilding the table.
 */
export class AuditSites1764740000000 implements MigrationInterface {
  name = 'AuditSites1764740000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE audit_entries ADD COLUMN site_id integer NULL');
    await queryRunner.query('CREATE INDEX "IDX_audit_entries_site" ON audit_entries (site_id)');
    for (const [entity, table] of [['booth', 'booths'], ['rack', 'racks'], ['user', 'users']]) {
      await queryRunner.query(`UPDATE audit_entries SET site_id = (SELECT t.site_id FROM ${table} t WHERE ${idText('t.id')} = audit_entries.entity_id) WHERE entity = '${entity}'`);
    }
    await queryRunner.query(
      `UPDATE audit_entries SET site_id = (SELECT b.site_id FROM spray_sessions s JOIN booths b ON b.id = s.booth_id WHERE ${idText('s.id')} = audit_entries.entity_id) WHERE entity = 'spray-session'`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_audit_entries_site"');
    await queryRunner.query('ALTER TABLE audit_entries DROP COLUMN site_id');
  }
}
