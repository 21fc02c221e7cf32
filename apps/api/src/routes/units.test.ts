import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { THIN_SPACE } from '@hoopline/present';
import { PDFDocument } from 'pdf-lib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeComponent, makeWorld, signIn, type World } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

/**
 * Units through the API on the real PostgreSQL: a person's vacuum unit
 * (saved, validated, audited), and the paper a sheet or issue package takes
 * when none is asked for (US customary projects: Letter; SI: A4), read back
 * with pdf-lib, with the sheet's text read with pdftotext (poppler).
 */
const ARTIFACTS = path.resolve(import.meta.dirname, '../../test-results/units');

// Page sizes in PostScript points: US Letter 8.5 × 11 in = 612 × 792 pt (ANSI/ASME Y14.1);
// A4 210 × 297 mm = 595.28 × 841.89 pt (ISO 216, 1 in = 25.4 mm, 72 pt to the inch).
const LETTER = { width: 612, height: 792 };
const A4 = { width: (210 / 25.4) * 72, height: (297 / 25.4) * 72 };

async function pageSize(pdf: Buffer): Promise<{ width: number; height: number }> {
  const [page] = (await PDFDocument.load(pdf)).getPages();
  return page!.getSize();
}

function pdfText(pdf: Buffer, name: string): string {
  mkdirSync(ARTIFACTS, { recursive: true });
  const file = path.join(ARTIFACTS, `${name}.pdf`);
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' })
    .replaceAll(THIN_SPACE, '')
    .replace(/\s+/g, ' ');
}

describe('vacuum unit (PATCH /api/me)', () => {
  let t: TestApp;
  let w: World;
  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
  });
  afterAll(async () => {
    await t.close();
  });

  it('starts null (the unit system’s own), saves a choice, audits it, and goes back with null', async () => {
    const s = await signIn(t, w.checker);
    expect((await s.get('/api/me').expect(200)).body.user.vacuumUnit).toBeNull();
    const saved = await s.patch('/api/me', { vacuumUnit: 'mTorr' }).expect(200);
    expect(saved.body.user.vacuumUnit).toBe('mTorr');
    expect((await s.get('/api/me').expect(200)).body.user.vacuumUnit).toBe('mTorr');
    const [row] = (await t.dataSource.query('select vacuum_unit from users where id = $1', [
      w.checker.id,
    ])) as { vacuum_unit: string | null }[];
    expect(row!.vacuum_unit).toBe('mTorr');
    const [event] = (await t.dataSource.query(
      `select summary from audit_events where action = 'user.updated' and entity_id = $1
        order by created_at desc limit 1`,
      [w.checker.id],
    )) as { summary: { before: { vacuumUnit: unknown }; after: { vacuumUnit: unknown } } }[];
    expect(event!.summary.before.vacuumUnit).toBeNull();
    expect(event!.summary.after.vacuumUnit).toBe('mTorr');
    const back = await s.patch('/api/me', { vacuumUnit: null }).expect(200);
    expect(back.body.user.vacuumUnit).toBeNull();
  });

  it('refuses a unit that is not a vacuum unit with a field error, and changes nothing', async () => {
    const s = await signIn(t, w.fabricator);
    await s.patch('/api/me', { vacuumUnit: 'mbar' }).expect(200);
    for (const bad of ['psi', 'Torr', 3, '']) {
      const res = await s.patch('/api/me', { vacuumUnit: bad, name: 'Renamed' });
      expect(res.status, String(bad)).toBe(400);
      expect(res.body.error.fields).toEqual([
        { path: 'vacuumUnit', message: 'must be "torr", "mTorr", "mbar" or "Pa"' },
      ]);
    }
    const me = (await s.get('/api/me').expect(200)).body.user;
    expect(me).toMatchObject({ vacuumUnit: 'mbar', name: 'Fabricator' });
  });

  it('the database refuses a unit outside the list too (check constraint)', async () => {
    await expect(
      t.dataSource.query(`update users set vacuum_unit = 'psi' where id = $1`, [w.designer.id]),
    ).rejects.toThrow(/users_vacuum_unit_check/);
  });
});

describe('paper by the project’s unit system', () => {
  let t: TestApp;
  let w: World;
  const unitsOf = async (unitSystem: 'si' | 'us') => {
    const { version } = await t.services.projects.get(w.designer, w.projectId);
    await t.services.projects.update(w.designer, w.projectId, { unitSystem, version });
  };
  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
  });
  afterAll(async () => {
    await t.close();
  });

  it('prints an SI project’s sheet on A4 and a US project’s on Letter when no paper is asked for', async () => {
    const designer = await signIn(t, w.designer);
    const { revisionId } = await makeComponent(t, w, 'draft', 'Glovebox door');
    const url = `/api/revisions/${revisionId}/sheet.pdf`;

    const si = await designer.download(url).expect(200);
    const siSize = await pageSize(si.body as Buffer);
    expect(siSize.width).toBeCloseTo(A4.width, 1);
    expect(siSize.height).toBeCloseTo(A4.height, 1);

    await unitsOf('us');
    const us = await designer.download(url).expect(200);
    expect(await pageSize(us.body as Buffer)).toEqual(LETTER);
    // A new paper is a new sheet, not the A4 one from the cache.
    expect(us.headers['x-hoopline-sheet-source']).toBe('rendered');
    const text = pdfText(us.body as Buffer, 'us-sheet');
    // The load-case line in US units: full vacuum in torr, the ambient in psi.
    expect(text).toMatch(/inside full vacuum = 0 torr\(a\), outside ambient 14\.\d+ psi\(a\)/);
    expect(text).not.toMatch(/Pa\(a\)/);

    // Asked for, the paper is the one asked for.
    const asked = await designer.download(`${url}?paper=a4`).expect(200);
    expect((await pageSize(asked.body as Buffer)).width).toBeCloseTo(A4.width, 1);

    const [event] = (await t.dataSource.query(
      `select summary -> 'after' ->> 'paperSize' as paper from audit_events
        where action = 'sheet.downloaded' and entity_id = $1 order by created_at desc offset 1 limit 1`,
      [revisionId],
    )) as { paper: string }[];
    expect(event!.paper).toBe('LETTER');
  });

  it('issues a US project’s package on Letter by default', async () => {
    await makeComponent(t, w, 'countersigned', 'Oven port cover');
    await unitsOf('us');
    const designer = await signIn(t, w.designer);
    const res = await designer.download(`/api/projects/${w.projectId}/package.pdf`).expect(200);
    expect(await pageSize(res.body as Buffer)).toEqual(LETTER);
    await unitsOf('si');
    const si = await designer.download(`/api/projects/${w.projectId}/package.pdf`).expect(200);
    expect((await pageSize(si.body as Buffer)).width).toBeCloseTo(A4.width, 1);
  });
});
