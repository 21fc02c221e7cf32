import { fileTypeFromBuffer } from 'file-type';

/** The kinds of file a component may carry: drawings, photos, certificates. */
export const ALLOWED_TYPES = {
  'application/pdf': { extension: 'pdf', label: 'PDF document' },
  'image/png': { extension: 'png', label: 'PNG image' },
  'image/jpeg': { extension: 'jpg', label: 'JPEG image' },
  'image/vnd.dxf': { extension: 'dxf', label: 'DXF drawing' },
} as const;

export type AllowedType = keyof typeof ALLOWED_TYPES;

export type SniffResult =
  | { readonly ok: true; readonly type: AllowedType }
  | { readonly ok: false; readonly reason: string };

// AutoCAD DXF: binary files start with a fixed sentinel; ASCII files with a
// group code 0 line followed by SECTION (optionally after 999 comment groups).
const BINARY_DXF = Buffer.from('AutoCAD Binary DXF\r\n\x1a\x00', 'latin1');

function looksLikeAsciiDxf(bytes: Buffer): boolean {
  const head = bytes.subarray(0, 4096).toString('latin1');
  // eslint-disable-next-line no-control-regex -- a text file has no control characters but tab, LF and CR
  if (/[\x00-\x08\x0e-\x1f]/.test(head)) return false;
  const lines = head.split(/\r?\n/).map((line) => line.trim());
  let i = 0;
  while (lines[i] === '999') i += 2; // comments
  return lines[i] === '0' && lines[i + 1] === 'SECTION';
}

/**
 * What the bytes are, from their content alone (never the name or the
 * client's Content-Type). Anything but PDF, PNG, JPEG or DXF is refused.
 */
export async function sniffFileType(bytes: Buffer): Promise<SniffResult> {
  if (bytes.length === 0) return { ok: false, reason: 'the file is empty' };
  if (bytes.subarray(0, BINARY_DXF.length).equals(BINARY_DXF) || looksLikeAsciiDxf(bytes)) {
    return { ok: true, type: 'image/vnd.dxf' };
  }
  const detected = await fileTypeFromBuffer(bytes);
  if (detected && detected.mime in ALLOWED_TYPES)
    return { ok: true, type: detected.mime as AllowedType };
  const what = detected ? `${detected.mime} (.${detected.ext})` : 'not a recognised file type';
  return {
    ok: false,
    reason: `the content is ${what}; only PDF, PNG, JPEG and DXF files are accepted`,
  };
}

export type NameCheck =
  { readonly ok: true; readonly name: string } | { readonly ok: false; readonly reason: string };

/**
 * A file name as a person gave it, made safe to show and to send back in a
 * Content-Disposition header. Names that try to be paths are refused outright,
 * not silently cut down.
 */
export function checkFileName(raw: string): NameCheck {
  const name = raw.normalize('NFC').trim();
  if (name === '') return { ok: false, reason: 'the file needs a name' };
  if (/[/\\]/.test(name)) return { ok: false, reason: 'the file name must not contain a path' };
  if (name.includes('..')) return { ok: false, reason: 'the file name must not contain ".."' };
  // eslint-disable-next-line no-control-regex -- refusing control characters is the point
  if (/[\u0000-\u001f\u007f]/.test(name))
    return { ok: false, reason: 'the file name contains control characters' };
  if (name.startsWith('.')) return { ok: false, reason: 'the file name must not start with a dot' };
  if (name.length > 120)
    return { ok: false, reason: 'the file name is longer than 120 characters' };
  return { ok: true, name: name.replace(/\s+/g, ' ').replace(/["<>|:*?]/g, '_') };
}
