import { z } from 'zod';
import { personRef } from './people';

export const attachment = z
  .object({
    id: z.string(),
    componentId: z.string(),
    name: z.string(),
    /** SHA-256 of the bytes, hex. */
    sha256: z.string(),
    /** Bytes. */
    size: z.number().int(),
    /** As sniffed from the content: application/pdf, image/png, image/jpeg, image/vnd.dxf. */
    contentType: z.string(),
    /** The server's words for the type ("PDF document"). */
    kind: z.string(),
    uploadedBy: personRef.nullable(),
    createdAt: z.string(),
  })
  .strict();
export type Attachment = z.infer<typeof attachment>;
