import { z } from 'zod';
import { personRef } from './people';

export const auditEvent = z
  .object({
    id: z.string(),
    actor: personRef.nullable(),
    action: z.string(),
    entityType: z.string(),
    entityId: z.string().nullable(),
    projectId: z.string().nullable(),
    summary: z.object({ before: z.unknown().optional(), after: z.unknown().optional() }).strict(),
    createdAt: z.string(),
  })
  .strict();
export type AuditEvent = z.infer<typeof auditEvent>;
