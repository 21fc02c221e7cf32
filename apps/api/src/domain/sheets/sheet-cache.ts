import canonicalize from 'canonicalize';
import { createHash } from 'node:crypto';
import { readFileSync, readdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import type pg from 'pg';
import { sheetRenderRepository } from '../../repositories/sheet-renders.repository';
import type { SheetData } from '../../sheets/sheet-data';

/** A sheet as it is printed, less the time it was generated. */
export type SheetContent = Omit<SheetData, 'generatedAt'>;

const SHEETS_SOURCE = path.resolve(import.meta.dirname, '../../sheets');
const FONTS = path.resolve(import.meta.dirname, '../../../../../fonts');
// Every word and number of a sheet is printed through @hoopline/present.
const PRESENT_SOURCE = path.resolve(import.meta.dirname, '../../../../../packages/present/src');

/**
 * What else decides a sheet's bytes: the sheet code (every file of
 * src/sheets but the tests), the presentation code it prints through (every
 * file of packages/present/src but the tests), the fonts' names and sizes, and the versions of
 * the libraries that lay it out. A change of any makes every key new, so an
 * old layout is never served after the code changed.
 */
function rendererFingerprint(): string {
  const hash = createHash('sha256');
  for (const file of readdirSync(SHEETS_SOURCE).sort()) {
    if (/\.test\.tsx?$/.test(file)) continue;
    hash.update(file).update(readFileSync(path.join(SHEETS_SOURCE, file)));
  }
  const present = readdirSync(PRESENT_SOURCE, { recursive: true, encoding: 'utf8' });
  for (const file of present.filter((f) => /\.tsx?$/.test(f) && !/\.test\.tsx?$/.test(f)).sort()) {
    hash.update(`present/${file}`).update(readFileSync(path.join(PRESENT_SOURCE, file)));
  }
  for (const dir of ['ibm-plex-sans-complete', 'ibm-plex-mono-complete']) {
    for (const file of readdirSync(path.join(FONTS, dir)).sort()) {
      hash.update(`${dir}/${file}:${readFileSync(path.join(FONTS, dir, file)).length}`);
    }
  }
  const require = createRequire(import.meta.url);
  for (const name of ['@react-pdf/renderer', 'pdf-lib', 'qrcode']) {
    const manifest = require.resolve(`${name}/package.json`);
    hash.update(
      `${name}@${(JSON.parse(readFileSync(manifest, 'utf8')) as { version: string }).version}`,
    );
  }
  return hash.digest('hex');
}

let fingerprint: string | undefined;

/**
 * The cache key of a sheet: SHA-256 of the canonical JSON of everything it
 * prints (revision hash, status, stamp, paper, the countersign, the
 * attachments listed, project and component names…) and of the renderer.
 * A countersign or a supersession changes the status, so the key.
 */
export function sheetKey(content: SheetContent): string {
  fingerprint ??= rendererFingerprint();
  const text = canonicalize({ content, renderer: fingerprint });
  if (text === undefined) throw new Error('a sheet that cannot be serialised');
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

export interface CachedSheet {
  readonly pdf: Buffer;
  readonly renderedAt: Date;
}

/**
 * Rendered sheets in PostgreSQL (table sheet_renders), shared by every API
 * process, bounded in bytes: past the bound the least recently served go.
 */
export class SheetCache {
  constructor(
    private readonly pool: () => pg.Pool,
    private readonly maxBytes: number,
  ) {}

  get enabled(): boolean {
    return this.maxBytes > 0;
  }

  async get(key: string): Promise<CachedSheet | null> {
    if (!this.enabled) return null;
    return sheetRenderRepository.get(this.pool(), key);
  }

  /**
   * Keeps a render. When another process kept one for the key first, that
   * one is answered, so every download of a key gets the same bytes.
   */
  async put(key: string, revisionId: string, pdf: Buffer, renderedAt: Date): Promise<CachedSheet> {
    if (!this.enabled || pdf.length > this.maxBytes) return { pdf, renderedAt };
    const kept = await sheetRenderRepository.insertIfNew(this.pool(), {
      key,
      revisionId,
      pdf,
      renderedAt,
    });
    if (!kept) return (await this.get(key)) ?? { pdf, renderedAt };
    // Past the bound the least recently served go.
    await sheetRenderRepository.keepWithin(this.pool(), this.maxBytes);
    return { pdf, renderedAt };
  }
}
