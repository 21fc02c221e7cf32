import { z } from 'zod';
import { paginationShape } from '../http/pagination';
import { calcInputs, text, uuid } from './common.schemas';

export const issuedQuery = z.object({ ...paginationShape, q: text(0, 200).optional() }).strict();

const time = z.iso
  .datetime({ offset: true, error: 'must be an ISO 8601 date-time, e.g. 2026-05-01T00:00:00Z' })
  .transform((s) => new Date(s));

export const auditQuery = z
  .object({
    ...paginationShape,
    projectId: uuid.optional(),
    actorId: uuid.optional(),
    action: text(1, 80).optional(),
    entityType: text(1, 40).optional(),
    from: time.optional(),
    to: time.optional(),
  })
  .strict();

/** A full hash or a verify code, dashes and case as anyone types them. */
export const verifyParams = z
  .object({
    code: z
      .string()
      .transform((s) => s.replace(/[\s-]/g, '').toLowerCase())
      .pipe(
        z
          .string()
          .regex(
            /^(?:[0-9a-f]{12}|[0-9a-f]{64})$/,
            'must be a 64-digit hash or a 12-digit verify code (xxxx-xxxx-xxxx)',
          ),
      ),
  })
  .strict();

export const screenBatchBody = z
  .object({
    cases: z
      .array(z.unknown(), { error: 'must be a list of component inputs' })
      .min(1, 'give at least one case')
      .max(500, 'at most 500 cases in one request'),
  })
  .strict();

/** A calc input (checked by the calc) or a batch; either way a JSON object. */
export const screenBody = calcInputs;
