import { randomUUID } from 'node:crypto';
import type { Server } from 'node:http';
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import request from 'supertest';
import { pino } from 'pino';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { createApp } from '../app';
import { loadConfig } from '../config/config';
import { createDataSource } from '../db/data-source';
import { createServices } from '../wiring';
import { workerSheetRenderer } from '../sheets/sheet-renderer';
import { createStorage } from '../storage/create-storage';
import { makeUser, signIn, type Session } from '../../test/fixtures';
import type { TestApp } from '../../test/test-app';
import { createThrowawayCluster, type ThrowawayCluster } from '../../test/throwaway-cluster';

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

interface Outcome {
  readonly at: number;
  readonly status: number;
  readonly code?: string | undefined;
  readonly retryAfter?: string | undefined;
  readonly projectId?: string | undefined;
  readonly timedOut?: boolean;
}

/**
 * PostgreSQL stopped under a write loop and started again, on a cluster of
 * this file's own (the shared test cluster is never stopped).
 */
describe('database fault: PostgreSQL stopped under a write loop, then started', () => {
  let cluster: ThrowawayCluster;
  let dataSource: DataSource;
  let server: Server;
  let uploads: string;
  let t: TestApp;

  beforeAll(async () => {
    cluster = await createThrowawayCluster();
    const admin = new pg.Client({ connectionString: cluster.url() });
    await admin.connect();
    await admin.query('create database hoopline');
    await admin.end();
    uploads = await mkdtemp(path.join(os.tmpdir(), 'hoopline-fault-uploads-'));
    const config = loadConfig({
      NODE_ENV: 'test',
      DATABASE_URL: cluster.url('hoopline'),
      HOOPLINE_LOG_LEVEL: 'silent',
      HOOPLINE_UPLOAD_DIR: uploads,
    });
    dataSource = createDataSource(config.databaseUrl, { extra: { max: 10 } });
    await dataSource.initialize();
    await dataSource.runMigrations({ transaction: 'each' });
    const storage = createStorage(config.storage);
    const sheetRenderer = workerSheetRenderer(config.sheets.renderThreads);
    const app = createApp({
      config,
      dataSource,
      logger: pino({ level: 'silent' }),
      storage,
      sheetRenderer,
    });
    server = await new Promise<Server>((resolve) => {
      const s = app.listen(0, '127.0.0.1', () => resolve(s));
    });
    t = {
      app,
      server,
      config,
      dataSource,
      services: createServices(dataSource, config, storage, undefined, sheetRenderer),
      sheetRenderer,
      storage,
      uploadDir: uploads,
      close: () => sheetRenderer.close(),
    };
  }, 120_000);

  afterAll(async () => {
    await new Promise<void>((resolve) => server?.close(() => resolve()));
    await t?.close();
    if (dataSource?.isInitialized) await dataSource.destroy().catch(() => undefined);
    cluster?.destroy();
    if (uploads) await rm(uploads, { recursive: true, force: true });
  });

  it('answers 503 database_unavailable with Retry-After meanwhile, recovers by itself, loses no acknowledged write', async () => {
    // TypeORM logs every failed query to console.error while the server is down: expected here.
    const logged = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const designer = await makeUser(t, { name: 'Loop designer', mayCreateProjects: true });
    const sessions: Session[] = await Promise.all([1, 2, 3, 4].map(() => signIn(t, designer)));
    const started = Date.now();
    const outcomes: Outcome[] = [];
    const health: {
      at: number;
      end: number;
      status: number;
      detail?: string | undefined;
      retryAfter?: string | undefined;
    }[] = [];
    let stop = false;

    const writer = async (s: Session, n: number) => {
      for (let i = 0; !stop; i += 1) {
        const number = `F-${n}-${i}-${randomUUID().slice(0, 6)}`;
        const at = Date.now() - started;
        try {
          const res = await s
            .post('/api/projects', { number, name: 'Fault loop', unitSystem: 'si' })
            .timeout(15_000);
          outcomes.push({
            at,
            status: res.status,
            code: res.body?.error?.code,
            retryAfter: res.headers['retry-after'],
            projectId: res.status === 201 ? res.body.id : undefined,
          });
          if (res.status === 503) await sleep(100);
        } catch {
          outcomes.push({ at, status: 0, timedOut: true });
        }
      }
    };
    const prober = async () => {
      while (!stop) {
        const at = Date.now() - started;
        const res = await request(server).get('/api/health').timeout(15_000);
        health.push({
          at,
          end: Date.now() - started,
          status: res.status,
          detail: res.body?.database?.detail,
          retryAfter: res.headers['retry-after'],
        });
        await sleep(200);
      }
    };

    const loop = Promise.all([...sessions.map((s, n) => writer(s, n)), prober()]);
    await sleep(1000);
    cluster.stop('fast');
    const stoppedAt = Date.now() - started;
    await sleep(3000);
    const restartAt = Date.now() - started;
    cluster.start();
    const upAt = Date.now() - started;
    // Give the API up to 10 s to recover, then a second of normal traffic.
    for (let waited = 0; waited < 10_000; waited += 100) {
      if (outcomes.some((o) => o.at > upAt && o.status === 201)) break;
      await sleep(100);
    }
    await sleep(1000);
    stop = true;
    await loop;
    logged.mockRestore();

    const during = outcomes.filter((o) => o.at > stoppedAt && o.at < restartAt);
    const failures = outcomes.filter((o) => o.status !== 201);
    const firstOkAfterUp = outcomes
      .filter((o) => o.status === 201 && o.at >= upAt)
      .reduce((min, o) => Math.min(min, o.at), Infinity);
    const acknowledged = outcomes.filter((o) => o.projectId).map((o) => o.projectId!);

    // Figures for the report.
    console.info(
      `[database fault] requests ${outcomes.length}, acknowledged ${acknowledged.length}, ` +
        `503 ${failures.filter((o) => o.status === 503).length}, other failures ${
          failures.filter((o) => o.status !== 503).length
        }, recovery ${firstOkAfterUp - upAt} ms after the server was back`,
    );

    expect(during.length).toBeGreaterThan(0);
    expect(outcomes.filter((o) => o.timedOut)).toEqual([]);
    for (const f of failures) {
      expect(f, JSON.stringify(f)).toMatchObject({ status: 503, code: 'database_unavailable' });
      expect(Number(f.retryAfter)).toBeGreaterThan(0);
    }
    expect(firstOkAfterUp - upAt).toBeLessThan(10_000);
    // Asked after the server had stopped and answered before it was started again.
    const downHealth = health.filter((h) => h.at > stoppedAt && h.end < restartAt);
    expect(downHealth.length).toBeGreaterThan(0);
    for (const h of downHealth) {
      expect(h).toMatchObject({ status: 503, detail: 'database unavailable' });
      expect(Number(h.retryAfter)).toBeGreaterThan(0);
    }
    expect(health.at(-1)?.status).toBe(200);

    // Every write acknowledged with a 2xx is there, read by a fresh connection.
    const check = new pg.Client({ connectionString: cluster.url('hoopline') });
    await check.connect();
    const found = await check.query<{ id: string }>(
      'select id from projects where id = any($1::uuid[])',
      [acknowledged],
    );
    await check.end();
    expect(found.rows.length).toBe(acknowledged.length);
    expect(acknowledged.length).toBeGreaterThan(10);
  }, 60_000);
});
