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

export const returnBody = z
  .object({ hash, comment: text(1, 5000), password: password.optional() })
  .strict();

export type CountersignBody = z.infer<typeof countersignBody>;
export type ReturnBody = z.infer<typeof returnBody>;

export const queueQuery = paginationQuery;
