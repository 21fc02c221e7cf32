import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { vi } from 'vitest';
import { meQuery } from '../api/session';
import type { Me } from '@hoopline/contract';

export const ME: Me = {
  user: {
    id: 'u-designer',
    email: 'dana@example.test',
    name: 'Dana Designer',
    isAdmin: false,
    active: true,
    unitSystem: 'si',
    vacuumUnit: null,
    mayCreateProjects: true,
    createdAt: '2026-01-01T00:00:00Z',
  },
  memberships: [{ projectId: 'p1', projectNumber: 'HL-1', role: 'designer' }],
  canCreateProjects: true,
};

/** Renders inside a router and a fresh query client, with the signed-in user in the cache. */
export function renderApp(
  element: ReactElement,
  { me = ME, path = '/' }: { me?: Me; path?: string } = {},
) {
  const client = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  client.setQueryData(meQuery.queryKey, me);
  const router = createMemoryRouter([{ path: '*', element }], { initialEntries: [path] });
  return {
    client,
    router,
    ...render(
      <QueryClientProvider client={client}>
        <RouterProvider router={router} />
      </QueryClientProvider>,
    ),
  };
}

export interface Reply {
  readonly status?: number;
  /** Sent as JSON. */
  readonly body?: unknown;
  /** Sent as is instead of `body` (a file download), with `headers`. */
  readonly raw?: BodyInit;
  readonly headers?: Record<string, string>;
}

/**
 * A fake server: routes "METHOD /path" (path without /api, query ignored) to
 * replies. An unrouted request answers 404 the API's way.
 */
export function fakeApi(
  routes: Record<string, Reply | ((init: RequestInit | undefined) => Reply)>,
) {
  const calls: { method: string; path: string; search: string; init: RequestInit | undefined }[] =
    [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), 'http://localhost');
    const method = (init?.method ?? 'GET').toUpperCase();
    const path = url.pathname.replace(/^\/api/, '');
    calls.push({ method, path, search: url.search, init });
    const route = routes[`${method} ${path}`];
    const reply = typeof route === 'function' ? route(init) : route;
    if (!reply) {
      return new Response(JSON.stringify({ error: { code: 'not_found', message: 'not found' } }), {
        status: 404,
      });
    }
    if (reply.raw !== undefined) {
      return new Response(reply.raw, { status: reply.status ?? 200, headers: reply.headers ?? {} });
    }
    // A 204 may carry no body at all (the Response constructor refuses even an empty one).
    const text =
      reply.body === undefined ? (reply.status === 204 ? null : '') : JSON.stringify(reply.body);
    return new Response(text, {
      status: reply.status ?? 200,
      headers: { 'content-type': 'application/json', ...reply.headers },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { calls, fetchMock };
}
