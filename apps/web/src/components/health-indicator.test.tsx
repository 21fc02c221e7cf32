import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { HealthIndicator } from './health-indicator';

function renderWithQuery() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <HealthIndicator />
    </QueryClientProvider>,
  );
}

function respond(status: number, body: unknown) {
  vi.stubGlobal(
    'fetch',
    vi.fn(
      async () =>
        new Response(JSON.stringify(body), {
          status,
          headers: { 'content-type': 'application/json' },
        }),
    ),
  );
}

describe('HealthIndicator', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('says the server and database are online', async () => {
    respond(200, {
      status: 'ok',
      database: { reachable: true, latencyMs: 1 },
      engine: { version: '9.9.9' },
      time: '',
    });
    renderWithQuery();
    expect(await screen.findByText(/database online \(engine 9\.9\.9\)/)).toBeInTheDocument();
  });

  it('says when the database is unreachable (503 carries the health document)', async () => {
    respond(503, {
      status: 'degraded',
      database: { reachable: false, latencyMs: 1 },
      engine: { version: '1' },
      time: '',
    });
    renderWithQuery();
    expect(await screen.findByText('Server online, database unreachable')).toBeInTheDocument();
  });

  it('says when the server cannot be reached', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('network'))),
    );
    renderWithQuery();
    expect(await screen.findByText('Server unreachable')).toBeInTheDocument();
  });
});
