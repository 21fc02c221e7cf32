import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { apiFetch, query, type Page } from './client';
import type { IssuedItem, QueueItem, ReturnedItem } from '@hoopline/contract';

/** Revisions awaiting the signed-in checker, oldest submitted first (the server's order). */
export function useCheckQueue(page = 1) {
  return useQuery({
    queryKey: ['check-queue', page],
    queryFn: () => apiFetch<Page<QueueItem>>(`/check-queue${query({ page, pageSize: 50 })}`),
    placeholderData: keepPreviousData,
  });
}

export function useIssued(params: { q?: string; page?: number }) {
  return useQuery({
    queryKey: ['issued', params],
    queryFn: () => apiFetch<Page<IssuedItem>>(`/issued${query({ ...params, pageSize: 50 })}`),
    placeholderData: keepPreviousData,
  });
}

/** My revisions a checker returned that are still their component's latest, newest return first. */
export function useReturned(page = 1, options: { enabled?: boolean } = {}) {
  return useQuery({
    queryKey: ['returned', page],
    queryFn: () => apiFetch<Page<ReturnedItem>>(`/returned${query({ page, pageSize: 50 })}`),
    placeholderData: keepPreviousData,
    enabled: options.enabled ?? true,
  });
}
