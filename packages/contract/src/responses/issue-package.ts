import { z } from 'zod';
import { componentKind, verdict } from '../enums';

/** One countersigned revision an issue package holds, as its index prints it. */
export const packageEntry = z
  .object({
    componentName: z.string(),
    tag: z.string(),
    kind: componentKind,
    revisionNumber: z.number().int(),
    contentHash: z.string(),
    verdict,
    governing: z
      .object({ checkLabel: z.string(), loadCase: z.string(), utilisation: z.number() })
      .strict()
      .nullable(),
    preparedBy: z.string(),
    /** When the designer submitted it for check (their sign-off). */
    submittedAt: z.string().nullable(),
    countersignedBy: z.string(),
    countersignedAt: z.string(),
    /** 'superseded': a later revision of this component has been countersigned since. */
    status: z.enum(['current', 'superseded']),
    /** The number of that later countersigned revision. */
    supersededBy: z.number().int().nullable(),
  })
  .strict();
export type PackageEntry = z.infer<typeof packageEntry>;

/**
 * GET /verify/packages/:code (public): does a package code belong to an
 * issue package, and is its set still the current one? Beyond that, what the
 * index prints, so the holder can compare the paper.
 */
export const packageVerifyResult = z.discriminatedUnion('match', [
  z.object({ match: z.literal(false) }).strict(),
  z
    .object({
      match: z.literal(true),
      /** PKG-xxxx-xxxx-xxxx, as printed. */
      packageCode: z.string(),
      /** SHA-256 over the project id and the sorted content hashes of the revisions it holds. */
      packageHash: z.string(),
      /** 'superseded': some component has a newer countersigned revision, or one countersigned since. */
      status: z.enum(['current', 'superseded']),
      projectNumber: z.string(),
      projectName: z.string(),
      /** When this set was first issued (its first download). */
      issuedAt: z.string(),
      components: z.array(packageEntry),
      /** Components countersigned for the first time since: the package does not hold them. */
      countersignedSince: z.array(
        z
          .object({ componentName: z.string(), tag: z.string(), revisionNumber: z.number().int() })
          .strict(),
      ),
    })
    .strict(),
]);
export type PackageVerifyResult = z.infer<typeof packageVerifyResult>;
