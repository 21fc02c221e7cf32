import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Rendered PDF sheets kept by content (src/domain/sheets/sheet-cache.ts):
 * the key is the SHA-256 of everything the sheet prints and of the renderer,
 * so a sheet is rendered once and served again from here by any API process.
 * Bounded in bytes by HOOPLINE_SHEET_CACHE_MB (least recently served go
 * first); a revision's rows go with it.
 */
export class SheetRenders1765100001000 implements MigrationInterface {
  name = 'SheetRenders1765100001000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      create table sheet_renders (
        key text primary key check (key ~ '^[0-9a-f]{64}$'),
        revision_id uuid not null references revisions (id) on delete cascade,
        pdf bytea not null,
        size integer not null check (size > 0),
        rendered_at timestamptz not null,
        last_served_at timestamptz not null
      )`);
    await queryRunner.query(
      `create index sheet_renders_served_idx on sheet_renders (last_served_at desc, key)`,
    );
    await queryRunner.query(
      `create index sheet_renders_revision_idx on sheet_renders (revision_id)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('drop table sheet_renders');
  }
}
