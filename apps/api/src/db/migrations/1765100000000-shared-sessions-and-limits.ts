import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * State that several API processes must share: the sign-in rate-limit
 * counters (one row per key and fixed window; express-rate-limit's store,
 * src/auth/rate-limit.ts), and an index for the per-request session check
 * (is there a live refresh token in the access token's family?).
 */
export class SharedSessionsAndLimits1765100000000 implements MigrationInterface {
  name = 'SharedSessionsAndLimits1765100000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      create table rate_limit_hits (
        key text primary key,
        hits integer not null check (hits >= 0),
        reset_at timestamptz not null
      )`);
    await queryRunner.query(`create index rate_limit_hits_reset_idx on rate_limit_hits (reset_at)`);
    await queryRunner.query(
      `create index refresh_tokens_live_family_idx on refresh_tokens (family_id, expires_at)
         where revoked_at is null`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('drop index refresh_tokens_live_family_idx');
    await queryRunner.query('drop table rate_limit_hits');
  }
}
