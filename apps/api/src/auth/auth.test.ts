import jwt from 'jsonwebtoken';
import request from 'supertest';
import { backgroundSettled } from '../http/background-work';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymous, count, makeUser, signIn, type TestUser } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

function cookies(res: { headers: Record<string, unknown> }): string[] {
  return (res.headers['set-cookie'] as string[] | undefined) ?? [];
}
function cookie(res: { headers: Record<string, unknown> }, name: string): string | undefined {
  return cookies(res).find((c) => c.startsWith(`${name}=`));
}
function valueOf(setCookie: string | undefined): string {
  return decodeURIComponent(setCookie?.split(';')[0]?.split('=').slice(1).join('=') ?? '');
}

describe('auth: sign-in, refresh, sign-out (real PostgreSQL)', () => {
  let t: TestApp;
  let user: TestUser;
  beforeAll(async () => {
    t = await startTestApp();
    user = await makeUser(t, { name: 'Dana' });
  });
  afterAll(async () => {
    await t.close();
  });

  it('signs in with the right password and sets the three cookies as API.md says', async () => {
    const res = await request(t.server)
      .post('/api/auth/sign-in')
      .send({ email: user.email.toUpperCase(), password: user.password })
      .expect(200);
    expect(res.body.user).toMatchObject({ id: user.id, email: user.email, isAdmin: false });
    expect(res.body.memberships).toEqual([]);
    const access = cookie(res, 'hl_access');
    const refresh = cookie(res, 'hl_refresh');
    const csrf = cookie(res, 'hl_csrf');
    expect(access).toMatch(/HttpOnly/);
    expect(access).toMatch(/SameSite=Lax/);
    expect(access).toMatch(/Path=\/api;/);
    expect(refresh).toMatch(/HttpOnly/);
    expect(refresh).toMatch(/SameSite=Strict/);
    expect(refresh).toMatch(/Path=\/api\/auth/);
    expect(csrf).not.toMatch(/HttpOnly/);
    // The refresh token is stored only as its SHA-256.
    const rows = (await t.dataSource.query('select token_hash from refresh_tokens')) as {
      token_hash: string;
    }[];
    expect(rows.map((r) => r.token_hash)).not.toContain(valueOf(refresh));
    expect(rows.every((r) => /^[0-9a-f]{64}$/.test(r.token_hash))).toBe(true);
    // The access token is an HS256 JWT that expires in 5 minutes.
    const decoded = jwt.decode(valueOf(access), { complete: true });
    expect(decoded?.header.alg).toBe('HS256');
    const payload = decoded?.payload as { exp: number; iat: number; sub: string };
    expect(payload.sub).toBe(user.id);
    expect(payload.exp - payload.iat).toBe(5 * 60);
  });

  it('refuses a wrong password and an unknown address alike (401 invalid_credentials)', async () => {
    const wrong = await request(t.server)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: 'not the password' });
    const unknown = await request(t.server)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@test.example', password: 'not the password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
    expect(cookie(wrong, 'hl_access')).toBeUndefined();
  });

  it('GET /api/me requires sign-in, then answers Me', async () => {
    await request(t.server).get('/api/me').expect(401);
    const s = await signIn(t, user);
    const res = await s.get('/api/me').expect(200);
    expect(res.body.user.id).toBe(user.id);
  });

  it('an expired access token answers 401 token_expired; refresh issues new cookies', async () => {
    const s = await signIn(t, user);
    const expired = jwt.sign({ epoch: 0 }, t.config.auth.jwtSecret, {
      algorithm: 'HS256',
      subject: user.id,
      audience: 'hoopline-api',
      expiresIn: -10,
    });
    const res = await request(t.server)
      .get('/api/me')
      .set('cookie', `hl_access=${expired}`)
      .expect(401);
    expect(res.body.error.code).toBe('token_expired');
    const refreshed = await s.post('/api/auth/refresh').expect(200);
    s.absorb(refreshed);
    expect(cookie(refreshed, 'hl_access')).toBeDefined();
    expect(cookie(refreshed, 'hl_refresh')).toBeDefined();
    await s.get('/api/me').expect(200);
  });

  it('a token signed with another secret, or with alg none, is refused (401 unauthorized)', async () => {
    const forged = jwt.sign({ epoch: 0 }, 'x'.repeat(40), {
      subject: user.id,
      audience: 'hoopline-api',
      expiresIn: 60,
    });
    const none = jwt.sign({ epoch: 0, sub: user.id, aud: 'hoopline-api' }, '', {
      algorithm: 'none',
    });
    for (const token of [forged, none, 'garbage']) {
      const res = await request(t.server).get('/api/me').set('cookie', `hl_access=${token}`);
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthorized');
    }
  });

  it('rotates the refresh token; reusing a spent one (after the grace) ends the whole family', async () => {
    const s = await signIn(t, user);
    const first = (
      (await t.dataSource.query(
        'select token_hash, family_id from refresh_tokens where user_id = $1 order by created_at desc limit 1',
        [user.id],
      )) as { family_id: string }[]
    )[0]!;
    // Keep a copy of the refresh cookie before it rotates.
    const before = s.agent.jar.getCookie('hl_refresh', {
      domain: '127.0.0.1',
      path: '/api/auth',
      secure: false,
      script: false,
    });
    expect(before).toBeDefined();
    s.absorb(await s.post('/api/auth/refresh').expect(200));
    // Push the spent token's revocation back past the grace period.
    await t.dataSource.query(
      `update refresh_tokens set revoked_at = now() - interval '1 minute' where family_id = $1 and revoked_reason = 'rotated'`,
      [first.family_id],
    );
    const thief = await request(t.server)
      .post('/api/auth/refresh')
      .set('cookie', `hl_refresh=${before!.value}; hl_csrf=x`)
      .set('x-csrf-token', 'x')
      .expect(401);
    expect(thief.body.error.code).toBe('refresh_reused');
    // The legitimate holder's newer token is dead too.
    const victim = await s.post('/api/auth/refresh').expect(401);
    expect(victim.body.error.code).toBe('unauthorized');
    const live = (await t.dataSource.query(
      'select count(*)::int as n from refresh_tokens where family_id = $1 and revoked_at is null',
      [first.family_id],
    )) as { n: number }[];
    expect(live[0]?.n).toBe(0);
    const events = (await t.dataSource.query(
      `select count(*)::int as n from audit_events where action = 'session.reuse_detected'`,
    )) as { n: number }[];
    expect(events[0]?.n).toBe(1);
  });

  it('a spent token presented again within the grace is refused without ending the family', async () => {
    const s = await signIn(t, user);
    const before = s.agent.jar.getCookie('hl_refresh', {
      domain: '127.0.0.1',
      path: '/api/auth',
      secure: false,
      script: false,
    });
    s.absorb(await s.post('/api/auth/refresh').expect(200));
    const second = await request(t.server)
      .post('/api/auth/refresh')
      .set('cookie', `hl_refresh=${before!.value}; hl_csrf=x`)
      .set('x-csrf-token', 'x')
      .expect(401);
    expect(second.body.error.code).toBe('refresh_superseded');
    // The winner's fresh cookies are left alone.
    expect(cookie(second, 'hl_refresh')).toBeUndefined();
    await s.post('/api/auth/refresh').expect(200);
  });

  it('an expired refresh token is 401 refresh_expired and clears the cookies', async () => {
    const s = await signIn(t, user);
    await t.dataSource.query(
      `update refresh_tokens set expires_at = now() - interval '1 second'
        where user_id = $1 and revoked_at is null`,
      [user.id],
    );
    const res = await s.post('/api/auth/refresh').expect(401);
    expect(res.body.error.code).toBe('refresh_expired');
    expect(cookie(res, 'hl_refresh')).toMatch(/Expires=Thu, 01 Jan 1970/);
  });

  it('sign-out revokes the refresh token and clears the cookies', async () => {
    const s = await signIn(t, user);
    const res = await s.post('/api/auth/sign-out').expect(204);
    expect(cookie(res, 'hl_access')).toMatch(/Expires=Thu, 01 Jan 1970/);
    const refresh = await s.post('/api/auth/refresh');
    expect(refresh.status).toBe(401);
    await s.get('/api/me').expect(401);
  });

  it('sign-out without any session is 401', async () => {
    await anonymous(t).post('/api/auth/sign-out').expect(401);
  });

  it('a deactivated user is signed out at once and cannot sign in', async () => {
    const admin = await makeUser(t, { isAdmin: true });
    const victim = await makeUser(t);
    const s = await signIn(t, victim);
    const a = await signIn(t, admin);
    await a.patch(`/api/users/${victim.id}`, { active: false }).expect(200);
    await s.get('/api/me').expect(401);
    await s.post('/api/auth/refresh').expect(401);
    await request(t.server)
      .post('/api/auth/sign-in')
      .send({ email: victim.email, password: victim.password })
      .expect(401);
  });
});

