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

export const countersignBody = z.object({ hash, comment: text(0, 5000).optional() }).strict();

export const returnBody = z.object({ hash, comment: text(1, 5000) }).strict();

export const queueQuery = paginationQuery;
