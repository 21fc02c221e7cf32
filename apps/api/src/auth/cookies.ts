import type { CookieOptions, Response } from 'express';
import type { AuthConfig } from '../config/config';
import type { IssuedSession } from '../credentials/tokens';

export const ACCESS_COOKIE = 'hl_access';
export const REFRESH_COOKIE = 'hl_refresh';
export const CSRF_COOKIE = 'hl_csrf';
export const CSRF_HEADER = 'x-csrf-token';

function options(auth: AuthConfig) {
  const base = { secure: auth.cookieSecure } as const;
  return {
    access: {
      ...base,
      httpOnly: true,
      sameSite: 'lax',
      path: '/api',
      maxAge: auth.accessTokenTtl * 1000,
    } satisfies CookieOptions,
    refresh: {
      ...base,
      httpOnly: true,
      sameSite: 'strict',
      path: '/api/auth',
      maxAge: auth.refreshTokenTtl * 1000,
    } satisfies CookieOptions,
    // Readable by the web app (double submit); lives as long as the refresh
    // token so a refresh after a browser restart can still send it.
    csrf: {
      ...base,
      httpOnly: false,
      sameSite: 'strict',
      path: '/',
      maxAge: auth.refreshTokenTtl * 1000,
    } satisfies CookieOptions,
  };
}

export function setSessionCookies(res: Response, auth: AuthConfig, session: IssuedSession): void {
  const o = options(auth);
  res.cookie(ACCESS_COOKIE, session.accessToken, o.access);
  res.cookie(REFRESH_COOKIE, session.refreshToken, o.refresh);
  res.cookie(CSRF_COOKIE, session.csrfToken, o.csrf);
}

export function clearSessionCookies(res: Response, auth: AuthConfig): void {
  const o = options(auth);
  for (const [name, opts] of [
    [ACCESS_COOKIE, o.access],
    [REFRESH_COOKIE, o.refresh],
    [CSRF_COOKIE, o.csrf],
  ] as const) {
    const { maxAge: _maxAge, ...rest } = opts;
    res.clearCookie(name, rest);
  }
}

/** A cookie value as text, or undefined (cookie-parser may yield objects for "j:" values). */
export function cookieText(cookies: unknown, name: string): string | undefined {
  if (!cookies || typeof cookies !== 'object') return undefined;
  const value = (cookies as Record<string, unknown>)[name];
  return typeof value === 'string' && value.length > 0 && value.length <= 4096 ? value : undefined;
}
