import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync, readdirSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { createServer } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeComponent, makeUser, makeWorld, type TestUser, type World } from '../test/fixtures';
import { readMailbox } from '../test/mailbox';
import { startTestApp, type TestApp } from '../test/test-app';
import { startFakeSmtpServer, type FakeSmtpServer } from './mail/fake-smtp-server';

// Integration test with real processes: two API processes (node --import tsx
// src/main.ts, as the start command runs them) on one PostgreSQL database,
// and one browser-like client that talks to either. What a single process
// kept in memory must hold across them: sign-in limits, refresh rotation and
// reuse detection, the mail outbox (every mail once), the countersign race.
// The in-process test app only arranges data (users, a project).

const apiRoot = path.resolve(import.meta.dirname, '..');

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const a = s.address();
      s.close(() => resolve(typeof a === 'object' && a ? a.port : 0));
    });
  });
}

interface ApiProcess {
  readonly base: string;
  readonly child: ChildProcess;
  readonly stderr: () => string;
}

async function startApi(environment: Record<string, string>): Promise<ApiProcess> {
  const port = await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', 'src/main.ts'], {
    cwd: apiRoot,
    env: {
      PATH: process.env['PATH'] ?? '',
      NODE_ENV: 'test',
      HOOPLINE_LOG_LEVEL: 'warn',
      ...environment,
      HOOPLINE_PORT: String(port),
    },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  let stderr = '';
  child.stderr?.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  const base = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 45_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the API exited (${child.exitCode}): ${stderr}`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`the API did not start: ${stderr}`);
    await new Promise((r) => setTimeout(r, 100));
  }
  return { base, child, stderr: () => stderr };
}

async function stopApi(api: ApiProcess | undefined): Promise<void> {
  if (!api || api.child.exitCode !== null) return;
  await new Promise<void>((resolve) => {
    api.child.once('exit', () => resolve());
    api.child.kill('SIGTERM');
  });
}

/**
 * True once `call` answers 401, trying for at most a second. Each process
 * keeps session checks in memory and drops them when PostgreSQL notifies it
 * of the change (src/auth/session-cache.ts); the notification reaches the
 * other process within milliseconds of the commit, not at the same instant.
 */
async function refusedSoon(call: () => Promise<{ status: number }>): Promise<boolean> {
  const deadline = Date.now() + 1000;
  for (;;) {
    if ((await call()).status === 401) return true;
    if (Date.now() > deadline) return false;
    await new Promise((r) => setTimeout(r, 5));
  }
}

/** A browser's cookie jar and CSRF header, usable against any of the processes. */
class Browser {
  private readonly jar = new Map<string, string>();
  cookie(name: string): string | undefined {
    return this.jar.get(name);
  }
  setCookie(name: string, value: string): void {
    this.jar.set(name, value);
  }
  async call(
    api: ApiProcess,
    method: string,
    route: string,
    body?: unknown,
  ): Promise<{ status: number; body: { error?: { code: string } } & Record<string, unknown> }> {
    const headers: Record<string, string> = {
      cookie: [...this.jar].map(([k, v]) => `${k}=${v}`).join('; '),
    };
    if (method !== 'GET') {
      headers['content-type'] = 'application/json';
      const csrf = this.jar.get('hl_csrf');
      if (csrf) headers['x-csrf-token'] = decodeURIComponent(csrf);
    }
    const res = await fetch(`${api.base}/api${route}`, {
      method,
      headers,
      ...(method === 'GET' ? {} : { body: JSON.stringify(body ?? {}) }),
    });
    for (const line of res.headers.getSetCookie()) {
      const pair = line.split(';')[0]!;
      const at = pair.indexOf('=');
      const [name, value] = [pair.slice(0, at), pair.slice(at + 1)];
      if (/Expires=Thu, 01 Jan 1970/.test(line)) this.jar.delete(name);
      else this.jar.set(name, value);
    }
    const text = await res.text();
    return { status: res.status, body: text ? JSON.parse(text) : {} };
  }
  signIn(api: ApiProcess, user: TestUser) {
    return this.call(api, 'POST', '/auth/sign-in', { email: user.email, password: user.password });
  }
}

describe('two API processes on one database', () => {
  let t: TestApp;
  let w: World;
  let smtp: FakeSmtpServer;
  let mailFolder = '';
  let a: ApiProcess | undefined;
  let b: ApiProcess | undefined;

  beforeAll(async () => {
    mailFolder = await mkdtemp(path.join(os.tmpdir(), 'hoopline-mail-two-'));
    smtp = await startFakeSmtpServer({ port: 0, folder: mailFolder });
    t = await startTestApp();
    w = await makeWorld(t);
    const environment = {
      DATABASE_URL: t.config.databaseUrl,
      HOOPLINE_UPLOAD_DIR: t.uploadDir,
      HOOPLINE_SMTP_HOST: '127.0.0.1',
      HOOPLINE_SMTP_PORT: String(smtp.port),
      HOOPLINE_MAIL_POLL_MS: '50',
      HOOPLINE_SIGN_IN_LIMIT_PER_ACCOUNT: '3',
      HOOPLINE_SIGN_IN_LIMIT_PER_ADDRESS: '1000',
      HOOPLINE_PUBLIC_URL: 'http://hoopline.test:8080',
    };
    [a, b] = await Promise.all([startApi(environment), startApi(environment)]);
  }, 120_000);
  afterAll(async () => {
    await Promise.all([stopApi(a), stopApi(b)]);
    await t?.close();
    await smtp?.close();
    if (mailFolder) await rm(mailFolder, { recursive: true, force: true });
  });

  it('counts failed sign-ins of one account across both processes', async () => {
    const user = await makeUser(t);
    const browser = new Browser();
    const wrong = { email: user.email, password: 'not the password' };
    // Two failures on A and one on B: the account's limit of 3 is reached.
    for (const api of [a!, a!, b!]) {
      expect((await browser.call(api, 'POST', '/auth/sign-in', wrong)).status).toBe(401);
    }
    // Each process alone has seen fewer than 3, so counters kept per process would let this in.
    for (const api of [a!, b!]) {
      const locked = await browser.signIn(api, user);
      expect(locked.status).toBe(429);
      expect(locked.body.error?.code).toBe('too_many_attempts');
    }
  });

  it('rotates a refresh token on one process and detects its reuse on the other', async () => {
    const user = await makeUser(t);
    const browser = new Browser();
    expect((await browser.signIn(a!, user)).status).toBe(200);
    const spent = browser.cookie('hl_refresh')!;
    // Refreshed by B, then read by A with B's new access token.
    expect((await browser.call(b!, 'POST', '/auth/refresh')).status).toBe(200);
    expect(browser.cookie('hl_refresh')).not.toBe(spent);
    expect((await browser.call(a!, 'GET', '/me')).status).toBe(200);
    // The spent token again, after the grace, on A: the whole family ends, on both processes.
    await t.dataSource.query(
      `update refresh_tokens set revoked_at = now() - interval '1 minute' where revoked_reason = 'rotated'
          and user_id = $1`,
      [user.id],
    );
    const thief = new Browser();
    thief.setCookie('hl_refresh', spent);
    thief.setCookie('hl_csrf', 'c');
    const reuse = await thief.call(a!, 'POST', '/auth/refresh');
    expect(reuse.status).toBe(401);
    expect(reuse.body.error?.code).toBe('refresh_reused');
    for (const api of [a!, b!])
      expect(await refusedSoon(() => browser.call(api, 'GET', '/me'))).toBe(true);
    expect((await browser.call(b!, 'POST', '/auth/refresh')).status).toBe(401);
  });

  it('signs out on one process; the access token stops on the other at once', async () => {
    const user = await makeUser(t);
    const browser = new Browser();
    await browser.signIn(a!, user);
    const access = browser.cookie('hl_access')!;
    expect((await browser.call(b!, 'GET', '/me')).status).toBe(200);
    expect((await browser.call(a!, 'POST', '/auth/sign-out')).status).toBe(204);
    const stale = new Browser();
    stale.setCookie('hl_access', access);
    expect(await refusedSoon(() => stale.call(b!, 'GET', '/me'))).toBe(true);
  });

  it('sends every outbox mail exactly once while both processes run their mail workers', async () => {
    const admin = new Browser();
    expect((await admin.signIn(a!, w.admin)).status).toBe(200);
    const invitations = 24;
    const before = (await readMailbox(mailFolder)).length;
    await Promise.all(
      Array.from({ length: invitations }, (_, i) =>
        admin.call(i % 2 ? a! : b!, 'POST', '/invitations', {
          email: `invitee-${i}@two.example`,
          name: `Invitee ${i}`,
          isAdmin: false,
        }),
      ),
    ).then((results) => expect(results.map((r) => r.status)).toEqual(results.map(() => 201)));
    const deadline = Date.now() + 20_000;
    let mails = await readMailbox(mailFolder);
    while (mails.length - before < invitations && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 100));
      mails = await readMailbox(mailFolder);
    }
    // A moment more: a doubled send would land now.
    await new Promise((r) => setTimeout(r, 500));
    mails = (await readMailbox(mailFolder)).slice(before);
    const ids = mails.map((m) => m.messageId);
    expect(mails).toHaveLength(invitations);
    expect(new Set(ids).size).toBe(invitations);
    const [pending] = await t.dataSource.query<{ n: number }[]>(
      `select count(*)::int as n from mail_outbox where sent_at is null`,
    );
    expect(pending!.n).toBe(0);
  });

  it('the countersign race across processes: exactly one of 20 attempts wins', async () => {
    const c = await makeComponent(t, w, 'submitted');
    const checker = new Browser();
    expect((await checker.signIn(a!, w.checker)).status).toBe(200);
    const attempts = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        checker.call(i % 2 ? a! : b!, 'POST', `/revisions/${c.revisionId}/countersign`, {
          hash: c.hash,
          comment: `attempt ${i}`,
        }),
      ),
    );
    const statuses = attempts.map((r) => r.status);
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    const [signOffs] = await t.dataSource.query<{ n: number }[]>(
      'select count(*)::int as n from sign_offs where revision_id = $1',
      [c.revisionId],
    );
    expect(signOffs!.n).toBe(1);
  });
});

describe('HOOPLINE_WORKERS=2', () => {
  let t: TestApp;
  let api: ApiProcess | undefined;
  beforeAll(async () => {
    t = await startTestApp();
    api = await startApi({
      DATABASE_URL: t.config.databaseUrl,
      HOOPLINE_UPLOAD_DIR: t.uploadDir,
      HOOPLINE_WORKERS: '2',
    });
  }, 120_000);
  afterAll(async () => {
    await stopApi(api);
    await t?.close();
  });

  /** The pids whose parent is `pid` (Linux /proc). */
  function childrenOf(pid: number): number[] {
    return readdirSync('/proc')
      .filter((entry) => /^\d+$/.test(entry))
      .filter((entry) => {
        try {
          const stat = readFileSync(`/proc/${entry}/stat`, 'utf8');
          return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]) === pid;
        } catch {
          return false;
        }
      })
      .map(Number);
  }

  it('runs two worker processes behind one port, and a lost one is replaced', async () => {
    const primary = api!.child.pid!;
    const deadline = Date.now() + 20_000;
    while (childrenOf(primary).length < 2 && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 100));
    }
    const workers = childrenOf(primary);
    expect(workers).toHaveLength(2);
    const answers = await Promise.all(
      Array.from({ length: 20 }, () => fetch(`${api!.base}/api/health`).then((r) => r.status)),
    );
    expect(answers.every((s) => s === 200)).toBe(true);
    process.kill(workers[0]!, 'SIGKILL');
    const after = Date.now() + 20_000;
    let now = childrenOf(primary);
    while ((now.length < 2 || now.includes(workers[0]!)) && Date.now() < after) {
      await new Promise((r) => setTimeout(r, 100));
      now = childrenOf(primary);
    }
    expect(now).toHaveLength(2);
    expect(now).not.toContain(workers[0]);
    expect((await fetch(`${api!.base}/api/health`)).status).toBe(200);
  });
});
