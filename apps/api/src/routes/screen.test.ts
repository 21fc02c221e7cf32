import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { screen } from '@hoopline/calc';
import {
  anonymous,
  makeUser,
  plateInputs,
  signIn,
  snapshot,
  type Session,
} from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

describe('POST /api/screen (stateless)', () => {
  let t: TestApp;
  let s: Session;
  beforeAll(async () => {
    t = await startTestApp();
    s = await signIn(t, await makeUser(t));
  });
  afterAll(async () => {
    await t.close();
  });

  it('requires sign-in', async () => {
    await anonymous(t).post('/api/screen', plateInputs()).expect(401);
  });

  it('answers the engine’s report for one case and saves nothing', async () => {
    const before = await snapshot(t);
    const res = await s.post('/api/screen', plateInputs()).expect(200);
    expect(res.body).toEqual(JSON.parse(JSON.stringify(screen(plateInputs()))));
    expect(await snapshot(t)).toEqual(before);
  });

  it('screens a batch: each case its report or its issues, in order', async () => {
    const res = await s
      .post('/api/screen', { cases: [plateInputs(), { ...plateInputs(), edge: 'glued' }] })
      .expect(200);
    expect(res.body.results).toHaveLength(2);
    expect(res.body.results[0].ok).toBe(true);
    expect(res.body.results[0].report.kind).toBe('circular-plate');
    expect(res.body.results[1].ok).toBe(false);
    expect(res.body.results[1].issues.map((i: { path: string }) => i.path)).toEqual(['edge']);
  });

  it('a bad single case is 400 with the calc’s field paths', async () => {
    const res = await s.post('/api/screen', { ...plateInputs(), thickness: '0 mm' }).expect(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual(['thickness']);
    const notObject = await s.post('/api/screen', [plateInputs()]).expect(400);
    expect(notObject.body.error.code).toBe('validation_failed');
  });
});
