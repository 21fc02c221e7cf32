import type { Request, RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import type { AuthConfig } from '../config/config';
import { UserEntity } from '../db/entities/user.entity';
import { AppError, unauthorized } from '../http/errors';
import type { Actor } from '../policy/policy';
import { ACCESS_COOKIE, cookieText } from './cookies';
import { verifyAccessToken } from './tokens';

/** The signed-in person, as the routes see them. */
export interface SignedIn extends Actor {
  readonly user: UserEntity;
}

const ACTOR = Symbol('hoopline.actor');

export const tokenExpired = () =>
  new AppError(401, 'token_expired', 'your session has expired: refresh it and try again');

/**
 * Route middleware: the request must carry a valid access token of an active
 * user whose auth epoch has not moved since it was issued (password reset,
 * deactivation). Sets the actor for `actorOf(req)`.
 */
export function signInRequired(dataSource: DataSource, auth: AuthConfig): RequestHandler {
  return async (req, _res, next) => {
    const token = cookieText(req.cookies, ACCESS_COOKIE);
    if (!token) throw unauthorized();
    const check = verifyAccessToken(token, auth.jwtSecret);
    if (!check.ok) throw check.reason === 'expired' ? tokenExpired() : unauthorized();
    const user = await dataSource.getRepository(UserEntity).findOneBy({ id: check.claims.sub });
    if (!user || !user.active || user.authEpoch !== check.claims.epoch) {
      throw unauthorized('your session has ended: sign in again');
    }
    const actor: SignedIn = { id: user.id, isAdmin: user.isAdmin, user };
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
