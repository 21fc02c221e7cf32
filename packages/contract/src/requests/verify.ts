import { z } from 'zod';

/** A full hash or a verify code, dashes and case as anyone types them. */
export const verifyParams = z
  .object({
    code: z
      .string()
      .transform((s) => s.replace(/[\s-]/g, '').toLowerCase())
      .pipe(
        z
          .string()
          .regex(
            /^(?:[0-9a-f]{12}|[0-9a-f]{64})$/,
            'must be a 64-digit hash or a 12-digit verify code (xxxx-xxxx-xxxx)',
          ),
      ),
  })
  .strict();
