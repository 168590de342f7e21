import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The shop's locale (how dates, times and numbers are written in e-mails and downloads) and the
 * currency of its prices. Existing shops get en-GB and GBP, what the product assumed until now.
 * Plain ALTER TABLE keeps SQLite from rebuilding the table.
 */
export class ShopLocaleAndCurrency1764780000001 implements MigrationInterface {
  name = 'ShopLocaleAndCurrency1764780000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query("ALTER TABLE shop_settings ADD COLUMN locale varchar(35) NOT NULL DEFAULT 'en-GB'");
    await queryRunner.query("ALTER TABLE shop_settings ADD COLUMN currency varchar(3) NOT NULL DEFAULT 'GBP'");
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE shop_settings DROP COLUMN currency');
    await queryRunner.query('ALTER TABLE shop_settings DROP COLUMN locale');
  }
}
