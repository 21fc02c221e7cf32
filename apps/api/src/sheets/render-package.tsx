import fontkit from '@pdf-lib/fontkit';
import { renderToBuffer } from '@react-pdf/renderer';
import { PDFDocument, rgb } from 'pdf-lib';
import QRCode from 'qrcode';
import { registerSheetFonts, sheetFontBytes } from './fonts';
import type { PackageIndexData, PackageJob, PackagePageRanges } from './package-data';
import { PackageIndexDocument } from './package-index-document';
import { PAGE_NUMBER_BASELINE, PAGE_NUMBER_SIZE, numberPages } from './page-numbers';

/** Left margin of the package line in the bottom band, pt (the page's horizontal padding). */
const PACKAGE_LINE_LEFT = 36;
const INK = rgb(0x1e / 255, 0x29 / 255, 0x3b / 255);

export function packageLineText(code: string, page: number, pages: number): string {
  return `Issue package ${code} · package page ${page} of ${pages}`;
}

/** Where each included sheet sits once the index takes `indexPages` pages. */
export function pageRanges(
  index: PackageIndexData,
  sheetPages: readonly number[],
  indexPages: number,
): PackagePageRanges {
  let next = indexPages + 1;
  let sheet = 0;
  const ranges = index.entries.map((entry) => {
    if (!entry.revision) return null;
    const pages = sheetPages[sheet++] ?? 0;
    const range = { first: next, last: next + pages - 1 };
    next += pages;
    return range;
  });
  return { indexPages, ranges, totalPages: next - 1 };
}

/**
 * An issue package: the index sheet (react-pdf), then each included sheet
 * as it was rendered alone (the same bytes a sheet download gives, pages
 * copied with pdf-lib), and on every page, in the bottom band left of the
 * sheet's own "Page x of y", the package code and the package page.
 *
 * The index says where each sheet sits, which depends on how many pages the
 * index itself takes: it is laid out again until that count holds (once,
 * for any index that fits its first guess).
 */
export async function renderPackage(
  job: PackageJob,
): Promise<{ pdf: Buffer; indexPages: number; totalPages: number }> {
  registerSheetFonts();
  if (job.sheets.length !== job.index.entries.filter((e) => e.revision).length) {
    throw new Error('a package needs one sheet per included entry');
  }
  const qrDataUrl = await QRCode.toDataURL(job.index.verifyUrl, {
    errorCorrectionLevel: 'M',
    margin: 0,
    scale: 4,
  });
  const sheets = await Promise.all(
    job.sheets.map((bytes) => PDFDocument.load(bytes, { updateMetadata: false })),
  );
  const sheetPages = sheets.map((doc) => doc.getPageCount());
  let indexPages = 1;
  let pages = pageRanges(job.index, sheetPages, indexPages);
  let laidOut: Buffer | null = null;
  for (let attempt = 0; attempt < 4; attempt += 1) {
    laidOut = await renderToBuffer(
      <PackageIndexDocument data={job.index} pages={pages} qrDataUrl={qrDataUrl} />,
    );
    const count = (await PDFDocument.load(laidOut, { updateMetadata: false })).getPageCount();
    if (count === indexPages) break;
    indexPages = count;
    pages = pageRanges(job.index, sheetPages, indexPages);
  }
  const index = await PDFDocument.load(await numberPages(laidOut!), { updateMetadata: false });

  const out = await PDFDocument.create({ updateMetadata: false });
  out.setTitle(`${job.index.project.number} issue package ${job.index.packageCode}`);
  out.setSubject(`Issue package, package hash ${job.index.packageHash}`);
  out.setAuthor('Hoopline');
  out.setCreator('Hoopline');
  out.setProducer('Hoopline');
  for (const doc of [index, ...sheets]) {
    for (const page of await out.copyPages(doc, doc.getPageIndices())) out.addPage(page);
  }
  out.registerFontkit(fontkit);
  const font = await out.embedFont(sheetFontBytes(400), { subset: true });
  const all = out.getPages();
  all.forEach((page, i) => {
    page.drawText(packageLineText(job.index.packageCode, i + 1, all.length), {
      x: PACKAGE_LINE_LEFT,
      y: PAGE_NUMBER_BASELINE,
      size: PAGE_NUMBER_SIZE,
      font,
      color: INK,
    });
  });
  return {
    pdf: Buffer.from(await out.save()),
    indexPages: index.getPageCount(),
    totalPages: all.length,
  };
}
