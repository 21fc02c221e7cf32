import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymous, makeUser, makeWorld, signIn, type World } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

describe('GET /api/users/lookup (find one person to add to a project)', () => {
  let t: TestApp;
  let w: World;
  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
  });
  afterAll(async () => {
    await t.close();
  });

  it('requires sign-in', async () => {
    await anonymous(t).get('/api/users/lookup?email=a@b.example').expect(401);
  });

  it('finds an active person by the exact address, case-insensitively, and says no more', async () => {
    const designer = await signIn(t, w.designer);
    const colleague = await makeUser(t, { name: 'Colleague', email: 'colleague@lab.example' });
    const res = await designer.get('/api/users/lookup?email=Colleague@Lab.example').expect(200);
    expect(res.body).toEqual({
      user: { id: colleague.id, name: 'Colleague', email: 'colleague@lab.example' },
    });
  });

  it('answers 404 for an unknown, a partial or an inactive address', async () => {
    const designer = await signIn(t, w.designer);
    const gone = await makeUser(t, { email: 'gone@lab.example' });
    await t.dataSource.query('update users set active = false where id = $1', [gone.id]);
    for (const email of ['nobody@lab.example', 'colleague@lab', 'gone@lab.example']) {
      const res = await designer.get(`/api/users/lookup?email=${encodeURIComponent(email)}`);
      expect(res.status, email).toBe(email === 'colleague@lab' ? 400 : 404);
    }
  });

  it('answers a person who may not look people up the same for a known and an unknown address', async () => {
    for (const who of [w.checker, w.fabricator, w.outsider]) {
      const s = await signIn(t, who);
      const known = await s.get(`/api/users/lookup?email=${encodeURIComponent(w.designer.email)}`);
      const unknown = await s.get('/api/users/lookup?email=nobody.at.all%40lab.example');
      expect(known.status).toBe(403);
      expect({ status: unknown.status, body: unknown.body }).toEqual({
        status: known.status,
        body: known.body,
      });
    }
  });

  it('an account alone no longer makes one a designer: with "named", an outsider cannot start a project to look people up', async () => {
    const outsider = await signIn(t, w.outsider);
    const start = await outsider.post('/api/projects', {
      number: 'OUT-1',
      name: 'Probe',
      unitSystem: 'si',
    });
    expect(start.status).toBe(403);
    expect(start.body.error.code).toBe('not_a_project_starter');
    await outsider.get(`/api/users/lookup?email=${encodeURIComponent(w.admin.email)}`).expect(403);
    // The administrator opens project starting to everyone: then the outsider may.
    const admin = await signIn(t, w.admin);
    await admin.patch('/api/settings', { projectCreation: 'everyone' }).expect(200);
    await outsider
      .post('/api/projects', { number: 'OUT-2', name: 'Own', unitSystem: 'si' })
      .expect(201);
    await outsider.get(`/api/users/lookup?email=${encodeURIComponent(w.admin.email)}`).expect(200);
    // And back to named people; the admin names someone on the People page (PATCH /users/:id).
    await admin.patch('/api/settings', { projectCreation: 'named' }).expect(200);
    const fabricator = await signIn(t, w.fabricator);
    await fabricator
      .post('/api/projects', { number: 'FAB-1', name: 'x', unitSystem: 'si' })
      .expect(403);
    const named = await admin.patch(`/api/users/${w.fabricator.id}`, { mayCreateProjects: true });
    expect(named.body.mayCreateProjects).toBe(true);
    const me = await fabricator.get('/api/me').expect(200);
    expect(me.body.canCreateProjects).toBe(true);
    await fabricator
      .post('/api/projects', { number: 'FAB-2', name: 'x', unitSystem: 'si' })
      .expect(201);
    const events = await t.dataSource.query(
      `select summary from audit_events where action = 'settings.updated' order by created_at`,
    );
    expect(events.map((e: { summary: { after: unknown } }) => e.summary.after)).toEqual([
      { projectCreation: 'everyone' },
      { projectCreation: 'named' },
    ]);
  });

  it('refuses a checker or fabricator who designs nothing (403), and a malformed address (400)', async () => {
    const checker = await signIn(t, w.checker);
    const refused = await checker.get(
      `/api/users/lookup?email=${encodeURIComponent(w.designer.email)}`,
    );
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('not_a_project_owner');
    const designer = await signIn(t, w.designer);
    const bad = await designer.get('/api/users/lookup?email=not-an-address');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe('email');
  });
});
