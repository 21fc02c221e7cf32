import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The project site as the designer typed it ("5280 ft", "98.6 kPa"), beside
 * its SI value: revisions take the typed text into their inputs, so a sheet's
 * inputs table shows what was typed, not 1609.344.
 */
export class SiteAsTyped1765000000000 implements MigrationInterface {
  name = 'SiteAsTyped1765000000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`alter table projects add column site_as_typed jsonb`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`alter table projects drop column site_as_typed`);
  }
}
