import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Returned work (issue 16.1): a checker's remarks by trail step, kept with
 * the return they belong to (the sign_offs row, beside its comment), as a
 * jsonb list of `{ step, text }` (step: the trail's number, 1…N). Older
 * sign-offs have none.
 */
export class SignOffRemarks1765500006000 implements MigrationInterface {
  name = 'SignOffRemarks1765500006000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `alter table sign_offs add column remarks jsonb not null default '[]'::jsonb
         check (jsonb_typeof(remarks) = 'array')`,
    );
    // "Returned to me": the returned revisions of an author, newest decided first.
    await queryRunner.query(
      `create index revisions_returned_author_idx on revisions (author_id, decided_at desc)
        where status = 'returned'`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('drop index revisions_returned_author_idx');
    await queryRunner.query('alter table sign_offs drop column remarks');
  }
}
