import { redirect, type LoaderFunctionArgs } from 'react-router-dom';
import { ApiError } from '../api/client';
import { queryClient } from '../api/query-client';
import { meQuery } from '../api/session';
import type { Me } from '@hoopline/contract';

/** Where to come back to after signing in: only a path on this site, never another origin. */
export function safeNext(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/sign-in'))
    return '/';
  return next;
}

export function signInPath(from: string): string {
  return from === '/' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(from)}`;
}

/**
 * Loader of the signed-in layout: the session or a redirect to sign-in with
 * the deep link kept in ?next=. A lost connection reaches the error page.
 */
export async function requireSession({ request }: LoaderFunctionArgs): Promise<Me> {
  try {
    return await queryClient.ensureQueryData(meQuery);
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) {
      const url = new URL(request.url);
      throw redirect(signInPath(`${url.pathname}${url.search}`));
    }
    throw error;
  }
}

/** Sign-in page loader: someone already signed in goes straight on. */
export async function redirectIfSignedIn({ request }: LoaderFunctionArgs): Promise<null> {
  const next = safeNext(new URL(request.url).searchParams.get('next'));
  const cached = queryClient.getQueryData(meQuery.queryKey);
  if (cached) throw redirect(next);
  return null;
}
