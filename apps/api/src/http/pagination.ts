import { z } from 'zod';

export const MAX_PAGE_SIZE = 100;

/** `?page&pageSize` (API.md): page from 1, pageSize 1–100, 25 by default. */
export const paginationShape = {
  page: z.coerce
    .number({ error: 'must be a whole number' })
    .int('must be a whole number')
    .min(1, 'must be at least 1')
    .max(100_000, 'must be at most 100000')
    .default(1),
  pageSize: z.coerce
    .number({ error: 'must be a whole number' })
    .int('must be a whole number')
    .min(1, 'must be at least 1')
    .max(MAX_PAGE_SIZE, `must be at most ${MAX_PAGE_SIZE}`)
    .default(25),
};

export const paginationQuery = z.object(paginationShape).strict();

export interface PageRequest {
  readonly page: number;
  readonly pageSize: number;
}

export interface Page<T> {
  readonly items: readonly T[];
  readonly page: number;
  readonly pageSize: number;
  readonly total: number;
}

export function offsetOf(p: PageRequest): number {
  return (p.page - 1) * p.pageSize;
}

export function pageOf<T>(items: readonly T[], p: PageRequest, total: number): Page<T> {
  return { items, page: p.page, pageSize: p.pageSize, total };
}
