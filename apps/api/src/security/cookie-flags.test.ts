import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, signIn } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

/** The Set-Cookie lines of a response, by cookie name. */
function cookies(setCookie: unknown): Record<string, string> {
  const list = Array.isArray(setCookie) ? (setCookie as string[]) : [];
  return Object.fromEntries(list.map((line) => [line.split('=')[0]!, line]));
}

const PRODUCTION = {
  NODE_ENV: 'production',
  HOOPLINE_JWT_SECRET: 'a-production-secret-of-at-least-32-characters',
};

/**
 * Cookie flags in production mode (issue 13.7), as cookies.ts sets them:
 * the session cookies HttpOnly, SameSite Lax (access) or Strict (refresh,
 * CSRF), Secure when the public address is https (TLS at a proxy in front)
 * or HOOPLINE_COOKIE_SECURE=true says so.
 */
describe('cookie flags in production mode', () => {
  const apps: TestApp[] = [];
  afterAll(async () => {
    for (const app of apps) await app.close();
  });
  async function signInOn(environment: Record<string, string>) {
    const t = await startTestApp({ ...PRODUCTION, ...environment });
    apps.push(t);
    const user = await makeUser(t);
    const session = await signIn(t, user);
    const res = await session.agent
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: user.password });
    expect(res.status).toBe(200);
    return cookies(res.headers['set-cookie']);
  }

  let behindTls: Record<string, string>;
  beforeAll(async () => {
    behindTls = await signInOn({ HOOPLINE_PUBLIC_URL: 'https://hoopline.example.test' });
  }, 60_000);

  it('behind TLS (an https public address): every cookie Secure; the session cookies HttpOnly', () => {
    expect(behindTls['hl_access']).toMatch(/; HttpOnly/);
    expect(behindTls['hl_access']).toMatch(/; Secure/);
    expect(behindTls['hl_access']).toMatch(/; SameSite=Lax/);
    expect(behindTls['hl_access']).toMatch(/; Path=\/api;/);
    expect(behindTls['hl_refresh']).toMatch(/; HttpOnly/);
    expect(behindTls['hl_refresh']).toMatch(/; Secure/);
    expect(behindTls['hl_refresh']).toMatch(/; SameSite=Strict/);
    expect(behindTls['hl_refresh']).toMatch(/; Path=\/api\/auth;/);
    // The CSRF cookie is read by the web app (double submit): not HttpOnly, but Secure and Strict.
    expect(behindTls['hl_csrf']).not.toMatch(/HttpOnly/);
    expect(behindTls['hl_csrf']).toMatch(/; Secure/);
    expect(behindTls['hl_csrf']).toMatch(/; SameSite=Strict/);
  });

  it('on a plain-http loopback address (the start command) not Secure, unless HOOPLINE_COOKIE_SECURE says so', async () => {
    const plain = await signInOn({ HOOPLINE_PUBLIC_URL: 'http://127.0.0.1:8080' });
    for (const name of ['hl_access', 'hl_refresh', 'hl_csrf']) {
      expect(plain[name]).toBeDefined();
      expect(plain[name]).not.toMatch(/Secure/);
    }
    expect(plain['hl_access']).toMatch(/; HttpOnly/);
    const forced = await signInOn({
      HOOPLINE_PUBLIC_URL: 'http://127.0.0.1:8080',
      HOOPLINE_COOKIE_SECURE: 'true',
    });
    for (const name of ['hl_access', 'hl_refresh', 'hl_csrf'])
      expect(forced[name]).toMatch(/; Secure/);
  }, 60_000);
});
