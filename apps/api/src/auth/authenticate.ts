import type { Request, RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { pgPool } from '../db/pg-pool';
import type { UnitSystem } from '../db/entities/user.entity';
import type { UserProfile } from '../domain/users/user-views';
import { AppError, unauthorized } from '../http/errors';
import type { Actor } from '../policy/policy';
import { ACCESS_COOKIE, cookieText } from './cookies';
import type { AccessTokens } from './tokens';

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
  auth_epoch: number;
  created_at: Date;
  session_live: boolean;
}

/**
 * One indexed read per request, as a named prepared statement on the pool
 * (no query builder): the user row and whether the session's refresh family
 * still has a live token. Signing out, a detected reuse or an ended session
 * revokes the family, so the access token stops working at once.
 */
const SESSION_QUERY = {
  name: 'hoopline-session',
  text: `select u.id, u.email, u.name, u.is_admin, u.active, u.unit_system, u.auth_epoch,
                u.created_at,
                exists (select 1 from refresh_tokens t
                         where t.family_id = $2 and t.user_id = u.id
                           and t.revoked_at is null and t.expires_at > now()) as session_live
           from users u where u.id = $1`,
};

/**
 * Route middleware: the request must carry a valid access token of an active
 * user whose auth epoch has not moved since it was issued (password reset,
 * deactivation) and whose session has not ended (sign-out, reuse). Sets the
 * actor for `actorOf(req)`.
 */
export function signInRequired(dataSource: DataSource, tokens: AccessTokens): RequestHandler {
  return async (req, _res, next) => {
    const token = cookieText(req.cookies, ACCESS_COOKIE);
    if (!token) throw unauthorized();
    const check = tokens.verify(token);
    if (!check.ok) throw check.reason === 'expired' ? tokenExpired() : unauthorized();
    const { sub, epoch, sid } = check.claims;
    const result = await pgPool(dataSource).query<SessionRow>({
      ...SESSION_QUERY,
      values: [sub, sid],
    });
    const row = result.rows[0];
    if (!row || !row.active || row.auth_epoch !== epoch || !row.session_live) {
      throw sessionEnded();
    }
    const user: UserProfile = {
      id: row.id,
      email: row.email,
      name: row.name,
      isAdmin: row.is_admin,
      active: row.active,
      unitSystem: row.unit_system,
      createdAt: row.created_at,
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
