import { z } from 'zod';

/** Multipart uploads carry one part, `file`; other fields are refused. */
export const uploadFields = z.object({}).strict();

export const contentQuery = z
  .object({
    disposition: z
      .enum(['attachment', 'inline'], { error: 'must be "attachment" or "inline"' })
      .optional(),
  })
  .strict();

export type ContentQuery = z.infer<typeof contentQuery>;
