import { ENGINE_VERSION } from '@hoopline/calc';
import type { ComponentTable } from '@hoopline/contract';
import { TABLE_CSV_HEADER, formatPercent, percentFigure } from '@hoopline/present';
import { parse } from 'csv-parse/sync';
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
 * The project as a chamber: GET /projects/:id/components/table and its CSV,
 * on the real PostgreSQL. Every figure is the stored report's (a report
 * edited in SQL shows as edited: nothing is screened again).
 */
describe('the project table and its CSV', () => {
  let t: TestApp;
  let w: World;
  let designer: Session;
  let fabricator: Session;
  let outsider: Session;
  const ids: Record<string, { componentId: string; revisionId: string }> = {};

  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t, 'CH-1');
    designer = await signIn(t, w.designer);
    fabricator = await signIn(t, w.fabricator);
    outsider = await signIn(t, w.outsider);
    ids['issued'] = await makeComponent(t, w, 'countersigned', 'B door plate', '12 mm');
    ids['draft'] = await makeComponent(t, w, 'draft', 'A thin cover', '3 mm');
    // A name a spreadsheet would run as a formula, with a comma and quotes.
    ids['hostile'] = await makeComponent(
      t,
      w,
      'submitted',
      '=HYPERLINK("http://x.test","click"), "left"',
    );
    // The issued door gets a newer draft: designers see revision 2, a fabricator the issued 1.
    const door = await t.services.components.get(w.designer, ids['issued'].componentId);
    await t.services.revisions.create(w.designer, ids['issued'].componentId, {
      inputs: plateInputs('14 mm'),
      baseVersion: door.version,
    });
  });
  afterAll(async () => {
    await t.close();
  });

  const P = () => `/api/projects/${w.projectId}`;

  it('requires sign-in, and hides the project from an outsider', async () => {
    await anonymous(t).get(`${P()}/components/table`).expect(401);
    await anonymous(t).get(`${P()}/components.csv`).expect(401);
    expect((await outsider.get(`${P()}/components/table`)).status).toBe(404);
    expect((await outsider.get(`${P()}/components.csv`)).status).toBe(404);
  });

  it('lists every component with its latest revision and the stored report’s governing check', async () => {
    const table = (await designer.get(`${P()}/components/table`).expect(200))
      .body as ComponentTable;
    expect(table.engineVersion).toBe(ENGINE_VERSION);
    expect(table.rows.map((r) => r.component.name)).toEqual([
      '=HYPERLINK("http://x.test","click"), "left"',
      'A thin cover',
      'B door plate',
    ]);
    for (const row of table.rows) {
      const revision = (await designer.get(`/api/revisions/${row.revision!.id}`).expect(200)).body;
      expect(row.revision!.number).toBe(revision.number);
      expect(row.revision!.status).toBe(revision.status);
      expect(row.revision!.verdict).toBe(revision.report.verdict);
      expect(row.governing).toEqual({
        checkId: revision.report.governing.checkId,
        checkLabel: revision.report.governing.checkLabel,
        loadCase: revision.report.governing.loadCase,
        utilisation: revision.report.governing.utilisation,
      });
    }
    const door = table.rows.find((r) => r.component.name === 'B door plate')!;
    expect(door.revision).toMatchObject({ number: 2, status: 'draft' });
    expect(door.issuedRevisionNumber).toBe(1);
    // A 3 mm cover of 500 mm at full vacuum fails (the calc's circular-plate tests hold its numbers).
    const thin = table.rows.find((r) => r.component.name === 'A thin cover')!;
    expect(thin.revision!.verdict).toBe('fail');
    expect(thin.governing!.utilisation).toBeGreaterThan(1);
  });

  it('shows a fabricator the issued components and their issued revisions only', async () => {
    const table = (await fabricator.get(`${P()}/components/table`).expect(200))
      .body as ComponentTable;
    expect(
      table.rows.map((r) => [r.component.name, r.revision?.number, r.revision?.status]),
    ).toEqual([['B door plate', 1, 'countersigned']]);
  });

  it('reads the stored report, and says when another engine version wrote it', async () => {
    // Rewritten in SQL: the table must show what is stored, not a fresh screening.
    await t.dataSource.query(
      `update revisions set engine_version = '0.0.1-old',
              report = jsonb_set(report, '{governing,utilisation}', '0.99961'::jsonb)
        where id = $1`,
      [ids['hostile']!.revisionId],
    );
    const table = (await designer.get(`${P()}/components/table`).expect(200))
      .body as ComponentTable;
    const row = table.rows.find((r) => r.component.id === ids['hostile']!.componentId)!;
    expect(row.governing!.utilisation).toBe(0.99961);
    expect(row.revision!.engineVersion).toBe('0.0.1-old');
    const csv = await designer.get(`${P()}/components.csv`).expect(200);
    const records = parse(csv.text, { bom: true }) as string[][];
    const hostile = records.find((r) => r[1]?.includes('HYPERLINK'))!;
    // formatPercent's rule: a pass at 99.961 % is never shown as 100 %.
    expect(hostile[9]).toBe('99.9');
    expect(hostile[10]).toBe('0.0.1-old');
    expect(hostile[11]).toMatch(/stored report from engine 0\.0\.1-old .*not screened again/);
  });

  it('writes RFC 4180 CSV with the table’s numbers, ISO dates, quoting and no formulas', async () => {
    const res = await designer.get(`${P()}/components.csv`).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers['content-disposition']).toBe('attachment; filename=CH-1_components.csv');
    const text = res.text;
    expect(text.charCodeAt(0)).toBe(0xfeff);
    // RFC 4180 §2: records end in CRLF; a field with a quote or comma is quoted, quotes doubled.
    expect(text.slice(1).split('\r\n').filter(Boolean)).toHaveLength(4);
    expect(text).toContain(`"'=HYPERLINK(""http://x.test"",""click""), ""left"""`);
    const records = parse(text, { bom: true }) as string[][];
    expect(records[0]).toEqual([...TABLE_CSV_HEADER]);
    const table = (await designer.get(`${P()}/components/table`).expect(200))
      .body as ComponentTable;
    expect(records.slice(1).map((r) => r[1])).toEqual(
      table.rows.map((r) =>
        r.component.name.startsWith('=') ? `'${r.component.name}` : r.component.name,
      ),
    );
    for (const [index, row] of table.rows.entries()) {
      const record = records[index + 1]!;
      expect(record[0]).toBe('CH-1');
      expect(record[4]).toBe(String(row.revision!.number));
      expect(record[7]).toBe(row.governing!.checkLabel);
      // The same figure as the table's cell (formatPercent), as a number a spreadsheet reads.
      expect(record[9]).toBe(percentFigure(formatPercent(row.governing!.utilisation)));
      // Within formatPercent's rounding (0.1 point: a pass is cut down below 100 %, never up).
      expect(Math.abs(Number(record[9]) - row.governing!.utilisation * 100)).toBeLessThanOrEqual(
        0.1 + 1e-9,
      );
      expect(record[12]).toBe(`${row.revision!.createdAt.slice(0, 19)}Z`);
      expect(record[12]).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\dZ$/);
    }
    // No cell of the file starts with a formula character.
    for (const record of records) {
      for (const cell of record) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
    }
  });

  it('gives a fabricator the CSV of what they may see', async () => {
    const res = await fabricator.get(`${P()}/components.csv`).expect(200);
    const records = parse(res.text, { bom: true }) as string[][];
    expect(records.slice(1).map((r) => [r[1], r[4], r[5]])).toEqual([
      ['B door plate', '1', 'Countersigned'],
    ]);
  });
});
