import { threadId } from 'node:worker_threads';
import { PDFParse } from 'pdf-parse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeWorld, plateInputs, signIn, type Session, type World } from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';
import { pgPool } from '../../db/pg-pool';
import { SheetCache } from './sheet-cache';

// Integration tests (real PostgreSQL, real worker threads): sheets are
// rendered off the request thread and kept by content. Nothing here times
// anything: the fast path is shown by the renderer's counter, the response's
// source header and the audit row.

async function pdfText(bytes: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  try {
    return (await parser.getText()).text.replace(/\s+/g, ' ');
  } finally {
    await parser.destroy();
  }
}

describe('sheets: rendered in a worker thread, kept by content', () => {
  let t: TestApp;
  let w: World;
  let designer: Session;
  let fabricator: Session;

  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
    [designer, fabricator] = await Promise.all([signIn(t, w.designer), signIn(t, w.fabricator)]);
  });
  afterAll(async () => {
    await t.close();
  });

  const rendered = () => t.sheetRenderer.stats().rendered;
  const audits = async (revisionId: string) =>
    (
      await t.dataSource.query<{ summary: { after: { source: string; renderedAt: string } } }[]>(
        `select summary from audit_events where action = 'sheet.downloaded' and entity_id = $1
          order by seq`,
        [revisionId],
      )
    ).map((r) => r.summary.after);

  it('renders in a pool thread, not on the thread that asked', async () => {
    const created = await t.services.components.create(w.designer, w.projectId, {
      name: 'Thread probe',
      inputs: plateInputs(),
    });
    const before = rendered();
    const res = await designer.download(`/api/revisions/${created.revision.id}/sheet.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers['x-hoopline-sheet-source']).toBe('rendered');
    expect(rendered()).toBe(before + 1);
    expect(t.sheetRenderer.stats().threads).toBeGreaterThan(0);
    // The pool answers which thread rendered: another than this one.
    const { sheet } = await import('../../../test/sheet-data-example');
    const direct = await t.sheetRenderer.render(sheet);
    expect(direct.threadId).not.toBe(threadId);
    expect(direct.pdf.subarray(0, 5).toString()).toBe('%PDF-');
  });

  it('a second download gives the same bytes from the cache, without rendering again', async () => {
    const created = await t.services.components.create(w.designer, w.projectId, {
      name: 'Cached sheet',
      inputs: plateInputs('14 mm'),
    });
    const url = `/api/revisions/${created.revision.id}/sheet.pdf`;
    const first = await designer.download(url);
    const afterFirst = rendered();
    const second = await designer.download(url);
    expect(second.status).toBe(200);
    expect(Buffer.compare(first.body as Buffer, second.body as Buffer)).toBe(0);
    expect(first.headers['x-hoopline-sheet-source']).toBe('rendered');
    expect(second.headers['x-hoopline-sheet-source']).toBe('cache');
    expect(rendered()).toBe(afterFirst);
    // Every download is still audited, and says how it was answered.
    const trail = await audits(created.revision.id);
    expect(trail.map((a) => a.source)).toEqual(['rendered', 'cache']);
    // The sheet's "generated" time is when it was rendered, the same both times.
    const renderedAt = first.headers['x-hoopline-sheet-rendered-at'] as string;
    expect(second.headers['x-hoopline-sheet-rendered-at']).toBe(renderedAt);
    expect(trail.every((a) => a.renderedAt === renderedAt)).toBe(true);
    const text = await pdfText(second.body as Buffer);
    expect(text).toContain(`Generated ${renderedAt.slice(0, 10)} ${renderedAt.slice(11, 16)} UTC`);
    // Another paper size is another sheet.
    const letter = await designer.download(`${url}?paper=letter`);
    expect(letter.headers['x-hoopline-sheet-source']).toBe('rendered');
  });

  it('a countersign renders anew (stamp FOR REVIEW); so does a supersession', async () => {
    const created = await t.services.components.create(w.designer, w.projectId, {
      name: 'Sheet through the workflow',
      inputs: plateInputs('13 mm'),
    });
    const id = created.revision.id;
    const url = `/api/revisions/${id}/sheet.pdf`;
    const draft = await designer.download(url);
    expect(draft.headers['x-hoopline-stamp']).toBe('draft');
    await t.services.revisions.submit(w.designer, id);
    await t.services.revisions.decide(w.checker, id, 'countersigned', {
      hash: created.revision.contentHash,
    });
    const issued = await fabricator.download(url);
    expect(issued.headers['x-hoopline-stamp']).toBe('review');
    expect(issued.headers['x-hoopline-sheet-source']).toBe('rendered');
    expect(await pdfText(issued.body as Buffer)).toContain('FOR REVIEW — NOT FOR CONSTRUCTION');
    const again = await fabricator.download(url);
    expect(again.headers['x-hoopline-sheet-source']).toBe('cache');
    expect(Buffer.compare(issued.body as Buffer, again.body as Buffer)).toBe(0);
    // A newer revision, countersigned, supersedes this one: its sheet says so, in a new render.
    const next = await t.services.revisions.create(w.designer, created.component.id, {
      inputs: plateInputs('15 mm'),
      baseVersion: created.component.version,
    });
    await t.services.revisions.submit(w.designer, next.revision.id);
    await t.services.revisions.decide(w.checker, next.revision.id, 'countersigned', {
      hash: next.revision.contentHash,
    });
    const superseded = await designer.download(url);
    expect(superseded.headers['x-hoopline-sheet-source']).toBe('rendered');
    expect(Buffer.compare(superseded.body as Buffer, issued.body as Buffer)).not.toBe(0);
    expect(await pdfText(superseded.body as Buffer)).toContain('superseded');
  });

  it('keeps the cache under its size bound, dropping the least recently served first', async () => {
    const pdf = (n: number) => Buffer.alloc(1000, n);
    const cache = new SheetCache(() => pgPool(t.dataSource), 2500);
    const created = await t.services.components.create(w.designer, w.projectId, {
      name: 'Bound probe',
      inputs: plateInputs('16 mm'),
    });
    await t.dataSource.query('delete from sheet_renders');
    const key = (n: number) => String(n).repeat(64);
    for (const n of [1, 2]) await cache.put(key(n), created.revision.id, pdf(n), new Date());
    // Serve 1 again (marked as served a while ago, so the touch applies), then add 3: 2 goes.
    await t.dataSource.query(`update sheet_renders set last_served_at = now() - interval '1 hour'`);
    await t.dataSource.query(
      `update sheet_renders set last_served_at = now() - interval '2 hours' where key = $1`,
      [key(2)],
    );
    expect((await cache.get(key(1)))?.pdf.equals(pdf(1))).toBe(true);
    await cache.put(key(3), created.revision.id, pdf(3), new Date());
    const kept = await t.dataSource.query<{ key: string; size: number }[]>(
      'select key, size from sheet_renders order by key',
    );
    expect(kept.map((r) => r.key)).toEqual([key(1), key(3)]);
    expect(kept.reduce((sum, r) => sum + r.size, 0)).toBeLessThanOrEqual(2500);
    // A key kept by another process first is the one answered.
    const other = await cache.put(key(3), created.revision.id, pdf(9), new Date());
    expect(other.pdf.equals(pdf(3))).toBe(true);
  });
});
