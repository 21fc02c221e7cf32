import {
  createHash,
  createSecretKey,
  randomBytes,
  timingSafeEqual,
  type KeyObject,
} from 'node:crypto';
import jwt from 'jsonwebtoken';
import { z } from 'zod';

/** An opaque random token (refresh, invitation, reset, CSRF): 32 bytes, base64url. */
export function randomToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What is stored for an opaque token: its SHA-256, hex. Tokens are random, so no salt is needed. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** What a session is given: the access JWT, the refresh token and the CSRF token (auth/cookies.ts sets them). */
export interface IssuedSession {
  readonly accessToken: string;
  readonly refreshToken: string;
  readonly csrfToken: string;
}

export function safeEqual(a: string, b: string): boolean {
  const left = Buffer.from(a, 'utf8');
  const right = Buffer.from(b, 'utf8');
  return left.length === right.length && timingSafeEqual(left, right);
}

export interface AccessClaims {
  /** User id. */
  readonly sub: string;
  /** The user's auth epoch when the token was issued; a bump invalidates it. */
  readonly epoch: number;
  /** The session: the refresh-token family it was issued with; revoking the family ends it. */
  readonly sid: string;
}

export type AccessCheck =
  | { readonly ok: true; readonly claims: AccessClaims }
  | { readonly ok: false; readonly reason: 'expired' | 'invalid' };

/** The one algorithm an access token may have; `none` and every other one are refused. */
export const ACCESS_TOKEN_ALGORITHM = 'HS256';
export const ACCESS_TOKEN_AUDIENCE = 'hoopline-api';

/**
 * Every claim an access token carries, and nothing else: a token that lacks
 * one (`exp` included), has another, or whose `sub`/`sid` is not a UUID is
 * refused as invalid (401), never passed on to a query.
 */
export const accessClaimsSchema = z
  .object({
    sub: z.uuid(),
    sid: z.uuid(),
    epoch: z.number().int().min(0),
    aud: z.literal(ACCESS_TOKEN_AUDIENCE),
    iat: z.number().int(),
    exp: z.number().int(),
  })
  .strict();

export interface AccessTokens {
  sign(claims: AccessClaims): string;
  verify(token: string): AccessCheck;
}

/**
 * Signs and checks access tokens with one secret and lifetime. The secret is
 * turned into a KeyObject once: given a string, jsonwebtoken first tries it
 * as a public key and builds a secret key only after that throws, which was
 * a fifth of the CPU time of every signed-in request (bench/profile-screen.ts).
 */
export function accessTokens(secret: string, ttlSeconds: number): AccessTokens {
  const key: KeyObject = createSecretKey(Buffer.from(secret, 'utf8'));
  return {
    sign(claims) {
      return jwt.sign({ epoch: claims.epoch, sid: claims.sid }, key, {
        algorithm: ACCESS_TOKEN_ALGORITHM,
        subject: claims.sub,
        audience: ACCESS_TOKEN_AUDIENCE,
        expiresIn: ttlSeconds,
      });
    },
    verify(token) {
      let payload: unknown;
      try {
        payload = jwt.verify(token, key, {
          algorithms: [ACCESS_TOKEN_ALGORITHM],
          audience: ACCESS_TOKEN_AUDIENCE,
          // A token issued under a longer lifetime (before a change of
          // HOOPLINE_ACCESS_TOKEN_TTL) ends when today's lifetime says.
          maxAge: ttlSeconds,
        });
      } catch (error) {
        return {
          ok: false,
          reason: error instanceof jwt.TokenExpiredError ? 'expired' : 'invalid',
        };
      }
      const parsed = accessClaimsSchema.safeParse(payload);
      if (!parsed.success) return { ok: false, reason: 'invalid' };
      const { sub, epoch, sid } = parsed.data;
      return { ok: true, claims: { sub, epoch, sid } };
    },
  };
}
