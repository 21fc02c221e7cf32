import { z } from 'zod';
import { paperSize } from '../enums';

/** `?paper=a4|letter` (A4 by default), as react-pdf names the size. */
export const sheetQuery = z
  .object({
    paper: paperSize
      .default('a4')
      .transform((p) => (p === 'a4' ? ('A4' as const) : ('LETTER' as const))),
  })
  .strict();
