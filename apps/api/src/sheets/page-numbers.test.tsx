import { Document, Page, Text, renderToBuffer } from '@react-pdf/renderer';
import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { FONT_FAMILY, registerSheetFonts } from './fonts';
import { numberPages } from './page-numbers';

async function parse(bytes: Buffer) {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  try {
    return { text: await parser.getText(), info: await parser.getInfo() };
  } finally {
    await parser.destroy();
  }
}

describe('numberPages', () => {
  it('writes "Page x of y" on every page and keeps the text and metadata react-pdf wrote', async () => {
    registerSheetFonts();
    // Enough paragraphs to flow over several pages: the count is react-pdf's, not ours.
    const paragraphs = Array.from({ length: 160 }, (_, i) => `Paragraph ${i + 1}: σ = p·r/t`);
    const laidOut = await renderToBuffer(
      <Document title="numbering check" producer="Hoopline">
        <Page size="A4" style={{ fontFamily: FONT_FAMILY, fontSize: 10, padding: 40 }}>
          {paragraphs.map((p) => (
            <Text key={p}>{p}</Text>
          ))}
        </Page>
      </Document>,
    );
    const before = await parse(laidOut);
    expect(before.text.total).toBeGreaterThanOrEqual(3);
    expect(before.text.text).not.toMatch(/Page \d+ of/);

    const numbered = await numberPages(laidOut);
    const after = await parse(numbered);
    expect(after.text.total).toBe(before.text.total);
    for (const page of after.text.pages) {
      expect(page.text).toContain(`Page ${page.num} of ${after.text.total}`);
    }
    expect(after.text.text).toContain('Paragraph 1: σ = p·r/t');
    expect(after.text.text).toContain('Paragraph 160: σ = p·r/t');
    expect(after.info.info).toMatchObject({ Title: 'numbering check', Producer: 'Hoopline' });
  });

  it('refuses bytes that are not a PDF', async () => {
    await expect(numberPages(Buffer.from('not a pdf'))).rejects.toThrow();
  });
});
