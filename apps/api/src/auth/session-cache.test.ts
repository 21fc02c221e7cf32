import type { Server } from 'node:http';
import { pino } from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, type TestUser } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';
import { createApp } from '../app';
import { pgPool } from '../db/pg-pool';
import { SessionCache } from './session-cache';

// Integration tests (real PostgreSQL, its LISTEN/NOTIFY): the session check
// served from memory, and every change that ends a session reaching the
// cache through the database's own triggers. Counted, never timed.

const until = async (what: () => boolean, ms = 5000) => {
  const deadline = Date.now() + ms;
  while (!what()) {
    if (Date.now() > deadline) throw new Error('timed out waiting');
    await new Promise((r) => setTimeout(r, 10));
  }
};

describe('session cache', () => {
  let t: TestApp;
  let cache: SessionCache;
  let server: Server;

  beforeAll(async () => {
    t = await startTestApp();
    cache = new SessionCache(pgPool(t.dataSource).options, pino({ level: 'silent' }), {
      pingMs: 200,
    });
    cache.start();
    const app = createApp({
      config: t.config,
      dataSource: t.dataSource,
      logger: pino({ level: 'silent' }),
      storage: t.storage,
      sheetRenderer: t.sheetRenderer,
      sessionCache: cache,
    });
    server = await new Promise<Server>((resolve) => {
      const s = app.listen(0, '127.0.0.1', () => resolve(s));
    });
    await until(() => cache.listening);
  });
  afterAll(async () => {
    await cache.stop();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await t.close();
  });

  async function session(user: TestUser) {
    const agent = request.agent(server);
    const res = await agent
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: user.password });
    expect(res.status).toBe(200);
    return { agent };
  }

  it('answers a second request from memory (no session read)', async () => {
    const user = await makeUser(t);
    const { agent } = await session(user);
    await agent.get('/api/me').expect(200);
    const hits = cache.counts.hits;
    await agent.get('/api/me').expect(200);
    await agent.get('/api/projects').expect(200);
    expect(cache.counts.hits).toBe(hits + 2);
  });

  it('a sign-out reaches the cache through the database and ends the session', async () => {
    const user = await makeUser(t);
    const res = await request(server)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: user.password })
      .expect(200);
    const cookies = Object.fromEntries(
      (res.headers['set-cookie'] as unknown as string[]).map((c) => {
        const pair = c.split(';')[0]!;
        return [pair.slice(0, pair.indexOf('=')), pair.slice(pair.indexOf('=') + 1)];
      }),
    );
    const me = () =>
      request(server).get('/api/me').set('cookie', `hl_access=${cookies['hl_access']}`);
    await me().expect(200);
    const hits = cache.counts.hits;
    await me().expect(200);
    expect(cache.counts.hits).toBe(hits + 1);
    const seen = cache.counts.invalidations;
    await request(server)
      .post('/api/auth/sign-out')
      .set(
        'cookie',
        `hl_access=${cookies['hl_access']}; hl_refresh=${cookies['hl_refresh']}; hl_csrf=${cookies['hl_csrf']}`,
      )
      .set('x-csrf-token', decodeURIComponent(cookies['hl_csrf']!))
      .send({})
      .expect(204);
    await until(() => cache.counts.invalidations > seen);
    await me().expect(401);
  });

  it('a deactivation and a password change made in SQL by hand also end cached sessions', async () => {
    for (const change of [
      'update users set active = false where id = $1',
      'update users set auth_epoch = auth_epoch + 1 where id = $1',
    ]) {
      const user = await makeUser(t);
      const token = await accessOf(user);
      const me = () => request(server).get('/api/me').set('cookie', `hl_access=${token}`);
      await me().expect(200);
      const hits = cache.counts.hits;
      await me().expect(200);
      expect(cache.counts.hits).toBe(hits + 1);
      const seen = cache.counts.invalidations;
      await t.dataSource.query(change, [user.id]);
      await until(() => cache.counts.invalidations > seen);
      await me().expect(401);
    }
  });

  it('stops caching when its connection breaks, and reads the database meanwhile', async () => {
    const user = await makeUser(t);
    const token = await accessOf(user);
    const me = () => request(server).get('/api/me').set('cookie', `hl_access=${token}`);
    await me().expect(200);
    await t.dataSource.query(
      `select pg_terminate_backend(pid) from pg_stat_activity
        where application_name = 'hoopline-sessions' and datname = current_database()`,
    );
    await until(() => !cache.listening);
    const hits = cache.counts.hits;
    await t.dataSource.query('update users set active = false where id = $1', [user.id]);
    // No cache while it is down: the change is seen at once.
    await me().expect(401);
    expect(cache.counts.hits).toBe(hits);
    await until(() => cache.listening);
  });

  /** A fresh session's access token for `user`, signed in through the app. */
  async function accessOf(user: TestUser): Promise<string> {
    const res = await request(server)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: user.password });
    const line = (res.headers['set-cookie'] as unknown as string[]).find((c) =>
      c.startsWith('hl_access='),
    )!;
    return line.split(';')[0]!.slice('hl_access='.length);
  }
});
