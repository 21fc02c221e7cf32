import type pg from 'pg';
import type { DataSource } from 'typeorm';

/**
 * The pg pool under a TypeORM DataSource (PostgresDriver's `master`), for the
 * few hot queries that are worth a named prepared statement and no query
 * builder: the per-request session read (src/auth/authenticate.ts).
 */
export function pgPool(dataSource: DataSource): pg.Pool {
  const pool = (dataSource.driver as unknown as { master?: pg.Pool }).master;
  if (!pool) throw new Error('the DataSource is not initialised (no pg pool)');
  return pool;
}
