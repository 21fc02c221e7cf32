import type pg from 'pg';
import type { DataSource } from 'typeorm';

/**
 * The pg pool under a TypeORM DataSource (PostgresDriver's `master`), for the
 * few hot queries that are worth a named prepared statement and no query
 * builder: the per-request session read (src/auth/authenticate.ts).
 */
export function pgPool(dataSource: DataSource): pg.Pool {
  const pool = (dataSource.driver as unknown as { master?: pg.Pool }).master;
  if (!pool) throw new DatabaseNotConnectedError();
  return pool;
}

/**
 * The DataSource has no connection pool (not yet initialised, or destroyed
 * while shutting down): to a client, the database is unavailable (a 503,
 * http/database-unavailable.ts), not a bug.
 */
export class DatabaseNotConnectedError extends Error {
  override readonly name = 'DatabaseNotConnectedError';
  constructor() {
    super('the DataSource is not initialised (no pg pool)');
  }
}
