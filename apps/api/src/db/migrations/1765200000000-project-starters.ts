import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Who may start projects (issue 17.1): an installation setting, 'everyone' or
 * 'named' (administrators and the people an administrator names). Starting a
 * project makes one its designer, and designers may look people up by
 * address, so an open setting lets anyone with an account learn who has one.
 * New installations start 'named'; on an existing one everybody who designs a
 * project today is named, so nobody who leads work loses the right.
 */
export class ProjectStarters1765200000000 implements MigrationInterface {
  name = 'ProjectStarters1765200000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      alter table deployment
        add column project_creation text not null default 'named'
          check (project_creation in ('everyone', 'named'))`);
    await queryRunner.query(
      `alter table users add column may_create_projects boolean not null default false`,
    );
    await queryRunner.query(`
      update users set may_create_projects = true
       where id in (select user_id from project_members where role = 'designer')`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`alter table users drop column may_create_projects`);
    await queryRunner.query(`alter table deployment drop column project_creation`);
  }
}
