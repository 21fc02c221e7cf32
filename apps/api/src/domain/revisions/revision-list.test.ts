import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeComponent, makeWorld, plateInputs, signIn, type World } from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';

// Integration tests (real PostgreSQL) of the two list queries issue 12 made
// one round trip each: the totals and pages are right for every viewer.

describe('revision and component lists', () => {
  let t: TestApp;
  let w: World;
  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
  });
  afterAll(async () => {
    await t.close();
  });

  it('a revision list pages a long history with its total; a fabricator sees the countersigned only', async () => {
    const c = await makeComponent(t, w, 'countersigned');
    const [component] = await t.dataSource.query<{ version: number }[]>(
      'select version from components where id = $1',
      [c.componentId],
    );
    let version = component!.version;
    for (let i = 0; i < 6; i += 1) {
      const next = await t.services.revisions.create(w.designer, c.componentId, {
        inputs: plateInputs(`${13 + i} mm`),
        baseVersion: version,
      });
      version = next.component.version;
    }
    const designer = await signIn(t, w.designer);
    const url = `/api/components/${c.componentId}/revisions`;
    const first = await designer.get(`${url}?pageSize=3`).expect(200);
    expect(first.body.total).toBe(7);
    expect(first.body.items.map((r: { number: number }) => r.number)).toEqual([7, 6, 5]);
    const last = await designer.get(`${url}?pageSize=3&page=3`).expect(200);
    expect(last.body.items.map((r: { number: number }) => r.number)).toEqual([1]);
    expect(last.body.total).toBe(7);
    const beyond = await designer.get(`${url}?pageSize=3&page=9`).expect(200);
    expect(beyond.body).toMatchObject({ items: [], total: 7, page: 9 });
    const [counted] = await t.dataSource.query<{ n: number }[]>(
      'select count(*)::int as n from revisions where component_id = $1',
      [c.componentId],
    );
    expect(counted!.n).toBe(7);
    const fabricator = await signIn(t, w.fabricator);
    const issued = await fabricator.get(url).expect(200);
    expect(issued.body.total).toBe(1);
    expect(
      issued.body.items.map((r: { number: number; status: string }) => [r.number, r.status]),
    ).toEqual([[1, 'countersigned']]);
  });

  it('a component list carries each one’s latest and issued revision; a fabricator sees issued ones as latest', async () => {
    const checked = await makeComponent(t, w, 'countersigned', 'AAA checked');
    const draft = await makeComponent(t, w, 'draft', 'AAB draft');
    const designer = await signIn(t, w.designer);
    const list = await designer.get(`/api/projects/${w.projectId}/components?q=AA`).expect(200);
    expect(list.body.total).toBe(2);
    const [a, b] = list.body.items as Array<{
      id: string;
      latestRevision: { id: string; status: string } | null;
      issuedRevision: { id: string } | null;
    }>;
    expect(a!.id).toBe(checked.componentId);
    expect(a!.latestRevision?.id).toBe(checked.revisionId);
    expect(a!.issuedRevision?.id).toBe(checked.revisionId);
    expect(b!.id).toBe(draft.componentId);
    expect(b!.latestRevision?.status).toBe('draft');
    expect(b!.issuedRevision).toBeNull();
    const fabricator = await signIn(t, w.fabricator);
    const seen = await fabricator.get(`/api/projects/${w.projectId}/components?q=AA`).expect(200);
    expect(seen.body.total).toBe(1);
    expect(seen.body.items[0].latestRevision.id).toBe(checked.revisionId);
    const past = await designer
      .get(`/api/projects/${w.projectId}/components?q=AA&page=5`)
      .expect(200);
    expect(past.body).toMatchObject({ items: [], total: 2 });
  });
});
