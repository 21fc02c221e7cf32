import { PDFDocument, PDFName, PDFString } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { findActiveContent } from './pdf-active-content';

// Active-content keys and action types: ISO 32000-1:2008 §12.6 (actions: /S
// /JavaScript, /Launch, /SubmitForm, /ImportData, /GoToR, /GoToE), §12.6.3
// (/AA additional actions), §12.3.2.1 (/OpenAction in the catalog), §7.3.5
// (a "#xx" escape in a name stands for that byte), §7.5.7 (object streams).

/** A one-page PDF made by pdf-lib, changed by `edit`; pdf-lib saves dictionaries in object streams. */
async function pdf(edit: (doc: PDFDocument) => void = () => {}): Promise<Buffer> {
  const doc = await PDFDocument.create();
  doc.addPage([200, 200]);
  edit(doc);
  return Buffer.from(await doc.save({ useObjectStreams: true }));
}

/** A PDF written out by hand (no object streams), for raw syntax. */
const handWritten = (catalogExtra: string) =>
  Buffer.from(
    `%PDF-1.7\n1 0 obj\n<< /Type /Catalog /Pages 2 0 R ${catalogExtra} >>\nendobj\n` +
      `2 0 obj\n<< /Type /Pages /Kids [] /Count 0 >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n`,
    'latin1',
  );

describe('findActiveContent', () => {
  it('passes a plain drawing, and an /OpenAction that only opens page 1 (a destination)', async () => {
    expect(await findActiveContent(await pdf())).toEqual({ found: false });
    const destination = await pdf((doc) => {
      const page = doc.getPage(0).ref;
      doc.catalog.set(PDFName.of('OpenAction'), doc.context.obj([page, PDFName.of('Fit')]));
    });
    expect(await findActiveContent(destination)).toEqual({ found: false });
  });

  it('finds JavaScript run on opening, even inside a compressed object stream', async () => {
    const bytes = await pdf((doc) => {
      doc.catalog.set(
        PDFName.of('OpenAction'),
        doc.context.obj({ S: 'JavaScript', JS: PDFString.of('app.alert(1)') }),
      );
    });
    // The words are not in the file's bytes: they sit in a Flate-compressed object stream.
    expect(bytes.toString('latin1')).not.toContain('JavaScript');
    expect(await findActiveContent(bytes)).toMatchObject({ found: true, what: /JavaScript/ });
  });

  it('finds a /Launch action on a link annotation and /AA on a page', async () => {
    const launch = await pdf((doc) => {
      const annotation = doc.context.obj({
        Type: 'Annot',
        Subtype: 'Link',
        Rect: [0, 0, 10, 10],
        A: { S: 'Launch', F: PDFString.of('cmd.exe') },
      });
      doc.getPage(0).node.set(PDFName.of('Annots'), doc.context.obj([annotation]));
    });
    expect(await findActiveContent(launch)).toMatchObject({ found: true, what: /Launch/ });
    const aa = await pdf((doc) => {
      doc
        .getPage(0)
        .node.set(PDFName.of('AA'), doc.context.obj({ O: { S: 'URI', URI: PDFString.of('x') } }));
    });
    expect(await findActiveContent(aa)).toMatchObject({ found: true, what: /\/AA/ });
  });

  it('sees through "#xx" escapes in names (/J#61vaScript is /JavaScript)', async () => {
    const bytes = handWritten('/OpenAction << /S /J#61vaScript /JS (app.alert(1)) >>');
    expect(await findActiveContent(bytes)).toMatchObject({ found: true, what: /JavaScript/ });
  });

  it('finds a form that submits, and an embedded file', async () => {
    expect(
      await findActiveContent(
        handWritten('/OpenAction << /S /SubmitForm /F (http://127.0.0.1/x) >>'),
      ),
    ).toMatchObject({ found: true, what: /SubmitForm/ });
    expect(
      await findActiveContent(handWritten('/Names << /EmbeddedFiles << /Names [] >> >>')),
    ).toMatchObject({ found: true, what: /embedded file/ });
  });

  it('scans a file pdf-lib cannot parse as bytes, Flate streams inflated', async () => {
    const { deflateSync } = await import('node:zlib');
    const hidden = deflateSync(Buffer.from('<< /S /Launch /F (calc.exe) >>'));
    const broken = Buffer.concat([
      Buffer.from('%PDF-1.7\n5 0 obj\n<< /Length 999 /Filter /FlateDecode >>\nstream\n', 'latin1'),
      hidden,
      Buffer.from('\nendstream\nendobj\n(no xref, no trailer)', 'latin1'),
    ]);
    expect(await findActiveContent(broken)).toMatchObject({ found: true, what: /Launch/ });
    expect(
      await findActiveContent(Buffer.from('%PDF-1.7\ngarbage without names', 'latin1')),
    ).toEqual({ found: false });
  });
});
