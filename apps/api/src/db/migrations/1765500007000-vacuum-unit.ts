import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The unit a person reads vacuum levels in (absolute pressures below 1 kPa;
 * @hoopline/present holds the rule): one of VACUUM_UNITS of
 * @hoopline/contract. Null (the default, and every existing person): the unit
 * system's own, torr in US customary units and Pa in SI.
 */
export class VacuumUnit1765500007000 implements MigrationInterface {
  name = 'VacuumUnit1765500007000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      alter table users
        add column vacuum_unit text
          constraint users_vacuum_unit_check
          check (vacuum_unit is null or vacuum_unit in ('torr', 'mTorr', 'mbar', 'Pa'))`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('alter table users drop column vacuum_unit');
  }
}
