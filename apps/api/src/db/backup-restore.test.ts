import { execFileSync } from 'node:child_process';
import { mkdtemp, rm, stat } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { contentHash, verifyCode } from '../domain/revisions/revision-content';
import { createServices } from '../wiring';
import { createStorage } from '../storage/create-storage';
import { adminQuery, withDatabase } from '../../test/database';
import { tableChecksums } from '../../test/table-checksums';
import { startTestApp, type TestApp } from '../../test/test-app';
import { createDataSource } from './data-source';
import { seedDemo } from '../seed/seed-demo';

const PG_SH = path.resolve(import.meta.dirname, '../../../../scripts/pg.sh');

/** `scripts/pg.sh <args>` against one database (DATABASE_URL names it, as for a deployment). */
function pgSh(databaseUrl: string, ...args: string[]): string {
  return execFileSync('bash', [PG_SH, ...args], {
    env: { ...process.env, DATABASE_URL: databaseUrl },
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'pipe'],
  }).trim();
}

interface RevisionRow {
  id: string;
  status: string;
  content_hash: string;
  inputs: never;
  engine_version: string;
  report: never;
}

/** Every revision whose stored inputs, engine version and report no longer hash to its content hash. */
async function brokenHashes(dataSource: DataSource): Promise<string[]> {
  const rows: RevisionRow[] = await dataSource.query(
    'select id, status, content_hash, inputs, engine_version, report from revisions',
  );
  return rows
    .filter(
      (r) =>
        contentHash({ inputs: r.inputs, engineVersion: r.engine_version, report: r.report }) !==
        r.content_hash,
    )
    .map((r) => r.id);
}

describe('backup and restore (pnpm db backup / pnpm db restore FILE, PostgreSQL pg_dump/pg_restore)', () => {
  let t: TestApp;
  let folder = '';
  let restored: DataSource | null = null;
  const copy = `hoopline_r_${process.pid}_${Date.now().toString(36)}`;
  let copyUrl = '';

  beforeAll(async () => {
    t = await startTestApp();
    await seedDemo(t.dataSource, t.config, t.services);
    folder = await mkdtemp(path.join(os.tmpdir(), 'hoopline-backup-'));
    copyUrl = withDatabase(t.config.databaseUrl, copy);
    await adminQuery(t.config.databaseUrl, `create database ${copy}`);
  }, 120_000);
  afterAll(async () => {
    await restored?.destroy();
    await adminQuery(t.config.databaseUrl, `drop database if exists ${copy} with (force)`);
    await t.close();
    await rm(folder, { recursive: true, force: true });
  });

  it('round-trips the seeded database into an empty one: every table equal, every revision hash still verifies', async () => {
    const file = path.join(folder, 'seeded.dump');
    const before = await tableChecksums(t.dataSource);
    expect(await brokenHashes(t.dataSource)).toEqual([]);
    expect(pgSh(t.config.databaseUrl, 'backup', file)).toBe(file);
    expect((await stat(file)).size).toBeGreaterThan(1000);

    pgSh(copyUrl, 'restore', file);
    restored = createDataSource(copyUrl);
    await restored.initialize();
    expect(await tableChecksums(restored)).toEqual(before);
    const revisions: { id: string; status: string; content_hash: string }[] = await restored.query(
      'select id, status, content_hash from revisions',
    );
    expect(revisions.length).toBeGreaterThan(3);
    expect(await brokenHashes(restored)).toEqual([]);

    // The API on the restored database verifies each countersigned sheet by its code.
    const services = createServices(restored, t.config, createStorage(t.config.storage));
    const countersigned = revisions.filter((r) => r.status === 'countersigned');
    expect(countersigned.length).toBeGreaterThan(0);
    for (const r of countersigned) {
      const answer = await services.revisions.verify(verifyCode(r.content_hash).replace(/-/g, ''));
      expect(answer, r.id).toMatchObject({ match: true });
    }
  }, 120_000);

  it('restoring over a changed database puts it back as it was, and a failed restore changes nothing', async () => {
    const file = path.join(folder, 'before-change.dump');
    pgSh(t.config.databaseUrl, 'backup', file);
    const before = await tableChecksums(t.dataSource);
    // Damage after the backup: a tampered report, a deleted audit event, a new project row.
    await t.dataSource.query(
      `update revisions set report = jsonb_set(report, '{tampered}', 'true') where id = (select id from revisions limit 1)`,
    );
    await t.dataSource.query(
      'delete from audit_events where id = (select id from audit_events limit 1)',
    );
    expect(await brokenHashes(t.dataSource)).toHaveLength(1);
    await t.dataSource.destroy();
    pgSh(t.config.databaseUrl, 'restore', file);
    await t.dataSource.initialize();
    expect(await tableChecksums(t.dataSource)).toEqual(before);
    expect(await brokenHashes(t.dataSource)).toEqual([]);

    const broken = path.join(folder, 'broken.dump');
    execFileSync('bash', ['-c', `head -c 2000 '${file}' > '${broken}'`]);
    expect(() => pgSh(t.config.databaseUrl, 'restore', broken)).toThrow();
    expect(await tableChecksums(t.dataSource)).toEqual(before);
  }, 120_000);
});
