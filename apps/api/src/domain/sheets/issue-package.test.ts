import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { PackageVerifyResult } from '@hoopline/contract';
import { THIN_SPACE, formatPercent, packageStaleness } from '@hoopline/present';
import { PDFDocument } from 'pdf-lib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  anonymous,
  makeComponent,
  makeWorld,
  plateInputs,
  signIn,
  type Session,
  type World,
} from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';

/**
 * The issue package of a project, through the API on the real PostgreSQL:
 * its pages (the index, then each countersigned component's own sheet), the
 * index read back with pdftotext (poppler), its package code, and the
 * public verify answer for that code.
 */
const ARTIFACTS = path.resolve(import.meta.dirname, '../../../test-results/issue-package');

// pdftotext writes no glyph for a thin space; layout whitespace collapses to one space.
const flat = (text: string) => text.replaceAll(THIN_SPACE, '').replace(/\s+/g, ' ');

function pdfText(pdf: Buffer, name: string, pages?: { first: number; last: number }): string {
  mkdirSync(ARTIFACTS, { recursive: true });
  const file = path.join(ARTIFACTS, `${name}.pdf`);
  writeFileSync(file, pdf);
  const range = pages ? ['-f', String(pages.first), '-l', String(pages.last)] : [];
  return flat(
    execFileSync('pdftotext', [...range, '-raw', '-enc', 'UTF-8', file, '-'], {
      encoding: 'utf8',
    }),
  );
}

const pageCount = async (pdf: Buffer) => (await PDFDocument.load(pdf)).getPageCount();

