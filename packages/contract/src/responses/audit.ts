import { z } from 'zod';
import { personRef } from './people';

/**
 * The records an event is about, with the names and numbers the log shows and
 * links to; each null when the event has none (or the record is gone).
 */
export const auditTarget = z
  .object({
    project: z.object({ id: z.string(), number: z.string(), name: z.string() }).strict().nullable(),
    component: z.object({ id: z.string(), tag: z.string(), name: z.string() }).strict().nullable(),
    revision: z.object({ id: z.string(), number: z.number().int() }).strict().nullable(),
    /** The person a user, member or invitation event is about (id null for an invitation not yet accepted). */
    person: z.object({ id: z.string().nullable(), name: z.string() }).strict().nullable(),
    /** The file of an attachment event. */
    fileName: z.string().nullable(),
  })
  .strict();
export type AuditTarget = z.infer<typeof auditTarget>;

export const auditEvent = z
  .object({
    id: z.string(),
    actor: personRef.nullable(),
    /**
     * One of AUDIT_ACTIONS when written by this version; read as any string so
     * codes stored by older versions still parse (their words fall back to the code).
     */
    action: z.string(),
    entityType: z.string(),
    entityId: z.string().nullable(),
    projectId: z.string().nullable(),
    target: auditTarget,
    summary: z.object({ before: z.unknown().optional(), after: z.unknown().optional() }).strict(),
    createdAt: z.string(),
  })
  .strict();
export type AuditEvent = z.infer<typeof auditEvent>;
