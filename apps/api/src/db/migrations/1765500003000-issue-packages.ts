import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issue packages (src/domain/sheets/sheets.service.ts): a project's index
 * sheet and the sheets of its countersigned revisions in one PDF. A package
 * is named by its set: `hash` is the SHA-256 of the project id and the sorted
 * content hashes of the revisions it holds, so the same set is the same row
 * however often it is downloaded; `code` is its first 12 digits, printed as
 * PKG-xxxx-xxxx-xxxx and verified at /verify. The row remembers the
 * revisions, so a package stays verifiable after its set is superseded.
 */
export class IssuePackages1765500003000 implements MigrationInterface {
  name = 'IssuePackages1765500003000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      create table issue_packages (
        hash text primary key check (hash ~ '^[0-9a-f]{64}$'),
        code text not null check (code ~ '^[0-9a-f]{12}$' and hash like code || '%'),
        project_id uuid not null references projects (id) on delete cascade,
        revision_ids uuid[] not null check (cardinality(revision_ids) > 0),
        created_by uuid references users (id) on delete set null,
        created_at timestamptz not null
      )`);
    await queryRunner.query('create index issue_packages_code_idx on issue_packages (code)');
    await queryRunner.query(
      'create index issue_packages_project_idx on issue_packages (project_id, created_at)',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('drop table issue_packages');
  }
}
