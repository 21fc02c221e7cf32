import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The first migration: the deployment's identity. Every later table comes in
 * its own migration.
 */
export class Foundation1764640000000 implements MigrationInterface {
  name = 'Foundation1764640000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      create table deployment (
        id smallint primary key default 1 check (id = 1),
        instance_id uuid not null default gen_random_uuid(),
        created_at timestamptz not null default now()
      )`);
    await queryRunner.query(`insert into deployment default values`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`drop table deployment`);
  }
}
