import type { RequestHandler } from 'express';
import { forbidden } from '../http/errors';
import { ACCESS_COOKIE, CSRF_COOKIE, CSRF_HEADER, REFRESH_COOKIE, cookieText } from './cookies';
import { safeEqual } from '../credentials/tokens';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Writes that carry no session: a CSRF token cannot exist yet. */
const EXEMPT = new Set([
  '/auth/sign-in',
  '/auth/accept-invitation',
  '/auth/password-reset/request',
  '/auth/password-reset/complete',
]);

/**
 * Double-submit CSRF check for cookie-authenticated writes: the x-csrf-token
 * header must equal the hl_csrf cookie. A request with no session cookie is
 * left to authentication (401), so signed-out callers see "sign in first".
 * Mounted on the /api router, so req.path is relative to /api.
 */
export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method) || EXEMPT.has(req.path)) {
    next();
    return;
  }
  const hasSession =
    cookieText(req.cookies, ACCESS_COOKIE) !== undefined ||
    cookieText(req.cookies, REFRESH_COOKIE) !== undefined;
  if (!hasSession) {
    next();
    return;
  }
  const cookie = cookieText(req.cookies, CSRF_COOKIE);
  const header = req.get(CSRF_HEADER);
  if (!cookie || !header || !safeEqual(cookie, header)) {
    next(
      forbidden(
        'csrf_failed',
        `send the ${CSRF_HEADER} header with the value of the ${CSRF_COOKIE} cookie`,
      ),
    );
    return;
  }
  next();
};
