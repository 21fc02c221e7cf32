import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Every change to a user row or a refresh token is announced on the
 * `hoopline_sessions` channel (delivered at commit), so that each API
 * process's session cache (src/auth/session-cache.ts) drops what changed:
 * `user:<id>` for users, `family:<id>` for refresh tokens. Triggers, not
 * application code, so no path that changes a session (a service, a script,
 * psql by hand) can forget to.
 */
export class SessionNotifications1765100003000 implements MigrationInterface {
  name = 'SessionNotifications1765100003000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      create function hoopline_notify_user() returns trigger language plpgsql as $$
      begin
        perform pg_notify('hoopline_sessions', 'user:' || coalesce(new.id, old.id)::text);
        return null;
      end $$`);
    await queryRunner.query(`
      create trigger users_notify_sessions after update or delete on users
        for each row execute function hoopline_notify_user()`);
    await queryRunner.query(`
      create function hoopline_notify_family() returns trigger language plpgsql as $$
      begin
        perform pg_notify('hoopline_sessions', 'family:' || coalesce(new.family_id, old.family_id)::text);
        return null;
      end $$`);
    await queryRunner.query(`
      create trigger refresh_tokens_notify_sessions after update or delete on refresh_tokens
        for each row execute function hoopline_notify_family()`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('drop trigger refresh_tokens_notify_sessions on refresh_tokens');
    await queryRunner.query('drop function hoopline_notify_family()');
    await queryRunner.query('drop trigger users_notify_sessions on users');
    await queryRunner.query('drop function hoopline_notify_user()');
  }
}
