import { z } from 'zod';
import { componentKind, revisionStatus, verdict } from '../enums';

/**
 * GET /projects/:id/components/table: every component of a project with its
 * latest revision (a fabricator: its issued one) and that revision's
 * governing check as its stored report gives it. Nothing is screened again:
 * a report from another engine version says so by its `engineVersion`.
 */
export const componentTableRow = z
  .object({
    component: z
      .object({ id: z.string(), name: z.string(), kind: componentKind, tag: z.string() })
      .strict(),
    revision: z
      .object({
        id: z.string(),
        number: z.number().int(),
        status: revisionStatus,
        /** A countersigned revision a later countersign replaced. */
        superseded: z.boolean(),
        verdict,
        /** The engine version that computed the stored report. */
        engineVersion: z.string(),
        createdAt: z.string(),
        submittedAt: z.string().nullable(),
        decidedAt: z.string().nullable(),
      })
      .strict()
      .nullable(),
    /** The stored report's governing check; null for a report without checks. */
    governing: z
      .object({
        checkId: z.string(),
        checkLabel: z.string(),
        loadCase: z.string(),
        utilisation: z.number(),
      })
      .strict()
      .nullable(),
    /** The number of the latest countersigned revision, if any. */
    issuedRevisionNumber: z.number().int().nullable(),
  })
  .strict();
export type ComponentTableRow = z.infer<typeof componentTableRow>;

export const componentTable = z
  .object({
    projectId: z.string(),
    /** Today's engine version: a row whose report another version computed is marked so. */
    engineVersion: z.string(),
    rows: z.array(componentTableRow),
  })
  .strict();
export type ComponentTable = z.infer<typeof componentTable>;
