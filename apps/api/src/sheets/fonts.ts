import { Font } from '@react-pdf/renderer';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import woffConverter from 'woff2sfnt-sfnt2woff';

/**
 * The sheet's typefaces: IBM Plex Sans and Mono in their complete character
 * sets (fonts/ibm-plex-*-complete, from IBM's own @ibm/plex package, SIL
 * OFL), one file per weight with Latin, Greek and the mathematical signs
 * together, so no text needs a fallback font. (With the web's per-script
 * subsets, react-pdf's glyph-by-glyph fallback doubled the render time and
 * broke a line inside "β1" with a hyphen the Greek subset lacks.)
 *
 * fontkit inside @react-pdf/renderer reads .woff, not .woff2, and inflates a
 * WOFF table again on every access; so each .woff is unpacked once to plain
 * TrueType (a lossless container change) and registered from memory.
 */
const FONTS = path.resolve(import.meta.dirname, '../../../../fonts');

export const FONT_FAMILY = 'Plex Sans';
export const MONO_FAMILY = 'Plex Mono';

const SANS: ReadonlyArray<readonly [number, string]> = [
  [400, 'IBMPlexSans-Regular.woff'],
  [500, 'IBMPlexSans-Medium.woff'],
  [600, 'IBMPlexSans-SemiBold.woff'],
  [700, 'IBMPlexSans-Bold.woff'],
];
const MONO: ReadonlyArray<readonly [number, string]> = [
  [400, 'IBMPlexMono-Regular.woff'],
  [500, 'IBMPlexMono-Medium.woff'],
];

let registered = false;
const unpacked = new Map<string, Buffer>();

function trueType(woffPath: string): Buffer {
  let sfnt = unpacked.get(woffPath);
  if (!sfnt) {
    sfnt = woffConverter.toSfnt(readFileSync(woffPath));
    unpacked.set(woffPath, sfnt);
  }
  return sfnt;
}

function trueTypeDataUrl(woffPath: string): string {
  return `data:font/ttf;base64,${trueType(woffPath).toString('base64')}`;
}

/** The TrueType bytes of one weight of the sheet's sans face (for pdf-lib, see page-numbers.ts). */
export function sheetFontBytes(fontWeight: 400 | 500 | 600 | 700): Buffer {
  const file = SANS.find(([weight]) => weight === fontWeight)?.[1];
  if (!file) throw new Error(`no sheet font of weight ${fontWeight}`);
  return trueType(path.join(FONTS, 'ibm-plex-sans-complete', file));
}

/** Registers the sheet's fonts once per process. */
export function registerSheetFonts(): void {
  if (registered) return;
  Font.register({
    family: FONT_FAMILY,
    fonts: SANS.map(([fontWeight, file]) => ({
      src: trueTypeDataUrl(path.join(FONTS, 'ibm-plex-sans-complete', file)),
      fontWeight,
    })),
  });
  Font.register({
    family: MONO_FAMILY,
    fonts: MONO.map(([fontWeight, file]) => ({
      src: trueTypeDataUrl(path.join(FONTS, 'ibm-plex-mono-complete', file)),
      fontWeight,
    })),
  });
  // Words are not hyphenated: a hash or a code must stay whole.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
