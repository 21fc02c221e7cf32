import type { Request, RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { pgPool } from '../db/pg-pool';
import type { UnitSystem, UserProfile } from '../db/entities/user.entity';
import { AppError, unauthorized } from '../http/errors';
import type { Actor } from '../policy/policy';
import { ACCESS_COOKIE, cookieText } from './cookies';
import type { SessionCache, SessionFacts } from './session-cache';
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

interface SessionRow {
  id: string;
  email: string;
  name: string;
  is_admin: boolean;
  active: boolean;
  unit_system: UnitSystem;
  may_create_projects: boolean;
  auth_epoch: number;
  created_at: Date;
  live_until: Date | null;
}

/**
 * One indexed read, as a named prepared statement on the pool (no query
 * builder): the user row and until when the session's refresh family has a
 * live token. Signing out, a detected reuse or an ended session revokes the
 * family, so the access token stops working at once.
 */
const SESSION_QUERY = {
  name: 'hoopline-session',
  text: `select u.id, u.email, u.name, u.is_admin, u.active, u.unit_system, u.auth_epoch,
                u.may_create_projects, u.created_at,
                (select max(t.expires_at) from refresh_tokens t
                  where t.family_id = $2 and t.user_id = u.id and t.revoked_at is null) as live_until
           from users u where u.id = $1`,
};

async function readSession(
  dataSource: DataSource,
  sub: string,
  sid: string,
): Promise<SessionFacts | undefined> {
  const result = await pgPool(dataSource).query<SessionRow>({
    ...SESSION_QUERY,
    values: [sub, sid],
  });
  const row = result.rows[0];
  if (!row) return undefined;
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    isAdmin: row.is_admin,
    active: row.active,
    unitSystem: row.unit_system,
    mayCreateProjects: row.may_create_projects,
    authEpoch: row.auth_epoch,
    createdAt: row.created_at,
    liveUntil: row.live_until,
  };
}

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
      facts = await readSession(dataSource, sub, sid);
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
