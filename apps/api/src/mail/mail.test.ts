import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { pino } from 'pino';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { readMailbox, type ReceivedMail } from '../../test/mailbox';
import { anonymous, makeComponent, makeWorld, signIn, type World } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';
import { startFakeSmtpServer, type FakeSmtpServer } from './fake-smtp-server';
import { MailWorker } from './mail-worker';
import { backgroundSettled } from '../http/background-work';

const silent = pino({ level: 'silent' });
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('mail through the transactional outbox to a local fake SMTP server', () => {
  let folder = '';
  let smtp: FakeSmtpServer | null = null;
  let port = 0;
  let t: TestApp;
  let w: World;
  let worker: MailWorker;

  const startSmtp = async () => {
    smtp = await startFakeSmtpServer({ port, folder });
    port = smtp.port;
  };
  const stopSmtp = async () => {
    await smtp?.close();
    smtp = null;
  };
  const newWorker = () =>
    new MailWorker(t.dataSource, { ...t.config.mail, smtp: t.config.mail.smtp! }, silent);
  const mailbox = () => readMailbox(folder);
  const since = async (before: number): Promise<ReceivedMail[]> => (await mailbox()).slice(before);
  const linkIn = (text: string, route: string) => {
    const match = new RegExp(`${route}/([A-Za-z0-9_-]+)`).exec(text);
    if (!match?.[1]) throw new Error(`no ${route} link in:\n${text}`);
    return match[1];
  };

  beforeAll(async () => {
    folder = await mkdtemp(path.join(os.tmpdir(), 'hoopline-mail-'));
    await startSmtp();
    t = await startTestApp({
      HOOPLINE_SMTP_HOST: '127.0.0.1',
      HOOPLINE_SMTP_PORT: String(port),
      HOOPLINE_MAIL_RETRY_BASE_MS: '20',
      HOOPLINE_PUBLIC_URL: 'http://hoopline.test:8080',
    });
    w = await makeWorld(t);
    worker = newWorker();
  });
  beforeEach(async () => {
    // Each test starts with nothing pending from the one before.
    await worker.drain();
  });
  afterAll(async () => {
    await worker.stop();
    await t.close();
    await stopSmtp();
    await rm(folder, { recursive: true, force: true });
  });

  it('sends an invitation to the invitee, whose link works; the admin no longer sees the token', async () => {
    const admin = await signIn(t, w.admin);
    const before = (await mailbox()).length;
    const res = await admin.post('/api/invitations', {
      email: 'new.person@lab.example',
      name: 'New Person',
    });
    expect(res.status).toBe(201);
    expect(res.body.delivery).toBe('mail');
    expect(res.body.token).toBeUndefined();
    expect(await worker.drain()).toEqual({ sent: 1, retrying: 0, failed: 0 });
    const [mail] = await since(before);
    expect(mail?.to).toEqual(['new.person@lab.example']);
    expect(mail?.subject).toBe('You are invited to Hoopline');
    const token = linkIn(mail!.text, 'http://hoopline.test:8080/invitation');
    const lookup = await anonymous(t).get(`/api/auth/invitations/${token}`).expect(200);
    expect(lookup.body).toMatchObject({ email: 'new.person@lab.example', name: 'New Person' });
  });

  it('sends a password reset to the account holder only', async () => {
    const before = (await mailbox()).length;
    await anonymous(t)
      .post('/api/auth/password-reset/request', { email: w.outsider.email })
      .expect(202);
    await anonymous(t)
      .post('/api/auth/password-reset/request', { email: 'nobody@lab.example' })
      .expect(202);
    await backgroundSettled(); // the reset is written after the 202
    await worker.drain();
    const mails = await since(before);
    expect(mails.map((m) => m.to)).toEqual([[w.outsider.email]]);
    const token = linkIn(mails[0]!.text, 'http://hoopline.test:8080/reset-password');
    await anonymous(t)
      .post('/api/auth/password-reset/complete', { token, password: 'a new long enough password' })
      .expect(204);
  });

  it('tells the checkers (not the author) when a revision is submitted', async () => {
    const designer = await signIn(t, w.designer);
    const c = await makeComponent(t, w);
    const before = (await mailbox()).length;
    await designer.post(`/api/revisions/${c.revisionId}/submit`).expect(200);
    await worker.drain();
    const mails = await since(before);
    expect(mails).toHaveLength(1);
    expect([...mails[0]!.to].sort()).toEqual([w.checker.email, w.checker2.email].sort());
    expect(mails[0]!.subject).toMatch(/^Check requested: P-.* rev 1$/);
    expect(mails[0]!.text).toContain(`http://hoopline.test:8080/revisions/${c.revisionId}`);
    expect(mails[0]!.text).toMatch(/not a code calculation/);
  });

  it('tells the author and the fabricators when a revision is countersigned', async () => {
    const c = await makeComponent(t, w, 'submitted');
    await worker.drain();
    const checker = await signIn(t, w.checker);
    const before = (await mailbox()).length;
    await checker.post(`/api/revisions/${c.revisionId}/countersign`, { hash: c.hash }).expect(200);
    await worker.drain();
    const mails = await since(before);
    expect(mails).toHaveLength(1);
    expect([...mails[0]!.to].sort()).toEqual([w.designer.email, w.fabricator.email].sort());
    expect(mails[0]!.subject).toMatch(/^Countersigned: /);
  });

  it('tells the author, with the comment, when a revision is returned', async () => {
    const c = await makeComponent(t, w, 'submitted');
    await worker.drain();
    const checker = await signIn(t, w.checker2);
    const before = (await mailbox()).length;
    await checker
      .post(`/api/revisions/${c.revisionId}/return`, {
        hash: c.hash,
        comment: 'Check the edge condition.',
        remarks: [
          { step: 3, text: 'Use the clamped-edge coefficient.' },
          { step: 1, text: 'Span from the drawing.' },
        ],
      })
      .expect(200);
    await worker.drain();
    const mails = await since(before);
    expect(mails.map((m) => m.to)).toEqual([[w.designer.email]]);
    const text = mails[0]!.text;
    expect(text).toContain('Comment: Check the edge condition.');
    // The remarks by step, in trail order, each with a link to its step.
    expect(text).toContain('Remarks on 2 steps:');
    const first = text.indexOf('Step 1: Span from the drawing.');
    const third = text.indexOf('Step 3: Use the clamped-edge coefficient.');
    expect(first).toBeGreaterThan(-1);
    expect(third).toBeGreaterThan(first);
    expect(text).toContain(`/revisions/${c.revisionId}#trail-step-3`);
  });

  it('with the SMTP server down the action succeeds, and the mail arrives once it is back, once', async () => {
    const designer = await signIn(t, w.designer);
    const c = await makeComponent(t, w);
    const before = (await mailbox()).length;
    await stopSmtp();
    await designer.post(`/api/revisions/${c.revisionId}/submit`).expect(200);
    expect(await worker.drain()).toEqual({ sent: 0, retrying: 1, failed: 0 });
    const [pending] = await t.dataSource.query(
      `select attempts, last_error, sent_at from mail_outbox where kind = 'revision-submitted' order by created_at desc limit 1`,
    );
    expect(pending).toMatchObject({ attempts: 1, sent_at: null });
    expect(pending.last_error).toMatch(/ECONNREFUSED|connect/i);
    expect(await since(before)).toHaveLength(0);

    await startSmtp();
    await sleep(60); // past the 20 ms first retry delay of this test's configuration
    expect(await worker.drain()).toEqual({ sent: 1, retrying: 0, failed: 0 });
    // A restarted worker (a new process, here a new instance) finds nothing left to send.
    const restarted = newWorker();
    expect(await restarted.drain()).toEqual({ sent: 0, retrying: 0, failed: 0 });
    await restarted.stop();
    const arrived = await since(before);
    expect(arrived).toHaveLength(1);
    expect(arrived[0]!.subject).toMatch(/^Check requested: /);
  });

  it('two workers draining at once send every mail exactly once', async () => {
    const before = (await mailbox()).length;
    for (let i = 0; i < 6; i += 1) {
      await anonymous(t)
        .post('/api/auth/password-reset/request', { email: w.fabricator.email })
        .expect(202);
    }
    await backgroundSettled();
    const other = newWorker();
    const [a, b] = await Promise.all([worker.drain(), other.drain()]);
    await other.stop();
    expect(a.sent + b.sent).toBe(6);
    const arrived = await since(before);
    expect(arrived).toHaveLength(6);
    expect(new Set(arrived.map((m) => m.outboxId)).size).toBe(6);
  });

  it('a failed action writes no mail (the outbox shares its transaction)', async () => {
    const designer = await signIn(t, w.designer);
    const [{ n: before }] = await t.dataSource.query('select count(*)::int as n from mail_outbox');
    const c = await makeComponent(t, w, 'countersigned');
    const [{ n: middle }] = await t.dataSource.query('select count(*)::int as n from mail_outbox');
    // Submitting a countersigned revision is refused (409): no mail may come of it.
    await designer.post(`/api/revisions/${c.revisionId}/submit`).expect(409);
    const [{ n: after }] = await t.dataSource.query('select count(*)::int as n from mail_outbox');
    expect(middle).toBeGreaterThan(before);
    expect(after).toBe(middle);
  });
});
