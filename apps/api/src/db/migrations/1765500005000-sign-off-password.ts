import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A project setting: a checker types their password again to countersign or
 * return a revision (false, the default and every existing project's: the
 * signed-in session suffices).
 */
export class SignOffPassword1765500005000 implements MigrationInterface {
  name = 'SignOffPassword1765500005000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'alter table projects add column sign_off_password boolean not null default false',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('alter table projects drop column sign_off_password');
  }
}
