import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The work: projects and their members, custom materials, components, their
 * immutable revisions, sign-offs and the audit log. Indexes follow the list
 * queries (project lists, component lists, revision history, check queue,
 * issued revisions, verify by hash, audit filters).
 */
export class ProjectsAndRevisions1764700001000 implements MigrationInterface {
  name = 'ProjectsAndRevisions1764700001000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      create table projects (
        id uuid primary key,
        number text not null,
        name text not null,
        client text not null default '',
        site_altitude double precision,
        site_ambient_pressure double precision,
        unit_system text not null default 'si' check (unit_system in ('si', 'us')),
        notes text not null default '',
        version integer not null default 1,
        created_by uuid references users (id) on delete set null,
        created_at timestamptz not null default now(),
        updated_at timestamptz not null default now(),
        constraint projects_site_one check (site_altitude is null or site_ambient_pressure is null)
      )`);
    await queryRunner.query(`create unique index projects_number_key on projects (lower(number))`);
    await queryRunner.query(`create index projects_updated_idx on projects (updated_at desc, id)`);
    await queryRunner.query(`create index projects_name_idx on projects (lower(name), id)`);
    await queryRunner.query(`create index projects_client_idx on projects (lower(client), id)`);

    await queryRunner.query(`
      create table project_members (
        project_id uuid not null references projects (id) on delete cascade,
        user_id uuid not null references users (id) on delete cascade,
        role text not null check (role in ('designer', 'checker', 'fabricator')),
        added_by uuid references users (id) on delete set null,
        added_at timestamptz not null default now(),
        primary key (project_id, user_id)
      )`);
    await queryRunner.query(
      `create index project_members_user_idx on project_members (user_id, role)`,
    );

    await queryRunner.query(`
      create table custom_materials (
        id uuid primary key,
        project_id uuid not null references projects (id) on delete cascade,
        name text not null,
        material jsonb not null,
        created_by uuid references users (id) on delete set null,
        created_at timestamptz not null default now()
      )`);
    await queryRunner.query(
      `create index custom_materials_project_idx on custom_materials (project_id, created_at)`,
    );

    await queryRunner.query(`
      create table components (
        id uuid primary key,
        project_id uuid not null references projects (id) on delete cascade,
        name text not null,
        kind text not null,
        tag text not null default '',
        version integer not null default 1,
        latest_revision_id uuid,
        issued_revision_id uuid,
        created_by uuid references users (id) on delete set null,
        created_at timestamptz not null default now(),
        updated_at timestamptz not null default now()
      )`);
    await queryRunner.query(
      `create index components_project_idx on components (project_id, lower(name), id)`,
    );
    await queryRunner.query(
      `create index components_issued_idx on components (project_id) where issued_revision_id is not null`,
    );

    await queryRunner.query(`
      create table revisions (
        id uuid primary key,
        component_id uuid not null references components (id) on delete cascade,
        project_id uuid not null references projects (id) on delete cascade,
        number integer not null check (number >= 1),
        status text not null check (status in ('draft', 'submitted', 'countersigned', 'returned')),
        note text not null default '',
        inputs jsonb not null,
        engine_version text not null,
        report jsonb not null,
        content_hash text not null check (content_hash ~ '^[0-9a-f]{64}$'),
        verdict text not null,
        author_id uuid not null references users (id),
        created_at timestamptz not null default now(),
        submitted_at timestamptz,
        decided_at timestamptz,
        superseded_at timestamptz,
        superseded_by uuid references revisions (id)
      )`);
    await queryRunner.query(
      `create unique index revisions_component_number_key on revisions (component_id, number)`,
    );
    await queryRunner.query(
      `create index revisions_queue_idx on revisions (project_id, submitted_at, id) where status = 'submitted'`,
    );
    await queryRunner.query(
      `create index revisions_hash_idx on revisions (content_hash text_pattern_ops)`,
    );
    await queryRunner.query(`create index revisions_author_idx on revisions (author_id)`);
    await queryRunner.query(`
      alter table components
        add constraint components_latest_fk foreign key (latest_revision_id) references revisions (id),
        add constraint components_issued_fk foreign key (issued_revision_id) references revisions (id)`);

    await queryRunner.query(`
      create table sign_offs (
        id uuid primary key,
        revision_id uuid not null references revisions (id) on delete cascade,
        checker_id uuid not null references users (id),
        decision text not null check (decision in ('countersigned', 'returned')),
        comment text not null default '',
        hash_signed text not null,
        created_at timestamptz not null default now()
      )`);
    await queryRunner.query(
      `create index sign_offs_revision_idx on sign_offs (revision_id, created_at)`,
    );
    // The database itself refuses a second countersign of one revision.
    await queryRunner.query(
      `create unique index sign_offs_one_countersign_key on sign_offs (revision_id) where decision = 'countersigned'`,
    );

    await queryRunner.query(`
      create table audit_events (
        id uuid primary key,
        seq bigserial not null,
        actor_id uuid references users (id) on delete set null,
        action text not null,
        entity_type text not null,
        entity_id uuid,
        project_id uuid references projects (id) on delete set null,
        summary jsonb not null default '{}'::jsonb,
        created_at timestamptz not null default now()
      )`);
    await queryRunner.query(`create index audit_events_time_idx on audit_events (seq desc)`);
    await queryRunner.query(
      `create index audit_events_project_idx on audit_events (project_id, seq desc)`,
    );
    await queryRunner.query(
      `create index audit_events_actor_idx on audit_events (actor_id, seq desc)`,
    );
    await queryRunner.query(
      `create index audit_events_entity_idx on audit_events (entity_type, entity_id, seq desc)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`drop table audit_events`);
    await queryRunner.query(`drop table sign_offs`);
    await queryRunner.query(
      `alter table components drop constraint components_latest_fk, drop constraint components_issued_fk`,
    );
    await queryRunner.query(`drop table revisions`);
    await queryRunner.query(`drop table components`);
    await queryRunner.query(`drop table custom_materials`);
    await queryRunner.query(`drop table project_members`);
    await queryRunner.query(`drop table projects`);
  }
}
