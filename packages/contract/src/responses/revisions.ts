import type { Report } from '@hoopline/calc';
import { z } from 'zod';
import { componentKind, revisionStatus, verdict } from '../enums';
import { personRef } from './people';

export const revisionSummary = z
  .object({
    id: z.string(),
    number: z.number().int(),
    status: revisionStatus,
    verdict,
    contentHash: z.string(),
    author: personRef,
    createdAt: z.string(),
    submittedAt: z.string().nullable(),
    decidedAt: z.string().nullable(),
    superseded: z.boolean(),
  })
  .strict();
export type RevisionSummary = z.infer<typeof revisionSummary>;

export const signOff = z
  .object({
    id: z.string(),
    checker: personRef,
    decision: z.enum(['countersigned', 'returned']),
    comment: z.string(),
    hashSigned: z.string(),
    createdAt: z.string(),
    /** A return's remarks by trail step (issue 16.1), in the order given; [] for none. */
    remarks: z.array(z.object({ step: z.number().int(), text: z.string() }).strict()),
  })
  .strict();
export type SignOff = z.infer<typeof signOff>;

/** The engine's report as stored (its shape is the engine's; only its presence is checked here). */
const report = z.custom<Report>(
  (value) => value !== null && typeof value === 'object' && 'verdict' in value && 'cases' in value,
  'must be an engine report',
);

export const revision = revisionSummary
  .extend({
    componentId: z.string(),
    projectId: z.string(),
    note: z.string(),
    inputs: z.record(z.string(), z.unknown()),
    engineVersion: z.string(),
    report,
    signOffs: z.array(signOff),
    verifyCode: z.string(),
  })
  .strict();
export type Revision = z.infer<typeof revision>;

/** Something the workflow did but wants a person to know (issue 16.3). */
export const workflowWarning = z
  .object({
    /** no_checker: the project has no checker but the author, so nobody can countersign yet. */
    code: z.enum(['no_checker']),
    message: z.string(),
    /** The names of those who can put it right (the project's owner, then administrators). */
    whoCanAdd: z.array(z.string()),
  })
  .strict();
export type WorkflowWarning = z.infer<typeof workflowWarning>;

/** POST /revisions/:id/submit: the revision, with warnings when there are any. */
export const submittedRevision = revision
  .extend({ warnings: z.array(workflowWarning).optional() })
  .strict();
export type SubmittedRevision = z.infer<typeof submittedRevision>;

export const component = z
  .object({
    id: z.string(),
    projectId: z.string(),
    name: z.string(),
    kind: componentKind,
    tag: z.string(),
    version: z.number().int(),
    createdAt: z.string(),
    updatedAt: z.string(),
    latestRevision: revisionSummary.nullable(),
    issuedRevision: revisionSummary.nullable(),
  })
  .strict();
export type Component = z.infer<typeof component>;

/** POST /projects/:id/components and POST /components/:id/revisions. */
export const componentWithRevision = z.object({ component, revision }).strict();
export type ComponentWithRevision = z.infer<typeof componentWithRevision>;

export const change = z
  .object({
    path: z.string(),
    label: z.string().optional(),
    before: z.unknown(),
    after: z.unknown(),
  })
  .strict();
export type Change = z.infer<typeof change>;

export const revisionDiff = z
  .object({
    from: revisionSummary,
    to: revisionSummary,
    inputs: z.array(change),
    results: z.array(change),
    verdictChanged: z.boolean(),
  })
  .strict();
export type RevisionDiff = z.infer<typeof revisionDiff>;

const projectRef = z.object({ id: z.string(), number: z.string(), name: z.string() }).strict();
const componentRef = z.object({ id: z.string(), name: z.string(), kind: componentKind }).strict();

/** The check queue: a revision awaiting check, with its project and component. */
export const queueItem = revisionSummary
  .extend({ project: projectRef, component: componentRef })
  .strict();
export type QueueItem = z.infer<typeof queueItem>;

/**
 * GET /returned: a revision returned to me (its author) that is still its
 * component's latest, with who returned it, when, the comment's start and
 * how many step remarks it carries.
 */
export const returnedItem = z
  .object({
    project: projectRef,
    component: componentRef,
    revision: revisionSummary,
    returnedBy: personRef,
    returnedAt: z.string(),
    /** The comment's first 200 characters, an ellipsis where it was cut. */
    commentExcerpt: z.string(),
    remarkCount: z.number().int(),
  })
  .strict();
export type ReturnedItem = z.infer<typeof returnedItem>;

/** The issued list: a countersigned revision, with its project and component. */
export const issuedItem = z
  .object({ project: projectRef, component, revision: revisionSummary })
  .strict();
export type IssuedItem = z.infer<typeof issuedItem>;

/** GET /revisions/:id/integrity. */
export const integrity = z
  .object({
    /** Whether the stored inputs, engine version and report still hash to the stored hash. */
    matches: z.boolean(),
    storedHash: z.string(),
    recomputedHash: z.string(),
    /** Whether every sign-off signed the hash the data has now; null without sign-offs. */
    signOffsMatch: z.boolean().nullable(),
    /** Whether today's engine on the stored inputs gives the stored report; null for another engine version. */
    reproduces: z.boolean().nullable(),
  })
  .strict();
export type Integrity = z.infer<typeof integrity>;

/**
 * GET /verify/:code (public). Beyond "it matches", what the sheet prints, so
 * its holder can compare the paper: an altered sheet with a copied code is caught.
 */
export const verifyResult = z.discriminatedUnion('match', [
  z.object({ match: z.literal(false) }).strict(),
  z
    .object({
      match: z.literal(true),
      status: z.enum(['current', 'superseded']),
      projectNumber: z.string(),
      componentName: z.string(),
      revisionNumber: z.number().int(),
      countersignedAt: z.string(),
      contentHash: z.string(),
      kind: componentKind,
      /** The wall or plate thickness screened, m (SI), where the kind has one. */
      thickness: z.number().nullable(),
      material: z.string().nullable(),
      verdict,
      governing: z
        .object({ loadCase: z.string(), checkLabel: z.string(), utilisation: z.number() })
        .strict()
        .nullable(),
      preparedBy: z.string(),
      countersignedBy: z.string(),
    })
    .strict(),
]);
export type VerifyResult = z.infer<typeof verifyResult>;
