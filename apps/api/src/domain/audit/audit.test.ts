import { auditEvent, type AuditEvent } from '@hoopline/contract';
import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  anonymous,
  makeComponent,
  makeUser,
  makeWorld,
  plateInputs,
  signIn,
  type World,
} from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';

describe('the audit log: targets, project filter, CSV export', () => {
  let t: TestApp;
  let a: World;
  let b: World;
  let countersigned: Awaited<ReturnType<typeof makeComponent>>;
  beforeAll(async () => {
    t = await startTestApp();
    a = await makeWorld(t, `PA-${Date.now().toString(36)}`);
    b = await makeWorld(t, `PB-${Date.now().toString(36)}`);
    countersigned = await makeComponent(t, a, 'countersigned', 'Door');
    await makeComponent(t, b, 'draft', 'Lid');
  });
  afterAll(async () => {
    await t.close();
  });

  it('filters by project and names each event’s records', async () => {
    const admin = await signIn(t, a.admin);
    const res = await admin.get(`/api/audit?projectId=${a.projectId}&pageSize=100`).expect(200);
    const items = res.body.items as AuditEvent[];
    expect(items.length).toBeGreaterThan(3);
    for (const e of items) {
      expect(auditEvent.parse(e)).toEqual(e);
      expect(e.projectId).toBe(a.projectId);
    }
    expect(items.some((e) => e.target.component?.name === 'Lid')).toBe(false);

    const signed = items.find((e) => e.action === 'revision.countersigned');
    expect(signed?.actor?.id).toBe(a.checker.id);
    expect(signed?.target.revision).toEqual({ id: countersigned.revisionId, number: 1 });
    expect(signed?.target.component).toMatchObject({ id: countersigned.componentId, name: 'Door' });
    expect(signed?.target.project).toMatchObject({ id: a.projectId, name: 'Test project' });

    const member = items.find((e) => e.action === 'member.set' && e.entityId === a.fabricator.id);
    expect(member?.target.person).toEqual({ id: a.fabricator.id, name: 'Fabricator' });

    const other = await admin.get(`/api/audit?projectId=${b.projectId}&pageSize=100`).expect(200);
    const otherItems = other.body.items as AuditEvent[];
    expect(otherItems.length).toBeGreaterThan(0);
    expect(otherItems.every((e) => e.projectId === b.projectId)).toBe(true);
  });

  it('still reads a code older than the list (stored before it), with no target', async () => {
    await t.dataSource.query(
      `insert into audit_events (id, actor_id, action, entity_type, entity_id, project_id, summary, created_at)
       values (gen_random_uuid(), $1, 'legacy.thing', 'gadget', null, $2, '{}', now())`,
      [a.admin.id, a.projectId],
    );
    const admin = await signIn(t, a.admin);
    const res = await admin.get(`/api/audit?projectId=${a.projectId}&action=legacy.thing`);
    expect(res.status).toBe(200);
    expect(res.body.items).toHaveLength(1);
    expect(res.body.items[0].target).toMatchObject({
      component: null,
      revision: null,
      person: null,
    });
    const csv = await admin.get(`/api/audit.csv?projectId=${a.projectId}&action=legacy.thing`);
    const [, row] = parse(csv.text, { bom: true }) as string[][];
    expect(row?.[2]).toBe('Admin: legacy.thing');
    expect(row?.[4]).toBe('legacy.thing');
  });

  it('exports the filtered log as RFC 4180 CSV with words, codes and ISO dates', async () => {
    const checker = await signIn(t, a.checker);
    const res = await checker.get(`/api/audit.csv?projectId=${a.projectId}`).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?audit-log-PA-[a-z0-9]+-\d{4}-\d{2}-\d{2}\.csv"?$/,
    );
    // RFC 4180 §2: CRLF between records.
    expect(res.text).toContain('\r\n');
    expect(res.text.replace(/\r\n/g, '')).not.toMatch(/\n/);
    const rows = parse(res.text, { bom: true }) as string[][];
    expect(rows[0]).toEqual([
      'When (UTC)',
      'Who',
      'Event',
      'Action',
      'Code',
      'Project',
      'Component',
      'Revision',
      'Record type',
      'Record id',
      'Event id',
    ]);
    const body = rows.slice(1);
    expect(body.every((r) => /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}Z$/.test(r[0]!))).toBe(true);
    expect(body.some((r) => r[6] === 'Lid')).toBe(false);
    const signed = body.find((r) => r[4] === 'revision.countersigned');
    expect(signed?.[2]).toBe('Checker countersigned revision 1 of Door');
    expect(signed?.[3]).toBe('Revision countersigned');
    expect(signed?.[7]).toBe('1');
    expect(signed?.[9]).toBe(countersigned.revisionId);
  });

  it('quotes commas, quotes and line breaks, and defuses cells that start a formula', async () => {
    const w = await makeWorld(t, `PC-${Date.now().toString(36)}`);
    const designer = await signIn(t, w.designer);
    // Names a spreadsheet would run: =, +, - and @ at the start of a cell.
    const evil = await makeUser(t, { name: '@SUM(1+1)*cmd|" /C calc"!A0', isAdmin: true });
    await designer
      .post(`/api/projects/${w.projectId}/components`, {
        name: '=HYPERLINK("http://evil.example","x"), "Door"',
        inputs: plateInputs(),
      })
      .expect(201);
    const admin = await signIn(t, evil);
    const res = await admin.get(`/api/audit.csv?projectId=${w.projectId}`).expect(200);
    const rows = parse(res.text, { bom: true }) as string[][];
    const created = rows.find((r) => r[4] === 'component.created');
    expect(created?.[6]).toBe(`'=HYPERLINK("http://evil.example","x"), "Door"`);
    // The raw text: the cell is quoted and its quotes doubled (RFC 4180 §2.6, §2.7).
    expect(res.text).toContain(`"'=HYPERLINK(""http://evil.example"",""x""), ""Door"""`);
    // The evil admin's sign-in is in the whole log (admins read it without a project).
    const whole = await admin.get('/api/audit.csv?action=session.signed_in').expect(200);
    const wholeRows = parse(whole.text, { bom: true }) as string[][];
    const mine = wholeRows.find((r) => r[1]?.includes('SUM(1+1)'));
    expect(mine?.[1]).toBe(`'@SUM(1+1)*cmd|" /C calc"!A0`);
    // No cell of either export starts a formula.
    for (const r of [...rows, ...wholeRows]) {
      for (const cell of r) expect(cell, cell).not.toMatch(/^[=+\-@\t\r]/);
    }
  });

  it('asks the same permission as the log', async () => {
    await anonymous(t).get(`/api/audit.csv?projectId=${a.projectId}`).expect(401);
    const fabricator = await signIn(t, a.fabricator);
    await fabricator.get(`/api/audit.csv?projectId=${a.projectId}`).expect(403);
    const outsider = await signIn(t, a.outsider);
    await outsider.get(`/api/audit.csv?projectId=${a.projectId}`).expect(404);
    const designer = await signIn(t, a.designer);
    const whole = await designer.get('/api/audit.csv').expect(400);
    expect(whole.body.error.fields).toEqual([expect.objectContaining({ path: 'projectId' })]);
    await designer.get(`/api/audit.csv?projectId=${a.projectId}`).expect(200);
    // Designer of A only: B's log is not theirs.
    await designer.get(`/api/audit.csv?projectId=${b.projectId}`).expect(404);
  });
});
