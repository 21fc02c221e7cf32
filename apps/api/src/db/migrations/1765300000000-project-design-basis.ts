import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The project's design basis, written into every component's inputs as the
 * site is (when the inputs carry none): the basis of the allowable stress
 * (ASME VIII-1, the default, or EN 13445-3) and the barometer (the standard
 * atmosphere, or a high barometer of 105 kPa at sea level). Existing
 * projects keep the engine's defaults.
 */
export class ProjectDesignBasis1765300000000 implements MigrationInterface {
  name = 'ProjectDesignBasis1765300000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      alter table projects
        add column allowable_basis text not null default 'asme-viii-1'
          check (allowable_basis in ('asme-viii-1', 'en-13445-3')),
        add column design_barometer text not null default 'standard'
          check (design_barometer in ('standard', 'high'))`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'alter table projects drop column allowable_basis, drop column design_barometer',
    );
  }
}