describe('auth: CSRF (double submit)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('refuses a cookie-authenticated write without the header, or with a wrong one (403 csrf_failed)', async () => {
    const user = await makeUser(t, { mayCreateProjects: true });
    const s = await signIn(t, user);
    const before = await count(t, 'projects');
    const missing = await s.agent
      .post('/api/projects')
      .send({ number: 'C-1', name: 'x', unitSystem: 'si' });
    expect(missing.status).toBe(403);
    expect(missing.body.error.code).toBe('csrf_failed');
    const wrong = await s.agent
      .post('/api/projects')
      .set('x-csrf-token', 'not-the-cookie')
      .send({ number: 'C-1', name: 'x', unitSystem: 'si' });
    expect(wrong.status).toBe(403);
    expect(await count(t, 'projects')).toBe(before);
    await s.post('/api/projects', { number: 'C-1', name: 'x', unitSystem: 'si' }).expect(201);
  });

  it('does not ask for a token on sign-in, and answers reads without one', async () => {
    const user = await makeUser(t);
    const s = await signIn(t, user);
    await s.agent.get('/api/me').expect(200);
    await s.agent
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: user.password })
      .expect(200);
  });
});

describe('auth: rate limiting (low limits configured for this test)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({
      HOOPLINE_SIGN_IN_LIMIT_PER_ACCOUNT: '3',
      HOOPLINE_SIGN_IN_LIMIT_PER_ADDRESS: '6',
    });
  });
  afterAll(async () => {
    await t.close();
  });

  it('locks an account after 3 failures (429), even with the right password, and not other accounts', async () => {
    const victim = await makeUser(t);
    const other = await makeUser(t);
    for (let i = 0; i < 3; i++) {
      await request(t.server)
        .post('/api/auth/sign-in')
        .send({ email: victim.email, password: 'wrong password' })
        .expect(401);
    }
    const locked = await request(t.server)
      .post('/api/auth/sign-in')
      .send({ email: victim.email, password: victim.password });
    expect(locked.status).toBe(429);
    expect(locked.body.error.code).toBe('too_many_attempts');
    await request(t.server)
      .post('/api/auth/sign-in')
      .send({ email: other.email, password: other.password })
      .expect(200);
  });

  it('limits one address across accounts (6 failures)', async () => {
    // The previous test's 3 failures and its refused (429) attempt count
    // against this address already: two more failures reach 6.
    const codes: number[] = [];
    for (let i = 0; i < 4; i++) {
      const res = await request(t.server)
        .post('/api/auth/sign-in')
        .send({ email: `spray${i}@test.example`, password: 'wrong password' });
      codes.push(res.status);
    }
    expect(codes).toEqual([401, 401, 429, 429]);
  });
});

