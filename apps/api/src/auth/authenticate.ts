import type { Request, RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import type { UserProfile } from '../db/entities/user.entity';
import { AppError, unauthorized } from '../http/errors';
import type { Actor } from '../policy/policy';
import { sessionRepository } from '../repositories/sessions.repository';
import { ACCESS_COOKIE, cookieText } from './cookies';
import type { SessionCache } from './session-cache';
import type { AccessTokens } from '../credentials/tokens';

/** The signed-in person, as the routes see them. */
export interface SignedIn extends Actor {
  readonly user: UserProfile;
  /** The session (refresh-token family) the access token belongs to. */
  readonly sessionId: string;
}

const ACTOR = Symbol('hoopline.actor');

export const tokenExpired = () =>
  new AppError(401, 'token_expired', 'your session has expired: refresh it and try again');

const sessionEnded = () => unauthorized('your session has ended: sign in again');

/**
 * Route middleware: the request must carry a valid access token of an active
 * user whose auth epoch has not moved since it was issued (password reset,
 * deactivation) and whose session has not ended (sign-out, reuse, expiry of
 * its refresh token). Sets the actor for `actorOf(req)`. With a session
 * cache (every process the start command runs has one) the facts come from
 * memory that database notifications keep true; without, from the database.
 */
export function signInRequired(
  dataSource: DataSource,
  tokens: AccessTokens,
  cache?: SessionCache,
): RequestHandler {
  return async (req, _res, next) => {
    const token = cookieText(req.cookies, ACCESS_COOKIE);
    if (!token) throw unauthorized();
    const check = tokens.verify(token);
    if (!check.ok) throw check.reason === 'expired' ? tokenExpired() : unauthorized();
    const { sub, epoch, sid } = check.claims;
    let facts = cache?.get(sid);
    if (!facts || facts.id !== sub) {
      const startedAt = cache?.now ?? 0;
      facts = await sessionRepository.sessionFacts(dataSource, sub, sid);
      if (facts && cache) cache.set(sid, facts, startedAt);
    }
    if (
      !facts ||
      !facts.active ||
      facts.authEpoch !== epoch ||
      !facts.liveUntil ||
      facts.liveUntil.getTime() <= Date.now()
    ) {
      throw sessionEnded();
    }
    const user: UserProfile = {
      id: facts.id,
      email: facts.email,
      name: facts.name,
      isAdmin: facts.isAdmin,
      active: facts.active,
      unitSystem: facts.unitSystem,
      vacuumUnit: facts.vacuumUnit,
      mayCreateProjects: facts.mayCreateProjects,
      createdAt: facts.createdAt,
    };
    const actor: SignedIn = { id: user.id, isAdmin: user.isAdmin, user, sessionId: sid };
    (req as unknown as Record<symbol, unknown>)[ACTOR] = actor;
    next();
  };
}

/** The actor `signInRequired` set; a route without it is a bug. */
export function actorOf(req: Request): SignedIn {
  const actor = (req as unknown as Record<symbol, unknown>)[ACTOR];
  if (!actor) throw new Error('route bug: actorOf() without signInRequired');
  return actor as SignedIn;
}
