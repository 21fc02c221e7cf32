import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Removing an attachment keeps its row (removed_at, removed_by): a sheet
 * lists the attachments as of its countersign, so a file removed later must
 * still be named there, or a re-downloaded issued sheet would differ.
 */
export class AttachmentRemoval1764800001000 implements MigrationInterface {
  name = 'AttachmentRemoval1764800001000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      alter table attachments
        add column removed_at timestamptz,
        add column removed_by uuid references users (id) on delete set null`);
    await queryRunner.query('drop index attachments_component_idx');
    await queryRunner.query(
      `create index attachments_component_idx on attachments (component_id, created_at desc, id)
         where removed_at is null`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('drop index attachments_component_idx');
    await queryRunner.query(
      'create index attachments_component_idx on attachments (component_id, created_at desc, id)',
    );
    await queryRunner.query(
      'alter table attachments drop column removed_at, drop column removed_by',
    );
  }
}
