import { createHmac, generateKeyPairSync, randomUUID } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { describe, expect, it } from 'vitest';
import { ACCESS_TOKEN_AUDIENCE, accessTokens } from './tokens';

// Unit tests of the access-token claims (no I/O): every claim is pinned by
// accessClaimsSchema, the algorithm by the verifier.
const SECRET = 'a-test-secret-that-is-long-enough-0123456789';
const tokens = accessTokens(SECRET, 300);
const sub = randomUUID();
const sid = randomUUID();

/**
 * A token signed with the right secret (HS256 unless said otherwise) whose
 * payload is exactly these claims, built by hand so that nothing adds,
 * drops or checks a claim on the way.
 */
function signed(payload: Record<string, unknown>, options: { algorithm?: string } = {}): string {
  const alg = options.algorithm ?? 'HS256';
  const part = (o: unknown) => Buffer.from(JSON.stringify(o)).toString('base64url');
  const input = `${part({ alg, typ: 'JWT' })}.${part(payload)}`;
  const hash = { HS256: 'sha256', HS384: 'sha384', HS512: 'sha512' }[alg] ?? 'sha256';
  return `${input}.${createHmac(hash, SECRET).update(input).digest('base64url')}`;
}
const now = () => Math.floor(Date.now() / 1000);
const good = () => ({
  sub,
  sid,
  epoch: 0,
  aud: ACCESS_TOKEN_AUDIENCE,
  iat: now(),
  exp: now() + 60,
});

describe('access tokens: claims', () => {
  it('accepts its own tokens and reads sub, epoch and sid back', () => {
    const check = tokens.verify(tokens.sign({ sub, epoch: 3, sid }));
    expect(check).toEqual({ ok: true, claims: { sub, epoch: 3, sid } });
  });

  it('accepts a hand-built token with exactly the pinned claims', () => {
    expect(tokens.verify(signed(good())).ok).toBe(true);
  });

  it.each([
    ['exp', 'without exp (it would never expire)'],
    ['iat', 'without iat'],
    ['sub', 'without sub'],
    ['sid', 'without a session id'],
    ['epoch', 'without epoch'],
    ['aud', 'without an audience'],
  ])('refuses a correctly signed token %s: %s', (claim) => {
    const payload: Record<string, unknown> = good();
    delete payload[claim];
    expect(tokens.verify(signed(payload))).toEqual({ ok: false, reason: 'invalid' });
  });

  it.each([
    ['sub is not a UUID', { sub: 'not-a-uuid' }],
    ['sub is SQL', { sub: "' or 1=1 --" }],
    ['sub is a number', { sub: 42 }],
    ['sid is not a UUID', { sid: 'x' }],
    ['epoch is text', { epoch: '0' }],
    ['epoch is negative', { epoch: -1 }],
    ['epoch is a fraction', { epoch: 0.5 }],
    ['exp is text', { exp: 'tomorrow' }],
    ['the audience is another', { aud: 'someone-else' }],
    ['an unknown claim is added', { admin: true }],
  ])('refuses a correctly signed token whose %s', (_what, change) => {
    expect(tokens.verify(signed({ ...good(), ...change }))).toEqual({
      ok: false,
      reason: 'invalid',
    });
  });

  it('says expired for a past exp, and for a token older than the lifetime', () => {
    expect(tokens.verify(signed({ ...good(), exp: now() - 5 }))).toEqual({
      ok: false,
      reason: 'expired',
    });
    // Issued under a 1-hour lifetime, 10 minutes ago: today's 5 minutes have passed.
    const old = signed({ ...good(), iat: now() - 600, exp: now() + 3000 });
    expect(tokens.verify(old)).toEqual({ ok: false, reason: 'expired' });
  });
});

describe('access tokens: the algorithm is pinned to HS256 with our secret', () => {
  it('refuses alg none', () => {
    const none = jwt.sign(good(), '', { algorithm: 'none', noTimestamp: true });
    expect(none.split('.')[2]).toBe('');
    expect(tokens.verify(none)).toEqual({ ok: false, reason: 'invalid' });
  });

  it('refuses a token whose header says none but keeps an HS256 signature', () => {
    const [, body, signature] = signed(good()).split('.');
    const header = Buffer.from(JSON.stringify({ alg: 'none', typ: 'JWT' })).toString('base64url');
    expect(tokens.verify(`${header}.${body}.${signature}`).ok).toBe(false);
    expect(tokens.verify(`${header}.${body}.`).ok).toBe(false);
  });

  it('refuses HS512 and HS384 with the right secret', () => {
    for (const algorithm of ['HS384', 'HS512'] as const) {
      expect(tokens.verify(signed(good(), { algorithm }))).toEqual({
        ok: false,
        reason: 'invalid',
      });
    }
  });

  it('refuses RS256 (a key pair of its own), and one signed with another secret', () => {
    const { privateKey } = generateKeyPairSync('rsa', { modulusLength: 2048 });
    const rs = jwt.sign(good(), privateKey, { algorithm: 'RS256', noTimestamp: true });
    expect(tokens.verify(rs)).toEqual({ ok: false, reason: 'invalid' });
    const other = jwt.sign(good(), 'another-secret-of-the-same-length-0123456', {
      algorithm: 'HS256',
      noTimestamp: true,
    });
    expect(tokens.verify(other)).toEqual({ ok: false, reason: 'invalid' });
  });

  it('refuses text that is no JWT at all', () => {
    for (const text of ['', 'garbage', 'a.b.c', '...', 'e30.e30.']) {
      expect(tokens.verify(text).ok).toBe(false);
    }
  });
});