describe('the issue package (index + countersigned sheets, one PDF)', () => {
  let t: TestApp;
  let w: World;
  let designer: Session;
  let checker: Session;
  let fabricator: Session;
  let outsider: Session;
  let door: Awaited<ReturnType<typeof makeComponent>>;
  let cover: Awaited<ReturnType<typeof makeComponent>>;
  let draft: Awaited<ReturnType<typeof makeComponent>>;
  let firstCode = '';

  beforeAll(async () => {
    t = await startTestApp({ HOOPLINE_PUBLIC_URL: 'http://screening.example.test' });
    w = await makeWorld(t, 'GB-7');
    [designer, checker, fabricator, outsider] = await Promise.all([
      signIn(t, w.designer),
      signIn(t, w.checker),
      signIn(t, w.fabricator),
      signIn(t, w.outsider),
    ]);
    door = await makeComponent(t, w, 'countersigned', 'Glovebox door plate', '12 mm');
    cover = await makeComponent(t, w, 'countersigned', 'Antechamber cover', '10 mm');
    draft = await makeComponent(t, w, 'submitted', 'Oven port cover', '8 mm');
  });
  afterAll(async () => {
    await t.close();
  });

  const P = () => `/api/projects/${w.projectId}`;

  it('requires sign-in and membership', async () => {
    await anonymous(t).get(`${P()}/package.pdf`).expect(401);
    expect((await outsider.get(`${P()}/package.pdf`)).status).toBe(404);
  });

  it('is the index, then each countersigned sheet as downloaded alone: pages add up', async () => {
    const res = await designer.download(`${P()}/package.pdf`).expect(200);
    const pdf = res.body as Buffer;
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const code = res.headers['x-hoopline-package-code'] as string;
    expect(code).toMatch(/^PKG-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}$/);
    expect(res.headers['content-disposition']).toBe(
      `attachment; filename=GB-7_issue-package_${code}.pdf`,
    );
    firstCode = code;

    // In index order (by name): the cover, then the door; the submitted port cover is left out.
    const sheets = await Promise.all(
      [cover, door].map(
        async (c) =>
          (await designer.download(`/api/revisions/${c.revisionId}/sheet.pdf`).expect(200))
            .body as Buffer,
      ),
    );
    const sheetPages = await Promise.all(sheets.map(pageCount));
    const total = await pageCount(pdf);
    const indexPages = total - sheetPages[0]! - sheetPages[1]!;
    expect(indexPages).toBe(1);
    expect(Number(res.headers['x-hoopline-package-pages'])).toBe(total);

    const index = pdfText(pdf, 'package-designer', { first: 1, last: indexPages });
    expect(index).toContain('Issue package: GB-7 — Test project');
    expect(index).toContain(code);
    expect(index).toContain('http://screening.example.test/verify/');
    expect(index).toContain('FOR REVIEW — NOT FOR CONSTRUCTION');
    expect(index).toContain('Screening only — not a code calculation');
    for (const c of [cover, door]) {
      const revision = (await designer.get(`/api/revisions/${c.revisionId}`).expect(200)).body;
      // The full hash prints in mono at a small size: pdftotext may break it, so read it joined.
      expect(index.replace(/\s/g, '')).toContain(revision.contentHash);
      const signOff = revision.signOffs[0];
      expect(index).toContain(`${signOff.createdAt.slice(0, 19)}Z`);
      expect(index).toContain(`${revision.submittedAt.slice(0, 19)}Z`);
      expect(index).toContain(formatPercent(revision.report.governing.utilisation));
    }
    expect(index).toContain('Checker');
    expect(index).toContain('Designer');
    expect(index).toMatch(/Oven port cover .*not countersigned: not included/);
    // Cover first (pages 2…), door after it.
    const coverLast = 1 + sheetPages[0]!;
    expect(index).toContain(`2–${coverLast}`);
    expect(index).toContain(`${coverLast + 1}–${total}`);

    // Each sheet's pages follow, the sheet's own text on them; every page carries the package line.
    const all = pdfText(pdf, 'package-designer-all');
    expect(all).toContain(`Issue package ${code} · package page ${total} of ${total}`);
    const coverSheet = pdfText(pdf, 'package-cover', { first: 2, last: coverLast });
    expect(coverSheet).toContain('Antechamber cover');
    expect(coverSheet).not.toContain('Glovebox door plate');
  });

  it('gives a fabricator the same set under the same code, without what they may not see', async () => {
    const res = await fabricator.download(`${P()}/package.pdf?paper=letter`).expect(200);
    expect(res.headers['x-hoopline-package-code']).toBe(firstCode);
    const index = pdfText(res.body as Buffer, 'package-fabricator', { first: 1, last: 1 });
    expect(index).toContain('Glovebox door plate');
    expect(index).not.toContain('Oven port cover');
    const [page] = (await PDFDocument.load(res.body as Buffer)).getPages();
    // US Letter: 612 × 792 pt (ANSI/ASME Y14.1).
    expect(page!.getSize()).toEqual({ width: 612, height: 792 });
  });

  it('audits every download, as sheet downloads are', async () => {
    await checker.download(`${P()}/package.pdf`).expect(200);
    const events = (await t.dataSource.query(
      `select actor_id, entity_type, summary -> 'after' as after from audit_events
        where action = 'package.downloaded' and project_id = $1 order by created_at`,
      [w.projectId],
    )) as { actor_id: string; entity_type: string; after: Record<string, unknown> }[];
    expect(events.map((e) => e.actor_id)).toEqual([w.designer.id, w.fabricator.id, w.checker.id]);
    expect(events[0]!.entity_type).toBe('project');
    expect(events[0]!.after).toMatchObject({ packageCode: firstCode, paperSize: 'A4' });
    expect((events[0]!.after['revisions'] as unknown[]).length).toBe(2);
    // One row for the set, however often it is downloaded.
    const [kept] = (await t.dataSource.query(
      'select count(*)::int as n from issue_packages where project_id = $1',
      [w.projectId],
    )) as { n: number }[];
    expect(kept!.n).toBe(1);
  });

  it('verifies its code publicly: project, revisions, hashes, verdicts and sign-offs, current', async () => {
    const answer = (
      await anonymous(t).get(`/api/verify/packages/${firstCode.toLowerCase()}`).expect(200)
    ).body as PackageVerifyResult;
    if (!answer.match) throw new Error('no match');
    expect(answer).toMatchObject({
      packageCode: firstCode,
      status: 'current',
      projectNumber: 'GB-7',
      projectName: 'Test project',
      countersignedSince: [],
    });
    const revision = (await designer.get(`/api/revisions/${door.revisionId}`).expect(200)).body;
    expect(answer.components.map((c) => c.componentName)).toEqual([
      'Antechamber cover',
      'Glovebox door plate',
    ]);
    expect(answer.components[1]).toMatchObject({
      revisionNumber: 1,
      contentHash: revision.contentHash,
      verdict: revision.report.verdict,
      preparedBy: 'Designer',
      countersignedBy: 'Checker',
      countersignedAt: revision.signOffs[0].createdAt,
      status: 'current',
      supersededBy: null,
    });
    expect(packageStaleness(answer)).toEqual([]);
    // Spaces, case and the full hash work too; an unknown code matches nothing.
    await anonymous(t)
      .get(`/api/verify/packages/${encodeURIComponent(`pkg ${answer.packageHash.toUpperCase()}`)}`)
      .expect(200)
      .expect((r) => expect(r.body.match).toBe(true));
    await anonymous(t).get('/api/verify/packages/PKG-0000-0000-0000').expect(200, { match: false });
    const bad = await anonymous(t).get('/api/verify/packages/abcd-ef01-2345').expect(400);
    expect(bad.body.error.fields[0].path).toBe('code');
  });

  it('changes its code when a revision is countersigned, and the old code says what superseded it', async () => {
    // A new door revision, countersigned: the set changes.
    const current = await t.services.components.get(w.designer, door.componentId);
    const next = await t.services.revisions.create(w.designer, door.componentId, {
      inputs: plateInputs('14 mm'),
      baseVersion: current.version,
    });
    await t.services.revisions.submit(w.designer, next.revision.id);
    await t.services.revisions.decide(w.checker, next.revision.id, 'countersigned', {
      hash: next.revision.contentHash,
    });
    const second = await designer.download(`${P()}/package.pdf`).expect(200);
    const secondCode = second.headers['x-hoopline-package-code'] as string;
    expect(secondCode).not.toBe(firstCode);
    // The same set again: the same code.
    const again = await fabricator.download(`${P()}/package.pdf`).expect(200);
    expect(again.headers['x-hoopline-package-code']).toBe(secondCode);

    const old = (await anonymous(t).get(`/api/verify/packages/${firstCode}`).expect(200))
      .body as PackageVerifyResult;
    if (!old.match) throw new Error('no match');
    expect(old.status).toBe('superseded');
    expect(old.components.find((c) => c.componentName === 'Glovebox door plate')).toMatchObject({
      status: 'superseded',
      supersededBy: 2,
    });
    expect(packageStaleness(old)).toEqual([
      'superseded for component Glovebox door plate (revision 2 countersigned since)',
    ]);
    const fresh = (await anonymous(t).get(`/api/verify/packages/${secondCode}`).expect(200))
      .body as PackageVerifyResult;
    expect(fresh.match && fresh.status).toBe('current');

    // The port cover countersigned for the first time: in the next set, and "since" for the last.
    await t.services.revisions.decide(w.checker, draft.revisionId, 'countersigned', {
      hash: draft.hash,
    });
    const third = await designer.download(`${P()}/package.pdf`).expect(200);
    expect(third.headers['x-hoopline-package-code']).not.toBe(secondCode);
    const stale = (await anonymous(t).get(`/api/verify/packages/${secondCode}`).expect(200))
      .body as PackageVerifyResult;
    if (!stale.match) throw new Error('no match');
    expect(stale.status).toBe('superseded');
    expect(stale.countersignedSince).toEqual([
      { componentName: 'Oven port cover', tag: '', revisionNumber: 1 },
    ]);
  });

  it('matches nothing once a revision it holds was altered in the database', async () => {
    const answer = (await anonymous(t).get(`/api/verify/packages/${firstCode}`).expect(200))
      .body as PackageVerifyResult;
    expect(answer.match).toBe(true);
    await t.dataSource.query(
      `update revisions set report = jsonb_set(report, '{verdict}', '"fail"'::jsonb)
        where id = $1`,
      [cover.revisionId],
    );
    await anonymous(t).get(`/api/verify/packages/${firstCode}`).expect(200, { match: false });
  });

  it('refuses a project with nothing countersigned', async () => {
    const empty = await t.services.projects.create(w.designer, {
      number: 'GB-8',
      name: 'Empty',
      unitSystem: 'si',
    });
    const res = await designer.get(`/api/projects/${empty.id}/package.pdf`).expect(409);
    expect(res.body.error.code).toBe('nothing_countersigned');
  });
});
