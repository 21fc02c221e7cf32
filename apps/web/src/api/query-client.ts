import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './client';

function shouldRetry(failureCount: number, error: unknown): boolean {
  // A 4xx is an answer, not a hiccup: retrying a 404 or 403 only delays the page.
  if (error instanceof ApiError && error.status < 500) return false;
  return failureCount < 1;
}

/** One client for the app; route loaders and components share its cache. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 10_000, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
}

export const queryClient = createQueryClient();
