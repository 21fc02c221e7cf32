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

  it('screens a CSV table (dotted headers, one component per row), naming each row', async () => {
    const csv = [
      'kind,diameter,thickness,edge,material,loadCases.0.name,loadCases.0.internal',
      'circular-plate,500 mm,12 mm,clamped,stainless-304,Full vacuum,full vacuum',
      'circular-plate,500 mm,12 mm,glued,stainless-304,Full vacuum,full vacuum',
    ].join('\r\n');
    const res = await s.post('/api/screen').set('content-type', 'text/csv').send(csv).expect(200);
    expect(res.body.results.map((r: { row: number; ok: boolean }) => [r.row, r.ok])).toEqual([
      [2, true],
      [3, false],
    ]);
    // The CSV row and the same input as JSON give the same report.
    const json = screen({
      kind: 'circular-plate',
      diameter: '500 mm',
      thickness: '12 mm',
      edge: 'clamped',
      material: 'stainless-304',
      loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    });
    expect(res.body.results[0].report).toEqual(JSON.parse(JSON.stringify(json)));
    expect(res.body.results[1].issues.map((i: { path: string }) => i.path)).toEqual(['edge']);
  });

  it('refuses a CSV table it cannot read, naming where, and writes nothing', async () => {
    const before = await snapshot(t);
    const broken = await s
      .post('/api/screen')
      .set('content-type', 'text/csv')
      .send('kind,thickness\n"circular-plate,12 mm\n')
      .expect(400);
    expect(broken.body.error.code).toBe('validation_failed');
    const empty = await s
      .post('/api/screen')
      .set('content-type', 'text/csv')
      .send('kind,thickness\n')
      .expect(400);
    expect(empty.body.error.fields).toEqual([{ path: 'csv', message: 'has no component rows' }]);
    expect(await snapshot(t)).toEqual(before);
  });
});
