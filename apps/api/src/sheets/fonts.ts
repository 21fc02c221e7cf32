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

export const FONT_FAMILY = ['Plex Sans', 'Plex Sans Greek', 'Plex Sans Latin Ext'];
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
