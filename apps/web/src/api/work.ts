import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { apiFetch, query, type Page } from './client';
import type { IssuedItem, QueueItem } from '@hoopline/contract';

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
