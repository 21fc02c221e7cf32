import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The transactional mail outbox and component attachments. The outbox index
 * serves the worker's "due and unsent" query; attachments are listed per
 * component, newest first.
 */
export class MailAndAttachments1764800000000 implements MigrationInterface {
  name = 'MailAndAttachments1764800000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      create table mail_outbox (
        id uuid primary key,
        kind text not null,
        recipients jsonb not null check (jsonb_typeof(recipients) = 'array' and jsonb_array_length(recipients) > 0),
        subject text not null,
        text_body text not null,
        html_body text not null,
        created_at timestamptz not null default now(),
        attempts integer not null default 0,
        next_attempt_at timestamptz not null default now(),
        locked_until timestamptz,
        sent_at timestamptz,
        failed_at timestamptz,
        last_error text
      )`);
    await queryRunner.query(
      `create index mail_outbox_due_idx on mail_outbox (next_attempt_at, created_at)
         where sent_at is null and failed_at is null`,
    );

    await queryRunner.query(`
      create table attachments (
        id uuid primary key,
        component_id uuid not null references components (id) on delete cascade,
        project_id uuid not null references projects (id) on delete cascade,
        name text not null,
        sha256 text not null check (sha256 ~ '^[0-9a-f]{64}$'),
        size bigint not null check (size > 0),
        content_type text not null,
        uploaded_by uuid references users (id) on delete set null,
        created_at timestamptz not null default now()
      )`);
    await queryRunner.query(
      `create index attachments_component_idx on attachments (component_id, created_at desc, id)`,
    );
    await queryRunner.query(`create index attachments_sha256_idx on attachments (sha256)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('drop table attachments');
    await queryRunner.query('drop table mail_outbox');
  }
}
