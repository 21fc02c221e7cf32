import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, rgb } from 'pdf-lib';
import { sheetFontBytes } from './fonts';

/**
 * "Page x of y" on every page of a laid-out sheet, drawn after react-pdf has
 * paginated it (pdf-lib, with IBM Plex Sans embedded as a subset).
 *
 * Why not react-pdf's own `render={({ pageNumber, totalPages }) => …}`: a
 * dynamic node makes react-pdf 4.9 lay the whole page out again at every page
 * split and once more per page for the total, which was about 30 % of the
 * render time of a typical three-page sheet (measured with `pnpm bench`).
 * Drawing the numbers afterwards costs one parse and save of the PDF.
 *
 * The numbers sit in the bottom margin, right-aligned below the footer,
 * where the document leaves the paper empty (the footer's box ends 22 pt
 * above the paper's edge: `footer` in sheet-document.tsx).
 */
export const PAGE_NUMBER_SIZE = 6.5;
/** Baseline height above the paper's bottom edge, pt. */
export const PAGE_NUMBER_BASELINE = 11;
/** Right margin of the sheet, pt (the page's horizontal padding). */
export const PAGE_NUMBER_RIGHT = 36;
const INK = rgb(0x1e / 255, 0x29 / 255, 0x3b / 255);

export function pageNumberText(page: number, pages: number): string {
  return `Page ${page} of ${pages}`;
}

export async function numberPages(pdf: Uint8Array): Promise<Buffer> {
  const doc = await PDFDocument.load(pdf, { updateMetadata: false });
  doc.registerFontkit(fontkit);
  const font = await doc.embedFont(sheetFontBytes(400), { subset: true });
  const pages = doc.getPages();
  pages.forEach((page, index) => {
    const text = pageNumberText(index + 1, pages.length);
    const width = font.widthOfTextAtSize(text, PAGE_NUMBER_SIZE);
    page.drawText(text, {
      x: page.getWidth() - PAGE_NUMBER_RIGHT - width,
      y: PAGE_NUMBER_BASELINE,
      size: PAGE_NUMBER_SIZE,
      font,
      color: INK,
    });
  });
  return Buffer.from(await doc.save());
}
