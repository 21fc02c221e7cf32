import { z } from 'zod';
import { paginationShape, text, uuid } from '../fields';

const time = z.iso
  .datetime({ offset: true, error: 'must be an ISO 8601 date-time, e.g. 2026-05-01T00:00:00Z' })
  .transform((s) => new Date(s));

/** The log's filters, every one optional. */
const auditFilterShape = {
  projectId: uuid.optional(),
  actorId: uuid.optional(),
  action: text(1, 80).optional(),
  entityType: text(1, 40).optional(),
  from: time.optional(),
  to: time.optional(),
};

/** GET /audit: a page of the filtered log. */
export const auditQuery = z.object({ ...paginationShape, ...auditFilterShape }).strict();

/** GET /audit.csv: the whole filtered log (no pages). */
export const auditExportQuery = z.object(auditFilterShape).strict();
