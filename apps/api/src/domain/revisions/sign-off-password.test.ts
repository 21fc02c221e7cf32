import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  count,
  makeComponent,
  makeUser,
  makeWorld,
  signIn,
  snapshot,
  type Session,
  type World,
} from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';
import { SIGN_OFF_ATTEMPTS, SIGN_OFF_ATTEMPT_WINDOW_S } from './revisions.service';

/**
 * Issue 16.2: a project may ask its checkers for their password again to
 * countersign or return. The check runs before the sign-off's transaction;
 * a wrong password is audited on its own and changes nothing else.
 */
describe('sign-off with the password typed again (real PostgreSQL)', () => {
  let t: TestApp;
  let w: World;
  let owner: Session;
  let checker: Session;
  let checker2: Session;
  let admin: Session;
  const P = () => `/api/projects/${w.projectId}`;

  async function setSetting(s: Session, on: boolean, status?: number) {
    const current = await t.services.projects.get(w.admin, w.projectId);
    const res = await s.patch(P(), { signOffPassword: on, version: current.version });
    if (status !== undefined) expect(res.status, JSON.stringify(res.body)).toBe(status);
    return res;
  }
  const statusOf = async (revisionId: string) =>
    (
      (await t.dataSource.query('select status from revisions where id = $1', [revisionId])) as {
        status: string;
      }[]
    )[0]?.status;
  const refusals = (revisionId: string) =>
    count(
      t,
      `audit_events where action = 'revision.sign_off_refused' and entity_id = '${revisionId}'`,
    );

  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
    [owner, checker, checker2, admin] = await Promise.all([
      signIn(t, w.designer),
      signIn(t, w.checker),
      signIn(t, w.checker2),
      signIn(t, w.admin),
    ]);
  });
  afterAll(async () => {
    await t.close();
  });

  it('is off by default: a countersign needs no password, and a password sent is not looked at', async () => {
    expect((await owner.get(P()).expect(200)).body.signOffPassword).toBe(false);
    const c = await makeComponent(t, w, 'submitted');
    const res = await checker
      .post(`/api/revisions/${c.revisionId}/countersign`, { hash: c.hash, password: 'not it' })
      .expect(200);
    expect(res.body.status).toBe('countersigned');
    expect(await refusals(c.revisionId)).toBe(0);
  });

  it('only the owner or an administrator turns it on or off; another designer edits the rest', async () => {
    const second = await makeUser(t, { name: 'Second Designer' });
    await t.services.projects.setMember(w.admin, w.projectId, second.id, 'designer');
    const secondSession = await signIn(t, second);
    const before = await snapshot(t);
    const refused = await setSetting(secondSession, true);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('not_the_owner');
    expect(refused.body.error.message).toMatch(/asks for the password/);
    expect(await snapshot(t)).toEqual(before);
    // Sending the value it already has is no change, so the rest of a form saves.
    const current = await t.services.projects.get(w.admin, w.projectId);
    await secondSession
      .patch(P(), {
        notes: 'second designer was here',
        signOffPassword: false,
        version: current.version,
      })
      .expect(200);
    // A checker edits no project at all.
    expect((await setSetting(checker, true)).status).toBe(403);
    // The administrator may; so may the owner (who started the project).
    expect((await setSetting(admin, true, 200)).body.signOffPassword).toBe(true);
    expect((await setSetting(owner, false, 200)).body.signOffPassword).toBe(false);
    const on = await setSetting(owner, true, 200);
    expect(on.body.signOffPassword).toBe(true);
    const [event] = (await t.dataSource.query(
      `select summary from audit_events where action = 'project.updated' and entity_id = $1
        order by created_at desc limit 1`,
      [w.projectId],
    )) as { summary: Record<string, { signOffPassword: boolean }> }[];
    expect(event?.summary).toMatchObject({
      before: { signOffPassword: false },
      after: { signOffPassword: true },
    });
    expect((await setSetting(owner, 'yes' as unknown as boolean)).body.error.fields).toEqual([
      { path: 'signOffPassword', message: 'must be true or false' },
    ]);
  });

  it('on: a sign-off without the password is 400 naming the field, and changes nothing', async () => {
    await setSetting(owner, true, 200);
    const c = await makeComponent(t, w, 'submitted');
    const before = await snapshot(t);
    const res = await checker.post(`/api/revisions/${c.revisionId}/countersign`, { hash: c.hash });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('password_required');
    expect(res.body.error.fields).toEqual([
      { path: 'password', message: expect.stringMatching(/^is required/) },
    ]);
    const empty = await checker.post(`/api/revisions/${c.revisionId}/return`, {
      hash: c.hash,
      comment: 'redo step 4',
      password: '',
    });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields).toEqual([{ path: 'password', message: 'is required' }]);
    expect(await snapshot(t)).toEqual(before);
    expect(await statusOf(c.revisionId)).toBe('submitted');
  });

  it('on: a wrong password is 403 naming the field, audited in its own event, the revision unchanged', async () => {
    await setSetting(owner, true, 200);
    const c = await makeComponent(t, w, 'submitted');
    const signOffsBefore = await count(t, `sign_offs where revision_id = '${c.revisionId}'`);
    const outboxBefore = await count(t, 'mail_outbox');
    for (const [action, body] of [
      ['countersign', { hash: c.hash, password: `${w.checker.password}!` }],
      ['return', { hash: c.hash, comment: 'redo', password: 'guess' }],
    ] as const) {
      const res = await checker.post(`/api/revisions/${c.revisionId}/${action}`, body);
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('wrong_password');
      expect(res.body.error.message).toMatch(/nothing was signed/);
      expect(res.body.error.fields).toEqual([{ path: 'password', message: 'is wrong' }]);
    }
    expect(await statusOf(c.revisionId)).toBe('submitted');
    expect(await count(t, `sign_offs where revision_id = '${c.revisionId}'`)).toBe(signOffsBefore);
    expect(await count(t, 'mail_outbox')).toBe(outboxBefore);
    const events = (await t.dataSource.query(
      `select actor_id, project_id, summary -> 'after' as after from audit_events
        where action = 'revision.sign_off_refused' and entity_id = $1 order by created_at`,
      [c.revisionId],
    )) as { actor_id: string; project_id: string; after: Record<string, unknown> }[];
    expect(events).toHaveLength(2);
    expect(events[0]).toMatchObject({
      actor_id: w.checker.id,
      project_id: w.projectId,
      after: { decision: 'countersigned', reason: 'wrong_password', number: 1 },
    });
    expect(events[1]?.after).toMatchObject({ decision: 'returned' });
    // The password is not written anywhere in the event.
    expect(JSON.stringify(events)).not.toContain('guess');
    // The project's audit log tells it in words.
    const log = await owner.get(`/api/audit?projectId=${w.projectId}`).expect(200);
    expect(
      log.body.items.some((e: { action: string }) => e.action === 'revision.sign_off_refused'),
    ).toBe(true);
  });

  it('on: the right password countersigns, and returns', async () => {
    await setSetting(owner, true, 200);
    const c = await makeComponent(t, w, 'submitted');
    const signed = await checker
      .post(`/api/revisions/${c.revisionId}/countersign`, {
        hash: c.hash,
        password: w.checker.password,
      })
      .expect(200);
    expect(signed.body.status).toBe('countersigned');
    expect(signed.body.signOffs).toHaveLength(1);
    expect(await refusals(c.revisionId)).toBe(0);
    const r = await makeComponent(t, w, 'submitted');
    const returned = await checker2
      .post(`/api/revisions/${r.revisionId}/return`, {
        hash: r.hash,
        comment: 'Check step 4 again.',
        password: w.checker2.password,
      })
      .expect(200);
    expect(returned.body.status).toBe('returned');
  });

  it('checks the acting user’s own hash: another person’s password is refused', async () => {
    await setSetting(owner, true, 200);
    const distinct = await makeUser(t, {
      name: 'Checker Three',
      password: 'a different passphrase 42',
    });
    await t.services.projects.setMember(w.admin, w.projectId, distinct.id, 'checker');
    const s = await signIn(t, distinct);
    const c = await makeComponent(t, w, 'submitted');
    const refused = await s.post(`/api/revisions/${c.revisionId}/countersign`, {
      hash: c.hash,
      password: w.checker.password,
    });
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('wrong_password');
    expect(await statusOf(c.revisionId)).toBe('submitted');
    await s
      .post(`/api/revisions/${c.revisionId}/countersign`, {
        hash: c.hash,
        password: 'a different passphrase 42',
      })
      .expect(200);
  });

  it(`on: after ${SIGN_OFF_ATTEMPTS} wrong passwords in ${SIGN_OFF_ATTEMPT_WINDOW_S / 60} minutes no more are tried, not even the right one`, async () => {
    await setSetting(owner, true, 200);
    const guesser = await makeUser(t, { name: 'Guessing checker', password: 'the right one 123' });
    await t.services.projects.setMember(w.admin, w.projectId, guesser.id, 'checker');
    const s = await signIn(t, guesser);
    const c = await makeComponent(t, w, 'submitted');
    const attempt = (password: string) =>
      s.post(`/api/revisions/${c.revisionId}/countersign`, { hash: c.hash, password });
    for (let i = 0; i < SIGN_OFF_ATTEMPTS; i++) {
      expect((await attempt(`guess ${i}`)).status).toBe(403);
    }
    const stopped = await attempt('the right one 123');
    expect(stopped.status).toBe(429);
    expect(stopped.body.error.code).toBe('too_many_attempts');
    expect(stopped.body.error.fields).toEqual([
      { path: 'password', message: expect.stringMatching(/^was wrong 5 times in 15 minutes/) },
    ]);
    expect(await statusOf(c.revisionId)).toBe('submitted');
    // Only the wrong ones were audited (the stopped attempt was not tried).
    expect(
      await count(
        t,
        `audit_events where action = 'revision.sign_off_refused' and actor_id = '${guesser.id}'`,
      ),
    ).toBe(SIGN_OFF_ATTEMPTS);
    // Once they are older than the window, the right password signs.
    await t.dataSource.query(
      `update audit_events set created_at = created_at - interval '16 minutes'
        where action = 'revision.sign_off_refused' and actor_id = $1`,
      [guesser.id],
    );
    expect((await attempt('the right one 123')).status).toBe(200);
  });

  it(`on: ${SIGN_OFF_ATTEMPTS * 2} wrong passwords sent at once: no more than ${SIGN_OFF_ATTEMPTS} are tried, the rest are stopped`, async () => {
    await setSetting(owner, true, 200);
    const guesser = await makeUser(t, { name: 'Parallel guesser', password: 'the right one 456' });
    await t.services.projects.setMember(w.admin, w.projectId, guesser.id, 'checker');
    const s = await signIn(t, guesser);
    const c = await makeComponent(t, w, 'submitted');
    const answers = await Promise.all(
      Array.from({ length: SIGN_OFF_ATTEMPTS * 2 }, (_, i) =>
        s.post(`/api/revisions/${c.revisionId}/countersign`, {
          hash: c.hash,
          password: `parallel guess ${i}`,
        }),
      ),
    );
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses.filter((x) => x === 403)).toHaveLength(SIGN_OFF_ATTEMPTS);
    expect(statuses.filter((x) => x === 429)).toHaveLength(SIGN_OFF_ATTEMPTS);
    expect(
      await count(
        t,
        `audit_events where action = 'revision.sign_off_refused' and actor_id = '${guesser.id}'`,
      ),
    ).toBe(SIGN_OFF_ATTEMPTS);
    expect(await statusOf(c.revisionId)).toBe('submitted');
  });

  it('on: who may not sign is refused by the policy first, password or not, and nothing is audited', async () => {
    await setSetting(owner, true, 200);
    const c = await makeComponent(t, w, 'submitted');
    const asDesigner = await owner.post(`/api/revisions/${c.revisionId}/countersign`, {
      hash: c.hash,
      password: 'wrong',
    });
    expect(asDesigner.status).toBe(403);
    expect(asDesigner.body.error.code).toBe('not_a_checker');
    const asAdmin = await admin.post(`/api/revisions/${c.revisionId}/countersign`, {
      hash: c.hash,
    });
    expect(asAdmin.status).toBe(403);
    expect(asAdmin.body.error.code).toBe('admin_cannot_sign');
    expect(await refusals(c.revisionId)).toBe(0);
  });

  it('on: the service refuses a sign-off without the password too (a caller other than the route)', async () => {
    await setSetting(owner, true, 200);
    const c = await makeComponent(t, w, 'submitted');
    await expect(
      t.services.revisions.decide(w.checker, c.revisionId, 'countersigned', { hash: c.hash }),
    ).rejects.toMatchObject({ status: 400, code: 'password_required' });
    expect(await statusOf(c.revisionId)).toBe('submitted');
    await setSetting(owner, false, 200);
  });
});
