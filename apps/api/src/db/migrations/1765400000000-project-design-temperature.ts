import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The project's default design temperature, as typed ("150 degC", or a number
 * in K): written into a component's inputs as its `designTemperature` when
 * the inputs carry none. Null (the default, and every existing project): no
 * default, so components are screened at room temperature unless they give
 * their own.
 */
export class ProjectDesignTemperature1765400000000 implements MigrationInterface {
  name = 'ProjectDesignTemperature1765400000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      alter table projects
        add column design_temperature jsonb
          check (design_temperature is null or jsonb_typeof(design_temperature) in ('string', 'number'))`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('alter table projects drop column design_temperature');
  }
}
