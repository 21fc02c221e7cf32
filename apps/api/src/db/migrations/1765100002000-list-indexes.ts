import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A fabricator's revision list reads only countersigned revisions: a partial
 * index keeps that page and its count off the rest of a long history.
 */
export class ListIndexes1765100002000 implements MigrationInterface {
  name = 'ListIndexes1765100002000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `create index revisions_countersigned_idx on revisions (component_id, number desc)
         where status = 'countersigned'`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('drop index revisions_countersigned_idx');
  }
}
