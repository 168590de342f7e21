import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Whether a data sheet gives a thinning range. Before this column the product form and the API
 * filled a range nobody typed with 0–0 %, which then warned on every thinned coat. A stored 0–0
 * is read as "not given" unless someone changed the thinning figures after adding the data sheet
 * (an audit entry names them): that 0–0 was chosen on purpose and stays a "do not thin" range.
 * Plain ALTER TABLE keeps SQLite from rebuilding the products table.
 */
export class ThinningRangeGiven1764780000000 implements MigrationInterface {
  name = 'ThinningRangeGiven1764780000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE products ADD COLUMN thinning_range_given boolean NOT NULL DEFAULT true');
    await queryRunner.query(`UPDATE products SET thinning_range_given = false
      WHERE thinner_min_pct = 0 AND thinner_max_pct = 0
        AND NOT EXISTS (
          SELECT 1 FROM audit_entries a
          WHERE a.entity = 'product' AND a.action = 'update' AND a.entity_id = CAST(products.id AS varchar(20))
            AND (a.changes LIKE '%"thinnerMinPct"%' OR a.changes LIKE '%"thinnerMaxPct"%'))`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE products DROP COLUMN thinning_range_given');
  }
}
