import { randomUUID } from 'node:crypto';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, signIn, type Session, type TestUser } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

// Integration tests (real PostgreSQL): what the API does with access tokens
// that are signed right but carry the wrong claims, and that a session which
// ended (sign-out, reuse) stops reading at once, not when the token expires.

function cookieOf(session: Session, name: string, path: string): string {
  const jar = (
    session.agent as unknown as {
      jar: { getCookie(name: string, access: unknown): { value: string } | undefined };
    }
  ).jar;
  const found = jar.getCookie(name, { domain: '127.0.0.1', path, secure: false, script: false });
  if (!found) throw new Error(`no ${name} cookie in the jar`);
  return found.value;
}
const accessOf = (session: Session) => cookieOf(session, 'hl_access', '/api');

describe('access tokens at the API', () => {
  let t: TestApp;
  let user: TestUser;
  beforeAll(async () => {
    t = await startTestApp();
    user = await makeUser(t);
  });
  afterAll(async () => {
    await t.close();
  });

  const me = (token: string) =>
    request(t.server).get('/api/me').set('cookie', `hl_access=${token}`);

  async function liveFamily(): Promise<string> {
    const s = await signIn(t, user);
    const payload = jwt.decode(accessOf(s)) as { sid: string };
    return payload.sid;
  }

  it('a correctly signed token without exp is refused (401), with exp it is read', async () => {
    const sid = await liveFamily();
    const claims = { epoch: 0, sid };
    const options = { subject: user.id, audience: 'hoopline-api' } as const;
    const forever = jwt.sign(claims, t.config.auth.jwtSecret, options);
    expect((jwt.decode(forever) as { exp?: number }).exp).toBeUndefined();
    const res = await me(forever);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthorized');
    const timed = jwt.sign(claims, t.config.auth.jwtSecret, { ...options, expiresIn: 60 });
    await me(timed).expect(200);
  });

  it('a correctly signed token whose sub is not a UUID is 401, not 500', async () => {
    const sid = await liveFamily();
    for (const sub of ['not-a-uuid', "1' or '1'='1", '00000000-0000-0000-0000-00000000000']) {
      const token = jwt.sign({ epoch: 0, sid }, t.config.auth.jwtSecret, {
        subject: sub,
        audience: 'hoopline-api',
        expiresIn: 60,
      });
      const res = await me(token);
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthorized');
    }
  });

  it('alg none, HS512 with the right secret, and a wrong secret are refused (401)', async () => {
    const sid = await liveFamily();
    const payload = { epoch: 0, sid, sub: user.id, aud: 'hoopline-api' };
    const exp = { expiresIn: 60 } as const;
    const tokens = [
      jwt.sign(payload, '', { algorithm: 'none', ...exp }),
      jwt.sign(payload, t.config.auth.jwtSecret, { algorithm: 'HS512', ...exp }),
      jwt.sign(payload, 'x'.repeat(48), { algorithm: 'HS256', ...exp }),
    ];
    for (const token of tokens) {
      const res = await me(token);
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthorized');
    }
    // The same claims with our algorithm and secret are read.
    await me(jwt.sign(payload, t.config.auth.jwtSecret, { algorithm: 'HS256', ...exp })).expect(
      200,
    );
  });

  it('a token of a session that never existed is refused', async () => {
    const token = jwt.sign({ epoch: 0, sid: randomUUID() }, t.config.auth.jwtSecret, {
      subject: user.id,
      audience: 'hoopline-api',
      expiresIn: 60,
    });
    await me(token).expect(401);
  });
});

describe('sign-out ends the session at once (issue 17.6)', () => {
  let t: TestApp;
  let user: TestUser;
  beforeAll(async () => {
    t = await startTestApp({ HOOPLINE_ACCESS_TOKEN_TTL: '900' });
    user = await makeUser(t);
  });
  afterAll(async () => {
    await t.close();
  });

  it('the old access cookie no longer reads GET /api/me after sign-out; other sessions go on', async () => {
    const leaving = await signIn(t, user);
    const staying = await signIn(t, user);
    const old = accessOf(leaving);
    await request(t.server).get('/api/me').set('cookie', `hl_access=${old}`).expect(200);
    await leaving.post('/api/auth/sign-out').expect(204);
    const after = await request(t.server).get('/api/me').set('cookie', `hl_access=${old}`);
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe('unauthorized');
    // Sensitive reads too, not only /me.
    await request(t.server).get('/api/projects').set('cookie', `hl_access=${old}`).expect(401);
    await staying.get('/api/me').expect(200);
  });

  it('a reused refresh token ends the access tokens of its family at once', async () => {
    const s = await signIn(t, user);
    const spent = cookieOf(s, 'hl_refresh', '/api/auth');
    s.absorb(await s.post('/api/auth/refresh').expect(200));
    const current = accessOf(s);
    await request(t.server).get('/api/me').set('cookie', `hl_access=${current}`).expect(200);
    // The spent token comes back after the grace: the family is revoked.
    await t.dataSource.query(
      `update refresh_tokens set revoked_at = now() - interval '1 minute' where revoked_reason = 'rotated'`,
    );
    const reuse = await request(t.server)
      .post('/api/auth/refresh')
      .set('cookie', `hl_refresh=${spent}; hl_csrf=c`)
      .set('x-csrf-token', 'c')
      .send({});
    expect(reuse.body.error.code).toBe('refresh_reused');
    await request(t.server).get('/api/me').set('cookie', `hl_access=${current}`).expect(401);
  });
});
