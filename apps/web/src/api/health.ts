import { useQuery } from '@tanstack/react-query';
import { ApiError, apiFetch } from './client';

export interface Health {
  status: 'ok' | 'degraded';
  database: { reachable: boolean; latencyMs: number };
  engine: { version: string };
  time: string;
}

async function fetchHealth(): Promise<Health> {
  try {
    return await apiFetch<Health>('/health');
  } catch (error) {
    // 503 still carries the health document.
    if (error instanceof ApiError && error.status === 503 && error.body)
      return error.body as Health;
    throw error;
  }
}

export function useHealth() {
  return useQuery({ queryKey: ['health'], queryFn: fetchHealth, refetchInterval: 30_000 });
}
