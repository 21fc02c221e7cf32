import { renderToBuffer } from '@react-pdf/renderer';
import QRCode from 'qrcode';
import { registerSheetFonts } from './fonts';
import { numberPages } from './page-numbers';
import { SheetDocument } from './sheet-document';
import type { SheetData } from './sheet-data';

/** Renders a sheet to PDF bytes. Pure apart from reading the font files. */
export async function renderSheet(data: SheetData): Promise<Buffer> {
  registerSheetFonts();
  const qrDataUrl = await QRCode.toDataURL(data.verifyUrl, {
    errorCorrectionLevel: 'M',
    margin: 0,
    scale: 4,
  });
  const laidOut = await renderToBuffer(<SheetDocument data={data} qrDataUrl={qrDataUrl} />);
  return numberPages(laidOut);
}
