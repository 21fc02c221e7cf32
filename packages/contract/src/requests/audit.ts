import { z } from 'zod';
import { paginationShape, text, uuid } from '../fields';

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
