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

  it('refuses a checker or fabricator who designs nothing (403), and a malformed address (400)', async () => {
    const checker = await signIn(t, w.checker);
    const refused = await checker.get(
      `/api/users/lookup?email=${encodeURIComponent(w.designer.email)}`,
    );
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('not_a_designer');
    const designer = await signIn(t, w.designer);
    const bad = await designer.get('/api/users/lookup?email=not-an-address');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe('email');
  });
});
