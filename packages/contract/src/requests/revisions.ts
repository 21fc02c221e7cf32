import { z } from 'zod';
import { calcInputs, paginationQuery, text, uuid, version } from '../fields';

export const listRevisionsQuery = paginationQuery;

export const createRevisionBody = z
  .object({ inputs: calcInputs, baseVersion: version, note: text(0, 2000).optional() })
  .strict();

export const diffQuery = z.object({ against: uuid }).strict();

const hash = z
  .string({ error: (i) => (i.input === undefined ? 'is required' : 'must be text') })
  .regex(/^[0-9a-f]{64}$/, 'must be the 64-digit SHA-256 (hex) of the revision you checked');

/** The checker's password, where the project asks for it again at sign-off. */
const password = z
  .string({ error: 'must be text' })
  .min(1, 'is required')
  .max(1024, 'must be at most 1024 characters');

export const countersignBody = z
  .object({ hash, comment: text(0, 5000).optional(), password: password.optional() })
  .strict();

/** At most this many step remarks on one return. */
export const MAX_STEP_REMARKS = 50;

/**
 * A checker's remark on one trail step (issue 16.1): `step` is the step's
 * number as the trail and the sheet print it (1…N, common steps first:
 * @hoopline/present numberedSteps). A number the revision's trail does not
 * have is a 400 naming `remarks.N.step` (checked in the service).
 */
export const stepRemark = z
  .object({
    step: z
      .number({ error: (i) => (i.input === undefined ? 'is required' : 'must be a step number') })
      .int('must be a whole step number')
      .min(1, 'must be a step number from 1')
      .max(10_000, 'is not a step of this trail'),
    text: text(1, 2000),
  })
  .strict();
export type StepRemark = z.infer<typeof stepRemark>;

export const returnBody = z
  .object({
    hash,
    comment: text(1, 5000),
    remarks: z
      .array(stepRemark, { error: 'must be a list of { step, text }' })
      .max(MAX_STEP_REMARKS, `must be at most ${MAX_STEP_REMARKS} remarks`)
      .optional(),
    password: password.optional(),
  })
  .strict();

export type CountersignBody = z.infer<typeof countersignBody>;
export type ReturnBody = z.infer<typeof returnBody>;

/** GET /returned: revisions returned to me (issue 16.1). */
export const returnedQuery = paginationQuery;

export const queueQuery = paginationQuery;
