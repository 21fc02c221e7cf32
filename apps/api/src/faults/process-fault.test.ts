import { randomInt } from 'node:crypto';
import { mkdir, mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../config/config';
import { createDataSource } from '../db/data-source';
import { createServices, type Services } from '../wiring';
import { createStorage } from '../storage/create-storage';
import {
  Session,
  TINY_PDF,
  makeComponent,
  makeWorld,
  type TestUser,
  type World,
} from '../../test/fixtures';
import { createTestDatabase } from '../../test/database';
import { startApiProcess, type ApiProcess } from '../../test/api-process';
import type { TestApp } from '../../test/test-app';

const HOST = os.hostname().replace(/[^A-Za-z0-9-]/g, '_');
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
async function until(condition: () => boolean, timeoutMs: number): Promise<void> {
  for (let waited = 0; !condition() && waited < timeoutMs; waited += 5) await sleep(5);
}

async function signInTo(url: string, user: TestUser): Promise<Session> {
  const session = new Session(request.agent(url), user);
  const res = await session.agent
    .post('/api/auth/sign-in')
    .send({ email: user.email, password: user.password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
  session.absorb(res);
  return session;
}

async function uploadFolder(folder: string): Promise<{ blobs: string[]; partials: string[] }> {
  const names = (await readdir(folder, { recursive: true, withFileTypes: true }).catch(() => []))
    .filter((e) => e.isFile())
    .map((e) => e.name);
  return {
    blobs: names.filter((n) => /^[0-9a-f]{64}$/.test(n)),
    partials: names.filter((n) => n.endsWith('.part')),
  };
}

/**
 * The API as a real child process, killed with SIGKILL in the middle of
 * uploads and of countersigns, then started again: what is left must be
 * consistent.
 */
describe('process fault: the API killed (SIGKILL) during uploads and countersigns', () => {
  let database: { url: string; drop: () => Promise<void> };
  let uploads: string;
  let dataSource: DataSource;
  let services: Services;
  let w: World;
  let api: ApiProcess | null = null;
  let environment: Record<string, string>;

  beforeAll(async () => {
    database = await createTestDatabase();
    uploads = await mkdtemp(path.join(os.tmpdir(), 'hoopline-kill-uploads-'));
    environment = {
      DATABASE_URL: database.url,
      HOOPLINE_UPLOAD_DIR: uploads,
      HOOPLINE_UPLOAD_MAX_BYTES: String(16 * 1024 * 1024),
    };
    const config = loadConfig({ NODE_ENV: 'test', ...environment });
    dataSource = createDataSource(database.url);
    await dataSource.initialize();
    const storage = createStorage(config.storage);
    services = createServices(dataSource, config, storage);
    w = await makeWorld({ dataSource, services, config, storage } as unknown as TestApp);
  });
  afterAll(async () => {
    await api?.kill();
    await dataSource?.destroy();
    await database?.drop();
    if (uploads) await rm(uploads, { recursive: true, force: true });
  });
  const t = () => ({ dataSource, services }) as unknown as TestApp;

  it('during uploads: after a restart no attachment row lacks its blob, no blob lacks a row, no .part is left', async () => {
    const c = await makeComponent(t(), w);
    let acknowledged = 0;
    let sent = 0;
    let killedPid = 0;
    for (let round = 0; round < 3; round += 1) {
      api = await startApiProcess(environment);
      const designer = await signInTo(api.url, w.designer);
      const inFlight = Array.from({ length: 10 }, (_, i) => {
        const bytes = Buffer.concat([
          TINY_PDF,
          Buffer.from(`%round ${round} file ${i}\n`),
          Buffer.alloc(3 * 1024 * 1024, 0x20),
        ]);
        sent += 1;
        return designer
          .upload(`/api/components/${c.componentId}/attachments`, bytes, `r${round}-${i}.pdf`)
          .then((res) => {
            if (res.status === 201) acknowledged += 1;
          })
          .catch(() => undefined); // the connection dies with the process
      });
      // Killed once the first uploads are through and the others under way.
      const before = acknowledged;
      await until(() => acknowledged >= before + 2, 10_000);
      await sleep(randomInt(60));
      await api.kill('SIGKILL');
      await Promise.all(inFlight);
      killedPid = api.child.pid ?? killedPid;
    }
    const named = new Set(
      (await dataSource.query('select sha256 from attachments')).map(
        (r: { sha256: string }) => r.sha256,
      ),
    );
    // What a kill in the middle of writing a blob leaves (the write takes
    // milliseconds, so the kills above seldom land in it): a .part named with
    // the killed process's id, 2 MB of it.
    const partial = path.join(
      uploads,
      'ab',
      'cd',
      `${'ab'.repeat(32)}.${HOST}.${killedPid}.f00d.part`,
    );
    await mkdir(path.dirname(partial), { recursive: true });
    await writeFile(partial, Buffer.alloc(2 * 1024 * 1024));
    const killed = await uploadFolder(uploads);
    const leftBehind = {
      orphans: killed.blobs.filter((b) => !named.has(b)).length,
      partials: killed.partials.length,
    };
    // The next start sweeps (grace 0 here: no other process is uploading).
    api = await startApiProcess({ ...environment, HOOPLINE_UPLOAD_SWEEP_GRACE: '0' });
    for (let i = 0; i < 100; i += 1) {
      const folder = await uploadFolder(uploads);
      if (folder.partials.length === 0) break;
      await sleep(50);
    }
    await sleep(300);
    await api.kill('SIGTERM');
    api = null;

    const rows: { sha256: string }[] = await dataSource.query('select sha256 from attachments');
    const folder = await uploadFolder(uploads);
    console.info(
      `[process fault: uploads] sent ${sent}, acknowledged ${acknowledged}, rows ${rows.length}; ` +
        `left behind by the kills: ${leftBehind.orphans} unreferenced blobs, ${leftBehind.partials} .part files; ` +
        `after the restart: ${folder.blobs.length} blobs, ${folder.partials.length} .part files`,
    );
    expect(rows.length).toBeGreaterThanOrEqual(acknowledged);
    expect(leftBehind.partials).toBeGreaterThan(0);
    expect(folder.partials).toEqual([]);
    expect(new Set(folder.blobs)).toEqual(new Set(rows.map((r) => r.sha256)));
  }, 180_000);

  it('during countersigns: each revision is countersigned with its sign-off and audit event, or not at all', async () => {
    const revisions = await Promise.all(
      Array.from({ length: 30 }, () => makeComponent(t(), w, 'submitted')),
    );
    api = await startApiProcess(environment);
    const checker = await signInTo(api.url, w.checker);
    const acknowledged = new Set<string>();
    const inFlight = revisions.map((r) =>
      checker
        .post(`/api/revisions/${r.revisionId}/countersign`, { hash: r.hash })
        .then((res) => {
          if (res.status === 200) acknowledged.add(r.revisionId);
        })
        .catch(() => undefined),
    );
    await until(() => acknowledged.size >= 3, 10_000);
    await sleep(randomInt(20));
    await api.kill('SIGKILL');
    api = null;
    await Promise.all(inFlight);

    const states: {
      id: string;
      status: string;
      sign_offs: number;
      audits: number;
      issued: boolean;
    }[] = await dataSource.query(
      `select r.id, r.status,
              (select count(*)::int from sign_offs s where s.revision_id = r.id) as sign_offs,
              (select count(*)::int from audit_events a
                where a.entity_id = r.id and a.action = 'revision.countersigned') as audits,
              coalesce(c.issued_revision_id = r.id, false) as issued
         from revisions r join components c on c.id = r.component_id
        where r.id = any($1::uuid[])`,
      [revisions.map((r) => r.revisionId)],
    );
    const signed = states.filter((s) => s.status === 'countersigned');
    console.info(
      `[process fault: countersigns] ${revisions.length} sent, ${acknowledged.size} acknowledged, ` +
        `${signed.length} countersigned when killed, ${states.length - signed.length} still submitted`,
    );
    for (const s of states) {
      if (s.status === 'countersigned') {
        expect(s).toMatchObject({ sign_offs: 1, audits: 1, issued: true });
      } else {
        expect(s).toMatchObject({ status: 'submitted', sign_offs: 0, audits: 0, issued: false });
        expect(acknowledged.has(s.id)).toBe(false);
      }
    }
    expect(states).toHaveLength(revisions.length);
  }, 120_000);
});
