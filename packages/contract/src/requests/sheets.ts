import { z } from 'zod';
import { paperSize } from '../enums';

/**
 * `?paper=a4|letter`, as react-pdf names the size; left out, the project's
 * unit system chooses (US customary: Letter, SI: A4).
 */
export const sheetQuery = z
  .object({
    paper: paperSize
      .optional()
      .transform((p) =>
        p === undefined ? undefined : p === 'a4' ? ('A4' as const) : ('LETTER' as const),
      ),
  })
  .strict();
