import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeSmtpServer, type FakeSmtpServer } from '../mail/fake-smtp-server';
import { MailWorker } from '../mail/mail-worker';
import { backgroundSettled } from '../http/background-work';
import { anonymous, makeComponent, makeWorld, signIn, type World } from '../../test/fixtures';
import { readMailbox } from '../../test/mailbox';
import { startTestApp, type TestApp } from '../../test/test-app';
import { freePort } from '../../test/throwaway-cluster';

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
/** How long the SMTP server stays down (long enough for the backoff to grow past it). */
const DOWN_MS = 8000;

/**
 * The fake SMTP server stopped while submit, countersign, return, invitation
 * and reset mails are queued, then started again on the same port, with the
 * mail worker polling as in production (short poll and backoff here).
 */
describe('mail fault: the SMTP server down while mails are queued, then back', () => {
  let folder = '';
  let port = 0;
  let smtp: FakeSmtpServer | null = null;
  let t: TestApp;
  let w: World;
  let worker: MailWorker;

  beforeAll(async () => {
    folder = await mkdtemp(path.join(os.tmpdir(), 'hoopline-mail-fault-'));
    port = await freePort();
    smtp = await startFakeSmtpServer({ port, folder });
    t = await startTestApp({
      HOOPLINE_SMTP_HOST: '127.0.0.1',
      HOOPLINE_SMTP_PORT: String(port),
      HOOPLINE_MAIL_POLL_MS: '100',
      HOOPLINE_MAIL_RETRY_BASE_MS: '2000',
    });
    w = await makeWorld(t);
    worker = new MailWorker(
      t.dataSource,
      { ...t.config.mail, smtp: t.config.mail.smtp! },
      pino({ level: 'silent' }),
    );
  });
  afterAll(async () => {
    await worker?.stop();
    await t?.close();
    await smtp?.close();
    await rm(folder, { recursive: true, force: true });
  });

  it('delivers every queued mail soon after the server is back, none twice (by Message-ID)', async () => {
    // Arranged before the outage (their own mails are sent and counted too).
    const toSubmit = await makeComponent(t, w);
    const toCountersign = await makeComponent(t, w, 'submitted');
    const toReturn = await makeComponent(t, w, 'submitted');
    worker.start();

    await smtp!.close();
    smtp = null;
    const downAt = Date.now();
    const designer = await signIn(t, w.designer);
    const checker = await signIn(t, w.checker);
    const admin = await signIn(t, w.admin);
    await designer.post(`/api/revisions/${toSubmit.revisionId}/submit`).expect(200);
    await checker
      .post(`/api/revisions/${toCountersign.revisionId}/countersign`, { hash: toCountersign.hash })
      .expect(200);
    await checker
      .post(`/api/revisions/${toReturn.revisionId}/return`, {
        hash: toReturn.hash,
        comment: 'Check the edge condition.',
      })
      .expect(200);
    for (let i = 0; i < 4; i += 1) {
      await admin
        .post('/api/invitations', { email: `invitee-${i}@lab.example`, name: `Invitee ${i}` })
        .expect(201);
    }
    await anonymous(t)
      .post('/api/auth/password-reset/request', { email: w.fabricator.email })
      .expect(202);
    await backgroundSettled();

    await sleep(DOWN_MS - (Date.now() - downAt));
    const [waiting] = await t.dataSource.query(
      `select count(*)::int as n, max(attempts)::int as attempts from mail_outbox where sent_at is null`,
    );
    expect(waiting.n).toBeGreaterThanOrEqual(8);
    expect(await readMailbox(folder)).toHaveLength(0);

    smtp = await startFakeSmtpServer({ port, folder });
    const backAt = Date.now();
    for (let waited = 0; waited < 30_000; waited += 50) {
      const [row] = await t.dataSource.query(
        `select count(*)::int as n from mail_outbox where sent_at is null and failed_at is null`,
      );
      if (row.n === 0) break;
      await sleep(50);
    }
    const allInMs = Date.now() - backAt;
    await sleep(500); // anything sent twice would land now
    const mails = await readMailbox(folder);
    const outbox: { id: string }[] = await t.dataSource.query(
      `select id from mail_outbox where created_at >= $1`,
      [new Date(downAt)],
    );
    const delivered = mails.length;
    const byId = new Map<string, number>();
    for (const m of mails) byId.set(m.outboxId, (byId.get(m.outboxId) ?? 0) + 1);
    console.info(
      `[mail fault] SMTP down ${DOWN_MS} ms with ${waiting.n} mails queued (up to ${waiting.attempts} attempts each); ` +
        `${delivered} delivered, all within ${allInMs} ms of the server coming back; ` +
        `${[...byId.values()].filter((n) => n > 1).length} doubled`,
    );
    expect([...byId.values()].every((n) => n === 1)).toBe(true);
    for (const { id } of outbox) expect(byId.get(id), id).toBe(1);
    expect(mails.map((m) => m.messageId)).toEqual(
      mails.map((m) => `<${m.outboxId}@hoopline.outbox>`),
    );
    // Without the probe each mail waits out its backoff (2 s, 4 s, 8 s…: seconds after the
    // server is back: the third attempt, at 6 s, fails and the next is due at 14 s); with it,
    // everything goes at the next 100 ms poll.
    expect(allInMs).toBeLessThan(4000);
    expect(new Set(mails.flatMap((m) => m.to))).toEqual(
      new Set([
        w.checker.email,
        w.checker2.email,
        w.designer.email,
        w.fabricator.email,
        'invitee-0@lab.example',
        'invitee-1@lab.example',
        'invitee-2@lab.example',
        'invitee-3@lab.example',
      ]),
    );
  }, 60_000);
});
