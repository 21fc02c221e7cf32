import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ENGINE_VERSION } from '@hoopline/calc';
import { startTestApp, type TestApp } from '../../test/test-app';

describe('GET /api/health (real PostgreSQL)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('reports the database reachable once migrations have run', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.body.status).toBe('ok');
    expect(res.body.database.reachable).toBe(true);
    expect(res.body.engine.version).toBe(ENGINE_VERSION);
    const rows: Array<{ count: string }> = await t.dataSource.query(
      'select count(*)::text as count from deployment',
    );
    expect(rows[0]?.count).toBe('1');
  });

  it('reports 503 when the database is unreachable', async () => {
    const other = await startTestApp();
    await other.dataSource.destroy();
    const res = await request(other.app).get('/api/health').expect(503);
    expect(res.body.database).toMatchObject({ reachable: false, detail: 'database unavailable' });
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    expect(JSON.stringify(res.body)).not.toMatch(/password|hoopline:hoopline/);
    await other.dataSource.initialize();
    await other.close();
  });

  it('answers a route that needs the database with 503 database_unavailable and Retry-After, not a 500', async () => {
    const other = await startTestApp();
    await other.dataSource.destroy();
    const res = await request(other.app)
      .post('/api/auth/sign-in')
      .send({ email: 'someone@lab.example', password: 'whatever it is' });
    expect(res.status).toBe(503);
    expect(res.body.error).toMatchObject({ code: 'database_unavailable', retryAfterSeconds: 5 });
    expect(res.headers['retry-after']).toBe('5');
    expect(JSON.stringify(res.body)).not.toMatch(/stack|pool|at /);
    await other.dataSource.initialize();
    await other.close();
  });

  it('answers unknown API routes with a JSON 404', async () => {
    const res = await request(t.app).get('/api/nowhere').expect(404);
    expect(res.body).toEqual({
      error: { code: 'route_not_found', message: 'no route for GET /api/nowhere' },
    });
  });

  it('answers malformed JSON with a 400 in the error format', async () => {
    const res = await request(t.app)
      .post('/api/health')
      .set('content-type', 'application/json')
      .send('{"not json');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_json');
  });

  it('sets security headers (helmet)', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  });
});
