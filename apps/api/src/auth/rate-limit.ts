import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { AuthConfig } from '../config/config';
import { AppError } from '../http/errors';

const tooMany = (retryAfterSeconds: number) =>
  new AppError(
    429,
    'too_many_attempts',
    'too many failed sign-in attempts: wait a while and try again',
    undefined,
    { retryAfterSeconds },
  );

function accountKey(body: unknown): string {
  const email = (body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase().slice(0, 320) : '(none)';
}

/**
 * Sign-in limits: failed attempts per account and per client address in one
 * window (successful sign-ins do not count). The counters live in the
 * process's memory: several API processes each count on their own, a known
 * limit until a shared store is needed.
 */
export function signInLimiters(auth: AuthConfig): {
  address: RequestHandler;
  account: RequestHandler;
} {
  const windowMs = auth.signInWindow * 1000;
  const common = {
    windowMs,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    handler: (_req: unknown, _res: unknown, next: (error: unknown) => void) =>
      next(tooMany(auth.signInWindow)),
  };
  return {
    address: rateLimit({ ...common, limit: auth.signInLimitPerAddress, identifier: 'address' }),
    account: rateLimit({
      ...common,
      limit: auth.signInLimitPerAccount,
      identifier: 'account',
      keyGenerator: (req) => `account:${accountKey(req.body)}`,
    }),
  };
}
