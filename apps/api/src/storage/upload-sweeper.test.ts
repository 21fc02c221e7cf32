import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdir, readdir, utimes, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TINY_PDF, makeComponent, makeWorld, type World } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';
import { keyFor } from './storage';
import { UploadSweeper, sweepUploads } from './upload-sweeper';

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const HOST = os.hostname().replace(/[^A-Za-z0-9-]/g, '_');
const HOUR = 3600_000;

/** The pid of a process that has ended (a `true` run to completion). */
const deadPid = () => spawnSync('true').pid!;

async function allFiles(folder: string): Promise<string[]> {
  return (await readdir(folder, { recursive: true, withFileTypes: true }))
    .filter((e) => e.isFile())
    .map((e) => e.name)
    .sort();
}

describe('upload sweep: leftovers of interrupted uploads (local disk)', () => {
  let t: TestApp;
  let w: World;
  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
  });
  afterAll(async () => {
    await t.close();
  });

  async function leftover(name: string, ageMs: number, hash = 'ab'.repeat(32)) {
    const file = path.join(t.uploadDir, path.dirname(keyFor(hash)), name);
    await mkdir(path.dirname(file), { recursive: true });
    await writeFile(file, Buffer.alloc(2 * 1024 * 1024, 1));
    // A new file is already "now"; setting its time anyway would race a running
    // sweeper, which may remove a dead writer's file the moment it is written.
    if (ageMs > 0) {
      const when = new Date(Date.now() - ageMs);
      await utimes(file, when, when);
    }
    return path.basename(file);
  }

  it('removes .part files of a dead writer at once, others after the grace; unreferenced blobs after the grace; keeps every blob a row names', async () => {
    const c = await makeComponent(t, w);
    const kept = await t.services.attachments.upload(w.designer, c.componentId, {
      originalName: 'kept.pdf',
      bytes: TINY_PDF,
    });
    // A removed attachment's blob stays: a countersigned sheet still lists it.
    const removedBytes = Buffer.concat([TINY_PDF, Buffer.from('removed later')]);
    const removed = await t.services.attachments.upload(w.designer, c.componentId, {
      originalName: 'removed.pdf',
      bytes: removedBytes,
    });
    await t.services.attachments.remove(w.designer, removed.id);
    const old = new Date(Date.now() - 2 * HOUR);
    for (const bytes of [TINY_PDF, removedBytes]) {
      const file = path.join(t.uploadDir, keyFor(sha256(bytes)));
      await utimes(file, old, old);
    }
    const h = 'ab'.repeat(32);
    const deadWriter = await leftover(`${h}.${HOST}.${deadPid()}.aa11.part`, 1000);
    const liveWriter = await leftover(`${h}.${HOST}.${process.pid}.bb22.part`, 1000);
    const otherHostFresh = await leftover(`${h}.elsewhere.123.cc33.part`, 1000);
    const otherHostOld = await leftover(`${h}.elsewhere.124.dd44.part`, 2 * HOUR);
    const orphanOld = 'cd'.repeat(32);
    const orphanFresh = 'ef'.repeat(32);
    await leftover(orphanOld, 2 * HOUR, orphanOld);
    await leftover(orphanFresh, 1000, orphanFresh);

    const result = await sweepUploads(t.storage, t.dataSource, { graceMs: HOUR });
    expect(result).toEqual({ partials: 2, orphans: 1 });
    const left = await allFiles(t.uploadDir);
    expect(left).not.toContain(deadWriter);
    expect(left).not.toContain(otherHostOld);
    expect(left).toContain(liveWriter);
    expect(left).toContain(otherHostFresh);
    expect(left).not.toContain(orphanOld);
    expect(left).toContain(orphanFresh);
    expect(left).toContain(sha256(TINY_PDF));
    expect(left).toContain(sha256(removedBytes));
    expect(await t.storage.get(kept.sha256)).not.toBeNull();
  });

  it('a blob stored again during its grace is not taken (put refreshes it)', async () => {
    const bytes = Buffer.concat([TINY_PDF, Buffer.from('reused')]);
    await t.storage.put(sha256(bytes), bytes, 'application/pdf');
    const file = path.join(t.uploadDir, keyFor(sha256(bytes)));
    const old = new Date(Date.now() - 2 * HOUR);
    await utimes(file, old, old);
    await t.storage.put(sha256(bytes), bytes, 'application/pdf');
    expect(await sweepUploads(t.storage, t.dataSource, { graceMs: HOUR })).toMatchObject({
      orphans: 0,
    });
    expect(await t.storage.has(sha256(bytes))).toBe(true);
  });

  it('runs on a schedule as well as at start', async () => {
    const sweeper = new UploadSweeper(
      t.storage,
      t.dataSource,
      { graceMs: HOUR, intervalMs: 50 },
      pino({ level: 'silent' }),
    );
    sweeper.start();
    await sleep(100);
    const name = await leftover(`${'ab'.repeat(32)}.${HOST}.${deadPid()}.ee55.part`, 0);
    for (let i = 0; i < 50 && (await allFiles(t.uploadDir)).includes(name); i += 1) await sleep(20);
    await sweeper.stop();
    expect(await allFiles(t.uploadDir)).not.toContain(name);
  });
});