describe('auth: invitations and password reset', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('an admin invites; the token opens the invitation once; accepting signs the new user in', async () => {
    const admin = await makeUser(t, { isAdmin: true });
    const a = await signIn(t, admin);
    const created = await a
      .post('/api/invitations', { email: 'New.Person@Test.Example', name: 'New Person' })
      .expect(201);
    expect(created.body.invitation.email).toBe('new.person@test.example');
    const token = created.body.token as string;
    expect(token.length).toBeGreaterThan(30);
    const stored = (await t.dataSource.query('select token_hash from invitations')) as {
      token_hash: string;
    }[];
    expect(stored.map((s) => s.token_hash)).not.toContain(token);
    const peek = await request(t.server).get(`/api/auth/invitations/${token}`).expect(200);
    expect(peek.body).toEqual({ email: 'new.person@test.example', name: 'New Person' });
    const accepted = await request(t.server)
      .post('/api/auth/accept-invitation')
      .send({ token, name: 'New Person', password: 'a long new password' })
      .expect(200);
    expect(accepted.body.user.email).toBe('new.person@test.example');
    await request(t.server).get(`/api/auth/invitations/${token}`).expect(404);
    const again = await request(t.server)
      .post('/api/auth/accept-invitation')
      .send({ token, name: 'Someone', password: 'a long new password' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('invalid_token');
    const dup = await a.post('/api/invitations', { email: 'new.person@test.example', name: 'x' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.code).toBe('email_taken');
  });

  it('a revoked invitation no longer opens', async () => {
    const admin = await makeUser(t, { isAdmin: true });
    const a = await signIn(t, admin);
    const created = await a
      .post('/api/invitations', { email: 'revoked@test.example', name: 'R' })
      .expect(201);
    await a.delete(`/api/invitations/${created.body.invitation.id}`).expect(204);
    await request(t.server).get(`/api/auth/invitations/${created.body.token}`).expect(404);
  });

  it('password reset: request is 202 for anyone; the admin-issued token resets once and ends every session', async () => {
    const admin = await makeUser(t, { isAdmin: true });
    const user = await makeUser(t);
    const s = await signIn(t, user);
    await request(t.server)
      .post('/api/auth/password-reset/request')
      .send({ email: 'nobody@test.example' })
      .expect(202);
    await request(t.server)
      .post('/api/auth/password-reset/request')
      .send({ email: user.email })
      .expect(202);
    await backgroundSettled(); // the requested reset is written after the 202
    const a = await signIn(t, admin);
    const issued = await a.post(`/api/users/${user.id}/password-reset`).expect(201);
    const token = issued.body.token as string;
    await request(t.server)
      .post('/api/auth/password-reset/complete')
      .send({ token, password: 'a brand new password' })
      .expect(204);
    await s.get('/api/me').expect(401);
    await s.post('/api/auth/refresh').expect(401);
    await request(t.server)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: user.password })
      .expect(401);
    await request(t.server)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: 'a brand new password' })
      .expect(200);
    const reuse = await request(t.server)
      .post('/api/auth/password-reset/complete')
      .send({ token, password: 'another new password' });
    expect(reuse.status).toBe(400);
    expect(reuse.body.error.code).toBe('invalid_token');
  });

  it('changing one’s own password needs the current one and keeps this session', async () => {
    const user = await makeUser(t);
    const s = await signIn(t, user);
    const other = await signIn(t, user);
    const wrong = await s.post('/api/me/password', {
      currentPassword: 'not it at all',
      newPassword: 'a brand new password',
    });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toEqual([{ path: 'currentPassword', message: 'is wrong' }]);
    s.absorb(
      await s
        .post('/api/me/password', {
          currentPassword: user.password,
          newPassword: 'a brand new password',
        })
        .expect(204),
    );
    await s.get('/api/me').expect(200);
    await other.get('/api/me').expect(401);
  });
});

describe('auth: secrets stay out of the request log', () => {
  it('logs GET /auth/invitations/:token with the token replaced', async () => {
    const { pino } = await import('pino');
    const { Writable } = await import('node:stream');
    const { createApp } = await import('../app');
    const t = await startTestApp();
    const lines: string[] = [];
    const sink = new Writable({
      write(chunk: Buffer, _encoding, done) {
        lines.push(chunk.toString());
        done();
      },
    });
    const app = createApp({ config: t.config, dataSource: t.dataSource, logger: pino(sink) });
    await request(app).get('/api/auth/invitations/secret-token-value-123').expect(404);
    await request(app)
      .post('/api/auth/sign-in')
      .send({ email: 'x@test.example', password: 'the password itself' })
      .expect(401);
    const log = lines.join('\n');
    expect(log).toContain('/api/auth/invitations/[token]');
    expect(log).not.toContain('secret-token-value-123');
    expect(log).not.toContain('the password itself');
    await t.close();
  });
});
