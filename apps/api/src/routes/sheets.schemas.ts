import { z } from 'zod';

export const sheetQuery = z
  .object({
    paper: z
      .enum(['a4', 'letter'], { error: 'must be "a4" or "letter"' })
      .default('a4')
      .transform((p) => (p === 'a4' ? ('A4' as const) : ('LETTER' as const))),
  })
  .strict();
