import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import jwt from 'jsonwebtoken';

/** An opaque random token (refresh, invitation, reset, CSRF): 32 bytes, base64url. */
export function randomToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What is stored for an opaque token: its SHA-256, hex. Tokens are random, so no salt is needed. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
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
}

export type AccessCheck =
  | { readonly ok: true; readonly claims: AccessClaims }
  | { readonly ok: false; readonly reason: 'expired' | 'invalid' };

const ALGORITHM = 'HS256';
const AUDIENCE = 'hoopline-api';

export function signAccessToken(claims: AccessClaims, secret: string, ttlSeconds: number): string {
  return jwt.sign({ epoch: claims.epoch }, secret, {
    algorithm: ALGORITHM,
    subject: claims.sub,
    audience: AUDIENCE,
    expiresIn: ttlSeconds,
  });
}

export function verifyAccessToken(token: string, secret: string): AccessCheck {
  try {
    const payload = jwt.verify(token, secret, { algorithms: [ALGORITHM], audience: AUDIENCE });
    if (
      typeof payload === 'object' &&
      typeof payload.sub === 'string' &&
      typeof payload['epoch'] === 'number'
    ) {
      return { ok: true, claims: { sub: payload.sub, epoch: payload['epoch'] } };
    }
    return { ok: false, reason: 'invalid' };
  } catch (error) {
    return { ok: false, reason: error instanceof jwt.TokenExpiredError ? 'expired' : 'invalid' };
  }
}
