import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * People and their credentials: users, refresh-token sessions (stored as
 * SHA-256 hashes, grouped in rotation families), invitations and password
 * resets (one-time tokens, also stored hashed).
 */
export class Accounts1764700000000 implements MigrationInterface {
  name = 'Accounts1764700000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      create table users (
        id uuid primary key,
        email text not null,
        name text not null,
        password_hash text not null,
        is_admin boolean not null default false,
        active boolean not null default true,
        unit_system text not null default 'si' check (unit_system in ('si', 'us')),
        auth_epoch integer not null default 0,
        created_at timestamptz not null default now(),
        updated_at timestamptz not null default now(),
        constraint users_email_lower check (email = lower(email))
      )`);
    await queryRunner.query(`create unique index users_email_key on users (email)`);
    await queryRunner.query(`create index users_name_idx on users (lower(name), id)`);

    await queryRunner.query(`
      create table refresh_tokens (
        id uuid primary key,
        user_id uuid not null references users (id) on delete cascade,
        family_id uuid not null,
        token_hash text not null,
        created_at timestamptz not null default now(),
        expires_at timestamptz not null,
        revoked_at timestamptz,
        revoked_reason text,
        replaced_by uuid
      )`);
    await queryRunner.query(
      `create unique index refresh_tokens_hash_key on refresh_tokens (token_hash)`,
    );
    await queryRunner.query(`create index refresh_tokens_family_idx on refresh_tokens (family_id)`);
    await queryRunner.query(
      `create index refresh_tokens_user_idx on refresh_tokens (user_id) where revoked_at is null`,
    );

    await queryRunner.query(`
      create table invitations (
        id uuid primary key,
        email text not null check (email = lower(email)),
        name text not null,
        is_admin boolean not null default false,
        token_hash text not null,
        invited_by uuid references users (id) on delete set null,
        created_at timestamptz not null default now(),
        expires_at timestamptz not null,
        accepted_at timestamptz,
        accepted_user_id uuid references users (id) on delete set null,
        revoked_at timestamptz
      )`);
    await queryRunner.query(`create unique index invitations_hash_key on invitations (token_hash)`);
    await queryRunner.query(
      `create index invitations_created_idx on invitations (created_at desc, id)`,
    );
    // One open invitation per address at a time.
    await queryRunner.query(
      `create unique index invitations_open_email_key on invitations (email)
         where accepted_at is null and revoked_at is null`,
    );

    await queryRunner.query(`
      create table password_resets (
        id uuid primary key,
        user_id uuid not null references users (id) on delete cascade,
        token_hash text not null,
        created_by uuid references users (id) on delete set null,
        created_at timestamptz not null default now(),
        expires_at timestamptz not null,
        used_at timestamptz
      )`);
    await queryRunner.query(
      `create unique index password_resets_hash_key on password_resets (token_hash)`,
    );
    await queryRunner.query(`create index password_resets_user_idx on password_resets (user_id)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`drop table password_resets`);
    await queryRunner.query(`drop table invitations`);
    await queryRunner.query(`drop table refresh_tokens`);
    await queryRunner.query(`drop table users`);
  }
}
