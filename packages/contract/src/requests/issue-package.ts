import { z } from 'zod';
import { sheetQuery } from './sheets';

/** GET /projects/:id/package.pdf: `?paper=a4|letter`, as a sheet. */
export const packageQuery = sheetQuery;

/**
 * A package code as anyone types it (PKG-xxxx-xxxx-xxxx, dashes, spaces and
 * case ignored), or "pkg" and the full 64-digit package hash. Parsed to the
 * hex digits after "pkg".
 */
export const packageVerifyParams = z
  .object({
    code: z
      .string()
      .transform((s) => s.replace(/[\s-]/g, '').toLowerCase())
      .pipe(
        z
          .string()
          .regex(
            /^pkg(?:[0-9a-f]{12}|[0-9a-f]{64})$/,
            'must be a package code (PKG-xxxx-xxxx-xxxx) or "PKG-" and the 64-digit package hash',
          )
          .transform((s) => s.slice(3)),
      ),
  })
  .strict();
