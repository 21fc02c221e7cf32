import { fileTypeFromBuffer } from 'file-type';
import sanitizeFilename from 'sanitize-filename';

/** The kinds of file a component may carry: drawings, photos, certificates. */
export const ALLOWED_TYPES = {
  'application/pdf': { extension: 'pdf', label: 'PDF document' },
  'image/png': { extension: 'png', label: 'PNG image' },
  'image/jpeg': { extension: 'jpg', label: 'JPEG image' },
  'image/vnd.dxf': { extension: 'dxf', label: 'DXF drawing' },
} as const;

/** Extensions a name may keep for each type (anything else gets the type's own). */
const EXTENSIONS: Record<AllowedType, readonly string[]> = {
  'application/pdf': ['pdf'],
  'image/png': ['png'],
  'image/jpeg': ['jpg', 'jpeg'],
  'image/vnd.dxf': ['dxf'],
};

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
 * C0 and C1 controls, and the invisible format characters that make a name
 * read other than it is: bidirectional overrides and isolates (U+202E makes
 * "invoice‮fdp.exe" look like "invoiceexe.pdf"), zero-width characters and the
 * byte-order mark.
 */
// eslint-disable-next-line no-control-regex -- refusing control characters is the point
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u061c\u200b-\u200f\u202a-\u202e\u2060-\u2069\ufeff]/;

/** The name and what it says once percent-escapes are undone (a few rounds: "%252e" is "%2e"). */
function decodedForms(name: string): string[] {
  const forms = [name];
  let current = name;
  for (let round = 0; round < 3 && /%[0-9a-f]{2}/i.test(current); round += 1) {
    try {
      current = decodeURIComponent(current);
    } catch {
      // A stray "%": keep what decoded so far; the name itself is checked anyway.
      break;
    }
    forms.push(current);
  }
  return forms;
}

/**
 * A file name as a person gave it, checked. Names that try to be paths (also
 * percent-escaped, "%2e%2e%2fx.pdf") or carry control characters are refused
 * outright, not silently cut down.
 */
export function checkFileName(raw: string): NameCheck {
  const name = raw.normalize('NFC').trim();
  if (name === '') return { ok: false, reason: 'the file needs a name' };
  for (const form of decodedForms(name)) {
    if (/[/\\]/.test(form)) return { ok: false, reason: 'the file name must not contain a path' };
    if (form.includes('..')) return { ok: false, reason: 'the file name must not contain ".."' };
    if (CONTROL.test(form))
      return { ok: false, reason: 'the file name contains control characters' };
  }
  if (name.startsWith('.')) return { ok: false, reason: 'the file name must not start with a dot' };
  if (name.length > 120)
    return { ok: false, reason: 'the file name is longer than 120 characters' };
  return { ok: true, name: name.replace(/\s+/g, ' ').replace(/["<>|:*?]/g, '_') };
}

/**
 * The name a checked file is stored and sent under: characters no file system
 * takes replaced (sanitize-filename: reserved characters, Windows device
 * names, trailing dots), and an extension that follows the sniffed type, so
 * "x.pdf.js" holding a PDF becomes "x.pdf.pdf" and a PNG called "door.pdf"
 * becomes "door.png". What the person called it stays in the audit event.
 */
export function displayName(checkedName: string, type: AllowedType): string {
  const extension = ALLOWED_TYPES[type].extension;
  const dot = checkedName.lastIndexOf('.');
  const given = dot > 0 ? checkedName.slice(dot + 1).toLowerCase() : '';
  // A trailing ".js" or ".exe" is an extension and goes; "rev 1.2" keeps its ".2".
  const looksLikeExtension = /^(?=.*[a-z])[a-z0-9]{1,5}$/.test(given);
  const stem = looksLikeExtension ? checkedName.slice(0, dot) : checkedName;
  const safeStem = sanitizeFilename(stem, { replacement: '_' }).replace(/%/g, '_').trim() || 'file';
  const keep = EXTENSIONS[type].includes(given) ? given : extension;
  return `${safeStem.slice(0, 120 - keep.length - 1)}.${keep}`;
}
