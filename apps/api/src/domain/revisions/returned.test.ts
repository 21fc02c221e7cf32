import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { numberedSteps } from '@hoopline/present';
import type { Report } from '@hoopline/calc';
import {
  makeComponent,
  makeUser,
  makeWorld,
  plateInputs,
  signIn,
  snapshot,
  type Session,
  type World,
} from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';

/** Issue 16.1: remarks by trail step on a return, and the designer's "returned to me" list. */
describe('returned work: step remarks and "returned to me" (real PostgreSQL)', () => {
  let t: TestApp;
  let w: World;
  let designer: Session;
  let checker: Session;
  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
    [designer, checker] = await Promise.all([signIn(t, w.designer), signIn(t, w.checker)]);
  });
  afterAll(async () => {
    await t.close();
  });

  const giveBack = (revisionId: string, body: Record<string, unknown>) =>
    checker.post(`/api/revisions/${revisionId}/return`, body);

  const stepCount = async (revisionId: string) => {
    const r = await designer.get(`/api/revisions/${revisionId}`).expect(200);
    return numberedSteps(r.body.report as Report).length;
  };

  it('a return keeps its remarks by step; the revision and the list show them', async () => {
    const c = await makeComponent(t, w, 'submitted', 'Remarked door');
    const steps = await stepCount(c.revisionId);
    expect(steps).toBeGreaterThan(3);
    const res = await giveBack(c.revisionId, {
      hash: c.hash,
      comment: 'See step 3: the allowable stress basis.',
      remarks: [
        { step: 3, text: 'Which allowable stress basis applies here?' },
        { step: steps, text: '  The last step: check the units.  ' },
      ],
    }).expect(200);
    expect(res.body.status).toBe('returned');
    const signOff = res.body.signOffs.at(-1);
    expect(signOff.remarks).toEqual([
      { step: 3, text: 'Which allowable stress basis applies here?' },
      { step: steps, text: 'The last step: check the units.' },
    ]);
    // The designer reads the same from the revision.
    const read = await designer.get(`/api/revisions/${c.revisionId}`).expect(200);
    expect(read.body.signOffs.at(-1).remarks).toHaveLength(2);

    const list = await designer.get('/api/returned').expect(200);
    const item = list.body.items.find(
      (i: { revision: { id: string } }) => i.revision.id === c.revisionId,
    );
    expect(item).toMatchObject({
      project: { id: w.projectId },
      component: { id: c.componentId, name: 'Remarked door', kind: 'circular-plate' },
      revision: { id: c.revisionId, number: 1, status: 'returned' },
      returnedBy: { id: w.checker.id, name: 'Checker' },
      commentExcerpt: 'See step 3: the allowable stress basis.',
      remarkCount: 2,
    });
    expect(item.returnedAt).toBe(signOff.createdAt);

    // The audit event carries the remarks too.
    const [event] = (await t.dataSource.query(
      `select summary from audit_events where entity_id = $1 and action = 'revision.returned'`,
      [c.revisionId],
    )) as { summary: { after: { remarks: unknown[] } } }[];
    expect(event!.summary.after.remarks).toHaveLength(2);
  });

  it('a step the trail does not have is a 400 naming remarks.N.step, and nothing is written', async () => {
    const c = await makeComponent(t, w, 'submitted', 'Unknown step');
    const steps = await stepCount(c.revisionId);
    const before = await snapshot(t);
    const res = await giveBack(c.revisionId, {
      hash: c.hash,
      comment: 'Two remarks, one wrong',
      remarks: [
        { step: 1, text: 'fine' },
        { step: steps + 1, text: 'no such step' },
      ],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields).toEqual([
      { path: 'remarks.1.step', message: expect.stringContaining(`1 to ${steps}`) },
    ]);
    expect(await snapshot(t)).toEqual(before);
    const still = await designer.get(`/api/revisions/${c.revisionId}`).expect(200);
    expect(still.body.status).toBe('submitted');
  });

  it('remarks of the wrong shape are field errors from the contract', async () => {
    const c = await makeComponent(t, w, 'submitted', 'Bad shapes');
    const res = await giveBack(c.revisionId, {
      hash: c.hash,
      comment: 'x',
      remarks: [
        { step: 'four', text: 'a' },
        { step: 2, text: '   ' },
        { step: 0.5, text: 'b' },
      ],
    });
    expect(res.status).toBe(400);
    const paths = res.body.error.fields.map((f: { path: string }) => f.path).sort();
    expect(paths).toEqual(['remarks.0.step', 'remarks.1.text', 'remarks.2.step']);
    const tooMany = await giveBack(c.revisionId, {
      hash: c.hash,
      comment: 'x',
      remarks: Array.from({ length: 51 }, () => ({ step: 1, text: 'a' })),
    });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.fields[0].path).toBe('remarks');
    const long = await giveBack(c.revisionId, {
      hash: c.hash,
      comment: 'x',
      remarks: [{ step: 1, text: 'a'.repeat(2001) }],
    });
    expect(long.body.error.fields).toEqual([
      { path: 'remarks.0.text', message: 'must be at most 2000 characters' },
    ]);
  });

  it('a newer revision takes it off the list; the comment is cut to an excerpt', async () => {
    const c = await makeComponent(t, w, 'submitted', 'Superseded return');
    const long = `Step 2 is wrong. ${'x'.repeat(300)}`;
    await giveBack(c.revisionId, { hash: c.hash, comment: long }).expect(200);
    const listed = await designer.get('/api/returned?pageSize=100').expect(200);
    const item = listed.body.items.find(
      (i: { revision: { id: string } }) => i.revision.id === c.revisionId,
    );
    expect(item.remarkCount).toBe(0);
    expect(Array.from(item.commentExcerpt as string)).toHaveLength(201);
    expect(item.commentExcerpt.endsWith('…')).toBe(true);
    expect(long.startsWith(item.commentExcerpt.slice(0, -1))).toBe(true);

    const component = await designer.get(`/api/components/${c.componentId}`).expect(200);
    await designer
      .post(`/api/components/${c.componentId}/revisions`, {
        inputs: plateInputs('14 mm'),
        baseVersion: component.body.version,
      })
      .expect(201);
    const after = await designer.get('/api/returned?pageSize=100').expect(200);
    expect(after.body.items.map((i: { revision: { id: string } }) => i.revision.id)).not.toContain(
      c.revisionId,
    );
  });

  it('another person’s returned revision does not show; who designs nowhere is refused', async () => {
    const other = await makeUser(t, { name: 'Second Designer' });
    await t.services.projects.setMember(w.admin, w.projectId, other.id, 'designer');
    const created = await t.services.components.create(other, w.projectId, {
      name: 'Theirs',
      inputs: plateInputs(),
    });
    await t.services.revisions.submit(other, created.revision.id);
    await t.services.revisions.decide(w.checker, created.revision.id, 'returned', {
      hash: created.revision.contentHash,
      comment: 'theirs',
    });
    const mine = await designer.get('/api/returned?pageSize=100').expect(200);
    const ids = mine.body.items.map((i: { revision: { id: string } }) => i.revision.id);
    expect(ids).not.toContain(created.revision.id);
    const theirs = await (await signIn(t, other)).get('/api/returned').expect(200);
    expect(theirs.body.items.map((i: { revision: { id: string } }) => i.revision.id)).toEqual([
      created.revision.id,
    ]);

    const refused = await checker.get('/api/returned');
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('not_a_designer');
  });

  it('pages newest return first, with the total; a bad page is a field error', async () => {
    const own = await makeWorld(t);
    const session = await signIn(t, own.designer);
    const made: string[] = [];
    for (const name of ['First', 'Second', 'Third']) {
      const c = await makeComponent(t, own, 'returned', name);
      made.push(c.revisionId);
    }
    const first = await session.get('/api/returned?page=1&pageSize=2').expect(200);
    expect(first.body).toMatchObject({ page: 1, pageSize: 2, total: 3 });
    expect(first.body.items.map((i: { revision: { id: string } }) => i.revision.id)).toEqual([
      made[2],
      made[1],
    ]);
    const second = await session.get('/api/returned?page=2&pageSize=2').expect(200);
    expect(second.body.items.map((i: { revision: { id: string } }) => i.revision.id)).toEqual([
      made[0],
    ]);
    expect(second.body.total).toBe(3);
    const past = await session.get('/api/returned?page=5&pageSize=2').expect(200);
    expect(past.body).toMatchObject({ items: [], total: 3 });

    for (const query of ['page=0', 'page=abc', 'pageSize=101', 'sort=name']) {
      const bad = await session.get(`/api/returned?${query}`);
      expect(bad.status).toBe(400);
      expect(bad.body.error.code).toBe('validation_failed');
    }
    const bad = await session.get('/api/returned?page=-1');
    expect(bad.body.error.fields).toEqual([{ path: 'page', message: 'must be at least 1' }]);
  });
});
