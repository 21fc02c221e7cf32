import { z } from 'zod';

/** Field schemas the request schemas share, with the messages the API answers. */

/** An id in a path or a body: a UUID. */
export const uuid = z.uuid({ error: 'must be a UUID' });

export const idParams = z.object({ id: uuid }).strict();

/** Trimmed one-line text with a length range. */
export function text(min: number, max: number) {
  return z
    .string({ error: (i) => (i.input === undefined ? 'is required' : 'must be text') })
    .trim()
    .min(min, min === 1 ? 'is required' : `must be at least ${min} characters`)
    .max(max, `must be at most ${max} characters`);
}

export const email = z
  .string({ error: (i) => (i.input === undefined ? 'is required' : 'must be text') })
  .trim()
  .toLowerCase()
  .max(320, 'must be at most 320 characters')
  .pipe(z.email({ error: 'must be an e-mail address' }));

/** Passwords: long enough to resist guessing; no composition rules (NIST SP 800-63B §5.1.1). */
export const newPassword = z
  .string({ error: (i) => (i.input === undefined ? 'is required' : 'must be text') })
  .min(10, 'must be at least 10 characters')
  .max(256, 'must be at most 256 characters')
  .refine((p) => p.trim().length > 0, 'must not be only spaces');

/** Optimistic version a client read; 409 stale_version when it has moved. */
export const version = z
  .number({ error: (i) => (i.input === undefined ? 'is required' : 'must be a whole number') })
  .int('must be a whole number')
  .min(1, 'must be at least 1')
  .max(2_147_483_647, 'is out of range');

/** Calc inputs: an object; the calc's own schema checks it in the service (issues under `inputs.`). */
export const calcInputs = z.record(z.string(), z.unknown(), {
  error: (i) =>
    i.input === undefined ? 'is required' : 'must be a component object with a "kind"',
});

export const emptyBody = z.object({}).strict();

export const MAX_PAGE_SIZE = 100;

/** `?page&pageSize`: page from 1, pageSize 1–100, 25 by default. */
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

/** A page of a list, as every list route answers. */
export function pageOf<T extends z.ZodType>(item: T) {
  return z
    .object({
      items: z.array(item).readonly(),
      page: z.number().int(),
      pageSize: z.number().int(),
      total: z.number().int(),
    })
    .strict();
}
