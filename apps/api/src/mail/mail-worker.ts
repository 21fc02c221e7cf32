import nodemailer, { type Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { MailConfig } from '../config/config';
import { rows, run } from '../db/sql';

interface OutboxRow {
  id: string;
  recipients: string[];
  subject: string;
  text_body: string;
  html_body: string;
  attempts: number;
}

export interface DrainResult {
  readonly sent: number;
  readonly retrying: number;
  readonly failed: number;
}

/** Attempts after which a mail the server refuses outright (5xx) is given up. */
const PERMANENT_FAILURE_ATTEMPTS = 5;
const MAX_BACKOFF_MS = 15 * 60 * 1000;
/** How long a claimed batch stays ours; a worker that dies releases its claim when this ends. */
const CLAIM_SECONDS = 120;
/** nodemailer's codes for "the server could not be reached or went away" (no SMTP reply at all). */
const UNREACHABLE = new Set([
  'ECONNECTION',
  'ETIMEDOUT',
  'ESOCKET',
  'EDNS',
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
]);

function unreachable(error: unknown): boolean {
  const e = error as { code?: string; responseCode?: number };
  return e.responseCode === undefined && e.code !== undefined && UNREACHABLE.has(e.code);
}

/**
 * Sends what the outbox holds. Rows are claimed with FOR UPDATE SKIP LOCKED
 * and a lease, so several workers (or a restart) never send one row twice; a
 * row is marked sent as soon as the SMTP server accepts it. A failure
 * reschedules it with exponential backoff: a server that is down delays mail
 * and loses none.
 */
export class MailWorker {
  private readonly transport: Transporter;
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<unknown> = Promise.resolve();
  private stopped = false;
  /**
   * Set when a send found the server unreachable. Until a probe (connect and
   * EHLO, no mail) gets through, drains send nothing, so mail waiting out an
   * outage does not pile up attempts; once it gets through, every waiting mail
   * is due at once rather than at the end of its backoff (which had grown to
   * minutes in a long outage).
   */
  private unreachableSince: Date | null = null;

  constructor(
    private readonly dataSource: DataSource,
    private readonly config: MailConfig & { smtp: NonNullable<MailConfig['smtp']> },
    private readonly logger: Logger,
  ) {
    this.transport = nodemailer.createTransport({
      host: config.smtp.host,
      port: config.smtp.port,
      secure: config.smtp.secure,
      ...(config.smtp.auth ? { auth: config.smtp.auth } : {}),
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 20_000,
    });
  }

  /** Polls every pollIntervalMs until stop(). */
  start(): void {
    this.stopped = false;
    const tick = () => {
      this.running = this.drain()
        .catch((error: unknown) => this.logger.error({ err: error }, 'mail worker: drain failed'))
        .finally(() => {
          if (!this.stopped) {
            this.timer = setTimeout(tick, this.config.pollIntervalMs);
            this.timer.unref();
          }
        });
    };
    tick();
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearTimeout(this.timer);
    await this.running;
    this.transport.close();
  }

  /** Sends every due mail once; for the poll loop and for tests. */
  async drain(): Promise<DrainResult> {
    if (this.unreachableSince) {
      const back = await this.transport.verify().then(
        () => true,
        () => false,
      );
      if (!back) return { sent: 0, retrying: 0, failed: 0 };
      const { affected } = await run(
        this.dataSource.manager,
        `update mail_outbox set next_attempt_at = now()
          where sent_at is null and failed_at is null and next_attempt_at > now()`,
      );
      this.logger.info(
        { down: this.unreachableSince.toISOString(), waiting: affected },
        'mail worker: the SMTP server answers again; sending what waited',
      );
      this.unreachableSince = null;
    }
    let sent = 0;
    let retrying = 0;
    let failed = 0;
    for (;;) {
      const batch = await this.claim();
      if (batch.length === 0) break;
      for (const row of batch) {
        const outcome = await this.send(row);
        if (outcome === 'sent') sent += 1;
        else if (outcome === 'failed') failed += 1;
        else retrying += 1;
      }
      if (retrying > 0 || this.stopped) break; // the server is struggling: wait for the next poll
    }
    return { sent, retrying, failed };
  }

  private claim(): Promise<OutboxRow[]> {
    return rows<OutboxRow>(
      this.dataSource.manager,
      `update mail_outbox set locked_until = now() + make_interval(secs => $1)
        where id in (
          select id from mail_outbox
           where sent_at is null and failed_at is null and next_attempt_at <= now()
             and (locked_until is null or locked_until < now())
           order by created_at, id
           limit 10
           for update skip locked)
        returning id, recipients, subject, text_body, html_body, attempts`,
      [CLAIM_SECONDS],
    );
  }

  private async send(row: OutboxRow): Promise<'sent' | 'retrying' | 'failed'> {
    try {
      await this.transport.sendMail({
        from: this.config.from,
        to: row.recipients,
        subject: row.subject,
        text: row.text_body,
        html: row.html_body,
        // One Message-ID per outbox row: a copy that slips through twice is recognisable.
        messageId: `<${row.id}@hoopline.outbox>`,
        headers: { 'X-Hoopline-Outbox-Id': row.id },
      });
    } catch (error) {
      const attempts = row.attempts + 1;
      const code = (error as { responseCode?: number }).responseCode;
      const permanent = code !== undefined && code >= 500 && attempts >= PERMANENT_FAILURE_ATTEMPTS;
      const delay = Math.min(this.config.retryBaseMs * 2 ** (attempts - 1), MAX_BACKOFF_MS);
      const message = error instanceof Error ? error.message : String(error);
      if (unreachable(error)) this.unreachableSince ??= new Date();
      await run(
        this.dataSource.manager,
        `update mail_outbox set attempts = $2, last_error = $3, locked_until = null,
                next_attempt_at = now() + make_interval(secs => $4),
                failed_at = case when $5 then now() else null end
          where id = $1`,
        [row.id, attempts, message.slice(0, 500), delay / 1000, permanent],
      );
      this.logger.warn(
        { outboxId: row.id, attempts, error: message },
        permanent ? 'mail worker: gave up on a mail' : 'mail worker: send failed, will retry',
      );
      return permanent ? 'failed' : 'retrying';
    }
    await run(
      this.dataSource.manager,
      `update mail_outbox set sent_at = now(), attempts = attempts + 1, locked_until = null, last_error = null
        where id = $1`,
      [row.id],
    );
    return 'sent';
  }
}
