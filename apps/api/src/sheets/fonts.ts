import { Font } from '@react-pdf/renderer';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import woffConverter from 'woff2sfnt-sfnt2woff';

/**
 * The sheet uses the fonts shipped in /fonts (IBM Plex Sans and Mono, SIL OFL).
 * fontkit inside @react-pdf/renderer reads .woff, not .woff2, but it inflates
 * a WOFF table again on every access, which made a sheet take seconds; so the
 * .woff files are unpacked once to plain TrueType (a lossless container
 * change) and registered from memory. Each subset is
 * its own family; text falls back from latin to greek to latin-ext glyph by
 * glyph (react-pdf font fallback).
 */
const FONTS = path.resolve(import.meta.dirname, '../../../../fonts');

/** The family for text the latin subset covers (nearly all of a sheet). */
export const FONT_FAMILY = 'Plex Sans';
/** Glyph-by-glyph fallback for text with Greek (σ, ν, Δ) or other letters beyond latin. */
export const FALLBACK_FAMILY = ['Plex Sans', 'Plex Sans Greek', 'Plex Sans Latin Ext'];

// The unicode-range of the latin subset (fonts/fonts.css), as [first, last] code points.
const LATIN_SUBSET: ReadonlyArray<readonly [number, number]> = [
  [0x0000, 0x00ff],
  [0x0131, 0x0131],
  [0x0152, 0x0153],
  [0x02bb, 0x02bc],
  [0x02c6, 0x02c6],
  [0x02da, 0x02da],
  [0x02dc, 0x02dc],
  [0x0304, 0x0304],
  [0x0308, 0x0308],
  [0x0329, 0x0329],
  [0x2000, 0x206f],
  [0x20ac, 0x20ac],
  [0x2122, 0x2122],
  [0x2191, 0x2191],
  [0x2193, 0x2193],
  [0x2212, 0x2212],
  [0x2215, 0x2215],
  [0xfeff, 0xfeff],
  [0xfffd, 0xfffd],
];

function inLatinSubset(text: string): boolean {
  for (const char of text) {
    const code = char.codePointAt(0)!;
    if (code <= 0xff) continue;
    if (!LATIN_SUBSET.some(([first, last]) => code >= first && code <= last)) return false;
  }
  return true;
}

/**
 * The family a piece of text needs. Fallback makes react-pdf test every
 * character against every font of the list, which nearly doubled the render
 * time of a sheet; so only text that needs it gets it.
 */
export function familyFor(text: string): string | string[] {
  return inLatinSubset(text) ? FONT_FAMILY : FALLBACK_FAMILY;
}
export const MONO_FAMILY = 'Plex Mono';

let registered = false;

function trueTypeDataUrl(woffPath: string): string {
  const sfnt = woffConverter.toSfnt(readFileSync(woffPath));
  return `data:font/ttf;base64,${sfnt.toString('base64')}`;
}

/** Registers the sheet's fonts once per process. */
export function registerSheetFonts(): void {
  if (registered) return;
  const sans = (subset: string) =>
    [400, 500, 600, 700].map((weight) => ({
      src: trueTypeDataUrl(
        path.join(FONTS, 'ibm-plex-sans', `ibm-plex-sans-${subset}-${weight}-normal.woff`),
      ),
      fontWeight: weight,
    }));
  Font.register({ family: 'Plex Sans', fonts: sans('latin') });
  Font.register({ family: 'Plex Sans Greek', fonts: sans('greek') });
  Font.register({ family: 'Plex Sans Latin Ext', fonts: sans('latin-ext') });
  Font.register({
    family: 'Plex Mono',
    fonts: [400, 500].map((weight) => ({
      src: trueTypeDataUrl(
        path.join(FONTS, 'ibm-plex-mono', `ibm-plex-mono-latin-${weight}-normal.woff`),
      ),
      fontWeight: weight,
    })),
  });
  // Words are not hyphenated: a hash or a code must stay whole.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
