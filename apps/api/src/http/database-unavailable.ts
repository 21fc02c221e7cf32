/**
 * Whether an error means "the database cannot be reached right now" (stopped,
 * restarting, refusing connections, a pooled connection cut), as opposed to a
 * bug or a refused statement. Such an error is a 503 the client may retry, not
 * a 500: nothing was written, because PostgreSQL commits a transaction whole
 * or not at all.
 */

/** Seconds a client is told to wait before retrying (the Retry-After header). */
export const DATABASE_RETRY_AFTER_SECONDS = 5;

/** Node socket errors of a connection that could not be made or was cut. */
const SOCKET_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'ENOTFOUND',
  'EAI_AGAIN',
]);

/**
 * PostgreSQL SQLSTATEs of a server going away or not there yet: class 08
 * (connection exception), 57P01 admin_shutdown, 57P02 crash_shutdown,
 * 57P03 cannot_connect_now (starting up or shutting down), 53300
 * too_many_connections.
 */
const SQLSTATES = new Set(['57P01', '57P02', '57P03', '53300']);

/** Messages node-postgres and its pool use for a cut or unmakeable connection. */
const MESSAGES = [
  /connection terminated/i,
  /timeout exceeded when trying to connect/i,
  /connection timeout/i,
  /client has encountered a connection error and is not queryable/i,
  /cannot use a pool after calling end/i,
  // TypeORM's DataSource while it is not connected (shutting down).
  /driver not connected/i,
  /the database system is (starting up|shutting down|in recovery mode)/i,
  /terminating connection due to administrator command/i,
];

export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== 'object' || depth > 4) return false;
  const e = error as {
    name?: unknown;
    code?: unknown;
    message?: unknown;
    driverError?: unknown;
    cause?: unknown;
    errors?: unknown;
  };
  // TypeORM releases a transaction's connection when the server cuts it; the
  // transaction's next statement (or its COMMIT) then throws this. The server
  // rolled the transaction back when the connection went.
  if (e.name === 'QueryRunnerAlreadyReleasedError') return true;
  // The raw pg pool under the DataSource is gone (db/pg-pool.ts): shutting down.
  if (e.name === 'DatabaseNotConnectedError') return true;
  if (typeof e.code === 'string') {
    if (SOCKET_CODES.has(e.code) || SQLSTATES.has(e.code) || /^08/.test(e.code)) return true;
  }
  if (typeof e.message === 'string' && MESSAGES.some((m) => m.test(e.message as string))) {
    return true;
  }
  // TypeORM wraps the driver's error (QueryFailedError.driverError); Node's
  // AggregateError (a refused connection to several addresses) lists its parts.
  if (isDatabaseUnavailable(e.driverError, depth + 1)) return true;
  if (isDatabaseUnavailable(e.cause, depth + 1)) return true;
  if (Array.isArray(e.errors)) return e.errors.some((x) => isDatabaseUnavailable(x, depth + 1));
  return false;
}
