import type { Page } from '@hoopline/contract';

export type { Page };

// The query shape (`?page&pageSize`) is the contract's (paginationShape in
// @hoopline/contract); here: what a service does with a parsed page request.

export interface PageRequest {
  readonly page: number;
  readonly pageSize: number;
}

export function offsetOf(p: PageRequest): number {
  return (p.page - 1) * p.pageSize;
}

export function pageOf<T>(items: readonly T[], p: PageRequest, total: number): Page<T> {
  return { items, page: p.page, pageSize: p.pageSize, total };
}
