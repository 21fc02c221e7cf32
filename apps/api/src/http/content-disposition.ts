import { create } from 'content-disposition';

/**
 * An RFC 6266 Content-Disposition header, built by the `content-disposition`
 * package: a quoted ISO-8859-1 `filename` fallback and, for anything else, the
 * RFC 8187 UTF-8 `filename*`, with quotes, backslashes, control and
 * non-Latin characters escaped so that no name can break out of the header.
 */
export function contentDisposition(kind: 'attachment' | 'inline', name: string): string {
  return create(name, { type: kind });
}
