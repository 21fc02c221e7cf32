import { z } from 'zod';

/** Every error answer: a stable code, a message a person can act on, and the fields at fault. */
export const apiError = z
  .object({
    error: z
      .object({
        code: z.string(),
        message: z.string(),
        fields: z.array(z.object({ path: z.string(), message: z.string() }).strict()).optional(),
        retryAfterSeconds: z.number().optional(),
      })
      .passthrough(),
  })
  .strict();
export type ApiErrorBody = z.infer<typeof apiError>;
