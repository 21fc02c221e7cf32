import type { RequestHandler } from 'express';
import { rateLimit, type ClientRateLimitInfo, type Options, type Store } from 'express-rate-limit';
import type pg from 'pg';
import type { DataSource } from 'typeorm';
import type { AuthConfig } from '../config/config';
import { pgPool } from '../db/pg-pool';
import { afterAnswer } from '../http/background-work';
import { AppError } from '../http/errors';

const tooMany = (retryAfterSeconds: number) =>
  new AppError(
    429,
    'too_many_attempts',
    'too many failed sign-in attempts: wait a while and try again',
    undefined,
    { retryAfterSeconds },
  );

function accountKey(body: unknown): string {
  const email = (body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase().slice(0, 320) : '(none)';
}

/**
 * An express-rate-limit store in PostgreSQL (table `rate_limit_hits`, one row
 * per key and fixed window), so that every API process, on one machine or
 * several, counts the same attempts. Each call is one statement: the upsert
 * starts a new window when the old one has ended.
 */
export class PostgresRateLimitStore implements Store {
  readonly localKeys = false;
  private windowMs = 60_000;
  private lastSweep = 0;

  constructor(
    private readonly poolOf: () => pg.Pool,
    readonly prefix: string,
  ) {}

  private get pool(): pg.Pool {
    return this.poolOf();
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const { rows } = await this.pool.query<{ hits: number; reset_at: Date }>(
      'select hits, reset_at from rate_limit_hits where key = $1 and reset_at > now()',
      [this.prefix + key],
    );
    return rows[0] ? { totalHits: rows[0].hits, resetTime: rows[0].reset_at } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    this.sweep();
    const { rows } = await this.pool.query<{ hits: number; reset_at: Date }>(
      `insert into rate_limit_hits as h (key, hits, reset_at)
       values ($1, 1, now() + $2 * interval '1 millisecond')
       on conflict (key) do update set
         hits = case when h.reset_at <= now() then 1 else h.hits + 1 end,
         reset_at = case when h.reset_at <= now() then excluded.reset_at else h.reset_at end
       returning hits, reset_at`,
      [this.prefix + key, this.windowMs],
    );
    const row = rows[0]!;
    return { totalHits: row.hits, resetTime: row.reset_at };
  }

  async decrement(key: string): Promise<void> {
    // Called once the answer is on its way (a successful attempt does not count).
    await afterAnswer(
      this.pool.query(
        `update rate_limit_hits set hits = greatest(hits - 1, 0)
          where key = $1 and reset_at > now()`,
        [this.prefix + key],
      ),
    );
  }

  async resetKey(key: string): Promise<void> {
    await this.pool.query('delete from rate_limit_hits where key = $1', [this.prefix + key]);
  }

  /** Ended windows are of no use: removed at most once per window, in the background. */
  private sweep(): void {
    const now = Date.now();
    if (now - this.lastSweep < this.windowMs) return;
    this.lastSweep = now;
    this.pool
      .query(`delete from rate_limit_hits where key like $1 and reset_at < now()`, [
        `${this.prefix.replace(/[\\%_]/g, (c) => `\\${c}`)}%`,
      ])
      .catch(() => {
        // The next window's sweep tries again; a leftover row is harmless.
      });
  }
}

/**
 * Sign-in limits: failed attempts per account and per client address in one
 * window (successful sign-ins do not count). The counters are rows in
 * PostgreSQL, shared by every API process (HOOPLINE_WORKERS, or several
 * machines behind one database).
 */
export function signInLimiters(
  auth: AuthConfig,
  dataSource: DataSource,
): {
  address: RequestHandler;
  account: RequestHandler;
} {
  const windowMs = auth.signInWindow * 1000;
  const pool = () => pgPool(dataSource);
  const common = {
    windowMs,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    handler: (_req: unknown, _res: unknown, next: (error: unknown) => void) =>
      next(tooMany(auth.signInWindow)),
  };
  return {
    address: rateLimit({
      ...common,
      limit: auth.signInLimitPerAddress,
      identifier: 'address',
      store: new PostgresRateLimitStore(pool, 'sign-in-address:'),
    }),
    account: rateLimit({
      ...common,
      limit: auth.signInLimitPerAccount,
      identifier: 'account',
      keyGenerator: (req) => `account:${accountKey(req.body)}`,
      store: new PostgresRateLimitStore(pool, 'sign-in-account:'),
    }),
  };
}
