import { inflateSync } from 'node:zlib';
import { PDFArray, PDFDict, PDFDocument, PDFName, PDFStream, type PDFObject } from 'pdf-lib';

/**
 * Whether a PDF carries active content: script, actions that run when the
 * file opens or a field is touched, programs to launch, forms that submit,
 * embedded files or media. A drawing or a certificate needs none of it, and a
 * checker opening an attachment must not run anything.
 *
 * The document is parsed with pdf-lib, which reads compressed object streams
 * and undoes "#xx" escapes in names (so "/J#61vaScript" is "/JavaScript"),
 * and every object is walked. A file pdf-lib cannot parse is scanned as bytes,
 * its Flate streams inflated, instead.
 */

/** Dictionary keys that only active content uses (ISO 32000-1 §12.6, §12.7, §7.11.4, §13). */
const ACTIVE_KEYS = new Map<string, string>([
  ['JavaScript', 'JavaScript'],
  ['JS', 'JavaScript'],
  ['AA', 'actions run on opening, closing or touching a field (/AA)'],
  ['Launch', 'a program to launch (/Launch)'],
  ['EmbeddedFile', 'an embedded file'],
  ['EmbeddedFiles', 'an embedded file'],
  ['RichMedia', 'embedded media (/RichMedia)'],
  ['XFA', 'an XFA form (scriptable)'],
]);

/** Action types (/S) that run something or send something (ISO 32000-1 §12.6.4). */
const ACTIVE_ACTIONS = new Map<string, string>([
  ['JavaScript', 'JavaScript'],
  ['Launch', 'a program to launch (/Launch)'],
  ['SubmitForm', 'a form that submits data (/SubmitForm)'],
  ['ImportData', 'an action that imports data (/ImportData)'],
  ['GoToE', 'an action that opens an embedded file (/GoToE)'],
  ['GoToR', 'an action that opens another file (/GoToR)'],
  ['RichMediaExecute', 'embedded media (/RichMediaExecute)'],
  ['Rendition', 'a media rendition action (/Rendition)'],
]);

export type ActiveContent =
  { readonly found: false } | { readonly found: true; readonly what: string };

const nameOf = (o: PDFObject | undefined) => (o instanceof PDFName ? o.decodeText() : undefined);

function walk(object: PDFObject, seen: Set<PDFObject>): string | null {
  if (seen.has(object)) return null;
  seen.add(object);
  const dict = object instanceof PDFStream ? object.dict : object;
  if (dict instanceof PDFDict) {
    const action = nameOf(dict.get(PDFName.of('S')));
    if (action && ACTIVE_ACTIONS.has(action)) return ACTIVE_ACTIONS.get(action)!;
    for (const [key, value] of dict.entries()) {
      const name = key.decodeText();
      const what = ACTIVE_KEYS.get(name);
      if (what) return what;
      // /OpenAction may be a plain destination (open at page 1): only an action dictionary counts.
      if (name === 'OpenAction' && value instanceof PDFDict) {
        const type = nameOf(value.get(PDFName.of('S')));
        if (type && type !== 'GoTo') return `an action run on opening (/OpenAction /${type})`;
      }
      const inner = walk(value, seen);
      if (inner) return inner;
    }
  } else if (object instanceof PDFArray) {
    for (const item of object.asArray()) {
      const inner = walk(item, seen);
      if (inner) return inner;
    }
  }
  return null;
}

/** Names in raw PDF syntax, "#xx" escapes undone. */
function rawNames(text: string): string[] {
  return [...text.matchAll(/\/([^\s/<>[\]()%{}]+)/g)].map((m) =>
    m[1]!.replace(/#([0-9a-fA-F]{2})/g, (_, hex: string) => String.fromCharCode(parseInt(hex, 16))),
  );
}

function scanBytes(bytes: Buffer): string | null {
  const texts = [bytes.toString('latin1')];
  // Object streams hide dictionaries in Flate-compressed streams: inflate them, up to a budget.
  let budget = 64 * 1024 * 1024;
  const stream = /stream\r?\n/g;
  for (let m = stream.exec(texts[0]!); m && budget > 0; m = stream.exec(texts[0]!)) {
    const start = m.index + m[0].length;
    const end = texts[0]!.indexOf('endstream', start);
    if (end < 0) break;
    try {
      const inflated = inflateSync(bytes.subarray(start, end), { maxOutputLength: budget });
      budget -= inflated.length;
      texts.push(inflated.toString('latin1'));
    } catch {
      // Not Flate, or damaged: its raw bytes were scanned already.
    }
  }
  for (const text of texts) {
    const names = rawNames(text);
    for (const [i, name] of names.entries()) {
      const what = ACTIVE_KEYS.get(name);
      if (what) return what;
      if (name === 'S' && ACTIVE_ACTIONS.has(names[i + 1] ?? ''))
        return ACTIVE_ACTIONS.get(names[i + 1]!)!;
    }
  }
  return null;
}

export async function findActiveContent(bytes: Buffer): Promise<ActiveContent> {
  let what: string | null;
  try {
    const document = await PDFDocument.load(bytes, {
      ignoreEncryption: true,
      throwOnInvalidObject: true,
      updateMetadata: false,
    });
    const seen = new Set<PDFObject>();
    what = null;
    for (const [, object] of document.context.enumerateIndirectObjects()) {
      what = walk(object, seen);
      if (what) break;
    }
  } catch {
    what = scanBytes(bytes);
  }
  return what ? { found: true, what } : { found: false };
}
