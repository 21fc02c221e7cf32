import { randomUUID } from 'node:crypto';
import pg from 'pg';
import type { Logger } from 'pino';
import type { SessionFacts } from '../repositories/sessions.repository';

export type { SessionFacts };

/** The channel the database triggers notify on (migration 1765100003000). */
export const SESSION_CHANNEL = 'hoopline_sessions';

interface Entry {
  readonly sub: string;
  readonly facts: SessionFacts;
  readonly at: number;
}

/**
 * A per-process cache of the session check (user row and refresh family),
 * kept true by PostgreSQL itself: triggers on `users` and `refresh_tokens`
 * NOTIFY on every change, at commit, and every process LISTENs and drops
 * what changed. So a sign-out, a password change or a deactivation on any
 * process ends the session on all of them as soon as the notification
 * arrives (milliseconds), and a signed-in request needs no database read.
 *
 * It fails closed: until the listening connection is up and has heard its
 * own ping, after it breaks, and whenever a ping goes unanswered, nothing is
 * cached and every request reads the database, as it did before. A read
 * that raced an invalidation is not kept (the generation counter), and no
 * entry outlives `ttlMs` whatever happens.
 */
export class SessionCache {
  private readonly entries = new Map<string, Entry>();
  private generation = 0;
  private client: pg.Client | null = null;
  private healthy = false;
  private stopped = true;
  private pingTimer: NodeJS.Timeout | null = null;
  private retryTimer: NodeJS.Timeout | null = null;
  private awaitedPing: { nonce: string; deadline: number } | null = null;
  /** Counters for tests and the bench. */
  readonly counts = { hits: 0, misses: 0, invalidations: 0 };

  constructor(
    private readonly connection: pg.ClientConfig,
    private readonly logger: Logger,
    private readonly options: { ttlMs?: number; maxEntries?: number; pingMs?: number } = {},
  ) {}

  get listening(): boolean {
    return this.healthy;
  }

  /** The generation a read starts at; pass it to set() when the read returns. */
  get now(): number {
    return this.generation;
  }

  start(): void {
    if (!this.stopped) return;
    this.stopped = false;
    void this.connect();
  }

  async stop(): Promise<void> {
    this.stopped = true;
    this.markUnhealthy();
    if (this.pingTimer) clearInterval(this.pingTimer);
    if (this.retryTimer) clearTimeout(this.retryTimer);
    const client = this.client;
    this.client = null;
    await client?.end().catch(() => undefined);
  }

  get(sessionId: string): SessionFacts | undefined {
    if (!this.healthy) return undefined;
    const entry = this.entries.get(sessionId);
    if (!entry || Date.now() - entry.at > (this.options.ttlMs ?? 30_000)) {
      this.counts.misses += 1;
      return undefined;
    }
    this.counts.hits += 1;
    return entry.facts;
  }

  set(sessionId: string, facts: SessionFacts, startedAt: number): void {
    if (!this.healthy || startedAt !== this.generation) return;
    if (this.entries.size >= (this.options.maxEntries ?? 10_000)) {
      const oldest = this.entries.keys().next().value;
      if (oldest !== undefined) this.entries.delete(oldest);
    }
    this.entries.set(sessionId, { sub: facts.id, facts, at: Date.now() });
  }

  private invalidate(payload: string): void {
    this.generation += 1;
    this.counts.invalidations += 1;
    const [kind, id] = payload.split(':');
    if (kind === 'family' && id) this.entries.delete(id);
    else if (kind === 'user' && id) {
      for (const [sid, entry] of this.entries) if (entry.sub === id) this.entries.delete(sid);
    } else this.entries.clear();
  }

  private markUnhealthy(): void {
    this.healthy = false;
    this.generation += 1;
    this.entries.clear();
    this.awaitedPing = null;
  }

  private async connect(): Promise<void> {
    if (this.stopped) return;
    const client = new pg.Client({ ...this.connection, application_name: 'hoopline-sessions' });
    this.client = client;
    client.on('notification', (message) => {
      const payload = message.payload ?? '';
      if (payload.startsWith('ping:')) {
        if (this.awaitedPing && payload === `ping:${this.awaitedPing.nonce}`) {
          this.awaitedPing = null;
          if (!this.healthy) {
            // Heard end to end: from here on notifications arrive. Whatever
            // changed before is unknown, so start empty.
            this.entries.clear();
            this.generation += 1;
            this.healthy = true;
          }
        }
        return;
      }
      this.invalidate(payload);
    });
    const broken = (error?: Error) => {
      if (this.client !== client) return;
      this.client = null;
      this.markUnhealthy();
      if (this.pingTimer) clearInterval(this.pingTimer);
      this.pingTimer = null;
      client.end().catch(() => undefined);
      if (this.stopped) return;
      this.logger.warn(
        { err: error },
        'session cache: the listening connection broke; reading sessions from the database',
      );
      this.retryTimer = setTimeout(() => void this.connect(), 1000);
      this.retryTimer.unref();
    };
    client.on('error', broken);
    client.on('end', () => broken());
    try {
      await client.connect();
      await client.query(`listen ${SESSION_CHANNEL}`);
    } catch (error) {
      broken(error as Error);
      return;
    }
    const ping = () => {
      if (this.awaitedPing && Date.now() > this.awaitedPing.deadline) {
        // A ping not heard back: notifications may be lost. Stop caching until one is.
        this.markUnhealthy();
      }
      if (!this.awaitedPing) {
        const nonce = randomUUID();
        this.awaitedPing = { nonce, deadline: Date.now() + (this.options.pingMs ?? 2000) };
        client
          .query('select pg_notify($1, $2)', [SESSION_CHANNEL, `ping:${nonce}`])
          .catch((error: Error) => broken(error));
      }
    };
    ping();
    this.pingTimer = setInterval(ping, this.options.pingMs ?? 2000);
    this.pingTimer.unref();
  }
}
